import { EVENT_ID, getScalarValue, parseEvents, type Event } from "js-yaml";
import type { CatalogPath } from "./errors";

/** 1-based line and column. */
export interface SourcePosition {
  line: number;
  column: number;
}

/**
 * Where each mapping key and sequence item of a YAML text sits, so a schema issue's path can be
 * shown as a line and column. js-yaml's loader keeps no node positions; its event stream does.
 */
export interface PositionIndex {
  /** The position of the deepest part of `path` that exists in the text (the whole file's start if none). */
  locate(path: CatalogPath): SourcePosition;
  /** Whether this exact path exists in the text. */
  has(path: CatalogPath): boolean;
  lineCount: number;
}

const key = (path: CatalogPath) => path.map(String).join("\u0000");

export function countLines(text: string): number {
  const lines = text.split(/\r\n|\r|\n/);
  if (lines.length > 1 && lines[lines.length - 1] === "") lines.pop();
  return Math.max(1, lines.length);
}

export function lineStarts(text: string): number[] {
  const starts = [0];
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if (c === 13 && text.charCodeAt(i + 1) === 10) continue; // CRLF counts once, at the LF
    if (c === 10 || c === 13) starts.push(i + 1);
  }
  return starts;
}

/** Offset to a 1-based position, clamped inside the file's lines. */
export function offsetToPosition(starts: number[], lineCount: number, offset: number): SourcePosition {
  let lo = 0;
  let hi = starts.length - 1;
  while (lo < hi) {
    const mid = (lo + hi + 1) >> 1;
    if (starts[mid] <= offset) lo = mid;
    else hi = mid - 1;
  }
  const line = Math.min(lo + 1, lineCount);
  const column = line === lo + 1 ? offset - starts[lo] + 1 : 1;
  return { line, column: Math.max(1, column) };
}

interface Frame {
  kind: "map" | "seq" | "doc" | "ignored";
  path: CatalogPath;
  index: number;
  expectKey: boolean;
  pendingKey: string | null;
}

function nodeStart(ev: Event): number {
  if (ev.type === EVENT_ID.SCALAR) return ev.valueStart >= 0 ? ev.valueStart : ev.anchorStart >= 0 ? ev.anchorStart : ev.tagStart;
  if (ev.type === EVENT_ID.MAPPING || ev.type === EVENT_ID.SEQUENCE) return ev.start;
  if (ev.type === EVENT_ID.ALIAS) return ev.anchorStart - 1;
  return -1;
}

/**
 * Build the index, lazily on first use, from the text's events (pass them if already parsed).
 * Never throws: an unparsable text gives an index that only knows the file start.
 */
export function buildPositionIndex(text: string, parsedEvents?: Event[]): PositionIndex {
  const lineCount = countLines(text);
  let built: { starts: number[]; offsets: Map<string, number> } | null = null;
  const index = () => (built ??= indexOffsets(text, parsedEvents));
  return {
    lineCount,
    has: (path) => index().offsets.has(key(path)),
    locate(path) {
      const { starts, offsets } = index();
      for (let n = path.length; n >= 0; n--) {
        const off = offsets.get(key(path.slice(0, n)));
        if (off !== undefined) return offsetToPosition(starts, lineCount, off);
      }
      return { line: 1, column: 1 };
    },
  };
}

function indexOffsets(text: string, parsedEvents?: Event[]): { starts: number[]; offsets: Map<string, number> } {
  const starts = lineStarts(text);
  const offsets = new Map<string, number>();
  try {
    const events = parsedEvents ?? parseEvents(text, {});
    const stack: Frame[] = [];
    for (const ev of events) {
      if (ev.type === EVENT_ID.DOCUMENT) {
        if (stack.length > 0) break; // only the first document is a catalog
        stack.push({ kind: "doc", path: [], index: 0, expectKey: false, pendingKey: null });
        continue;
      }
      const parent = stack[stack.length - 1];
      if (!parent) break;
      if (ev.type === EVENT_ID.POP) {
        stack.pop();
        const up = stack[stack.length - 1];
        if (up && parent.kind !== "doc") settle(up);
        if (parent.kind === "doc") break;
        continue;
      }
      const start = nodeStart(ev);
      let path: CatalogPath | null = null;
      if (parent.kind === "ignored") path = null;
      else if (parent.kind === "map" && parent.expectKey) {
        if (ev.type === EVENT_ID.SCALAR) {
          const k = getScalarValue(text, ev);
          const p = [...parent.path, k];
          if (start >= 0 && !offsets.has(key(p))) offsets.set(key(p), start);
          parent.pendingKey = k;
          parent.expectKey = false;
          continue;
        }
        path = null; // a complex key: not something a catalog uses
        parent.pendingKey = null;
      } else if (parent.kind === "map") path = parent.pendingKey === null ? null : [...parent.path, parent.pendingKey];
      else if (parent.kind === "seq") {
        path = [...parent.path, parent.index];
        if (start >= 0) offsets.set(key(path), start);
      } else path = [];
      if (path && path.length === 0 && start >= 0) offsets.set(key(path), start);
      if (ev.type === EVENT_ID.MAPPING || ev.type === EVENT_ID.SEQUENCE) {
        stack.push({
          kind: path === null ? "ignored" : ev.type === EVENT_ID.MAPPING ? "map" : "seq",
          path: path ?? [],
          index: 0,
          expectKey: true,
          pendingKey: null,
        });
      } else settle(parent);
    }
  } catch {
    // syntax errors are reported by the loader; positions then fall back to the file start
  }

  function settle(f: Frame) {
    if (f.kind === "map") {
      if (f.expectKey) {
        f.expectKey = false; // a complex key has ended; its value comes next
        f.pendingKey = null;
      } else {
        f.expectKey = true;
        f.pendingKey = null;
      }
    } else if (f.kind === "seq") f.index++;
  }

  return { starts, offsets };
}
