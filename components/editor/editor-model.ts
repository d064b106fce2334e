import { isLifeSafety } from "@/lib/catalog/life-safety";
import type { InputType } from "@/lib/catalog/schema";
import type { Finding, FindingTarget } from "@/lib/findings";
import { formatOhms } from "@/lib/resistors/format-ohms";
import { boardEntry, indexCatalog } from "@/lib/layout/catalog-index";
import { assign, defaultScheme, findDetector, inputBlockOf, makeShared, reorderBoards, unassign, type LayoutContext, type LayoutEdit } from "@/lib/layout/operations";
import { boardName, inputName } from "@/lib/layout/names";
import type { LayoutDocument, LayoutInput } from "@/lib/layout/schema";
import type { SolveResult } from "@/lib/solver";
import { PLACEMENT_WORDS, SCHEME_WORDS } from "@/lib/vocabulary/words";
import { outputDropEdit, outputOverSentence, parseOutputDragId, parseOutputDropId, type OutputDragItem, type OutputDropTarget } from "@/components/editor/output-drag-model";
import { plural } from "@/lib/vocabulary/plural";

// Pure helpers of the editor: drag items and drop targets, zone numbers, finding anchors, resistor text.

export type DragItem = { type: "detector"; detectorId: string } | { type: "board"; boardKey: string } | OutputDragItem;
export type DropTarget = { type: "input"; boardKey: string; input: number } | { type: "unplaced" } | { type: "board"; boardKey: string } | OutputDropTarget;

export const detectorDragId = (id: string) => `det:${id}`;
export const inputDropId = (boardKey: string, input: number) => `in:${boardKey}:${input}`;
export const UNPLACED_DROP_ID = "unplaced";
export const boardSortId = (key: string) => `board:${key}`;

export function parseDropId(id: string | number | null | undefined): DropTarget | null {
  if (id == null) return null;
  const s = String(id);
  if (s === UNPLACED_DROP_ID) return { type: "unplaced" };
  const out = parseOutputDropId(s);
  if (out) return out;
  let m = /^in:([A-Za-z0-9_-]+):(\d+)$/.exec(s);
  if (m) return { type: "input", boardKey: m[1], input: Number(m[2]) };
  m = /^board:([A-Za-z0-9_-]+)$/.exec(s);
  if (m) return { type: "board", boardKey: m[1] };
  return null;
}

export function parseDragId(id: string | number): DragItem | null {
  const s = String(id);
  if (s.startsWith("det:")) return { type: "detector", detectorId: s.slice(4) };
  if (s.startsWith("board:")) return { type: "board", boardKey: s.slice(6) };
  return parseOutputDragId(s);
}

/**
 * What dropping an item on a target does. A detector on a free input is placed (or moved) there; on an input
 * holding another detector it makes a shared input (refused with the reason where the input type or a
 * life-safety device forbids it); on the unplaced list it goes back. Null means nothing to do.
 */
export function dropEdit(doc: LayoutDocument, ctx: LayoutContext, item: DragItem, target: DropTarget | null): LayoutEdit | null {
  if (!target) return null;
  if (item.type === "output-device") return target.type === "output" || target.type === "output-pool" ? outputDropEdit(doc, ctx, item, target) : null;
  if (item.type === "board") {
    if (target.type !== "board") return null;
    const from = doc.boards.findIndex((b) => b.key === item.boardKey);
    const to = doc.boards.findIndex((b) => b.key === target.boardKey);
    if (from < 0 || to < 0 || from === to) return null;
    return reorderBoards(doc, ctx, from, to);
  }
  const at = findDetector(doc, item.detectorId);
  if (target.type === "unplaced") return at ? unassign(doc, ctx, item.detectorId) : null;
  if (target.type !== "input") return null;
  if (at && at.input.boardKey === target.boardKey && at.input.input === target.input) return null;
  const occupied = doc.inputs.find((i) => i.boardKey === target.boardKey && i.input === target.input && i.detectorIds.length > 0);
  return occupied ? makeShared(doc, ctx, item.detectorId, target) : assign(doc, ctx, item.detectorId, target);
}

/** A sentence for the screen reader while an item is over a target. */
export function overSentence(doc: LayoutDocument, ctx: LayoutContext, item: DragItem, target: DropTarget | null): string {
  const label = (id: string) => ctx.schedule.find((d) => d.id === id)?.label ?? id;
  if (item.type === "output-device") return outputOverSentence(doc, indexCatalog(ctx.catalog), item, target?.type === "output" || target?.type === "output-pool" ? target : null);
  if (item.type === "board") {
    const name = boardName(doc, item.boardKey);
    if (target?.type !== "board") return `${name} is not over a board position`;
    const to = doc.boards.findIndex((b) => b.key === target.boardKey);
    return `${name} is over position ${to + 1} of ${doc.boards.length}`;
  }
  const name = label(item.detectorId);
  if (!target) return `${name} is not over an input`;
  if (target.type === "unplaced") return `${name} is over the unplaced detectors`;
  if (target.type !== "input") return `${name} is not over an input`;
  const occupant = doc.inputs.find((i) => i.boardKey === target.boardKey && i.input === target.input && i.detectorIds.length > 0);
  const where = inputName(doc, target);
  if (!occupant) return `${name} is over ${where}, free`;
  if (occupant.detectorIds.includes(item.detectorId)) return `${name} is over its own input, ${where}`;
  const taken = `${name} is over ${where}, taken by ${occupant.detectorIds.map(label).join(" and ")}`;
  const shares = inputBlockOf(doc, indexCatalog(ctx.catalog), target.boardKey)?.inputType?.schemes.includes("shared");
  return shares && occupant.detectorIds.length === 1 ? `${taken}; dropping here makes it a shared input` : `${taken}; this input takes no other detector`;
}

/** Zone numbers as the terminal sheet gives them: board order then input order, one per detector. */
export function zoneNumbers(result: SolveResult): Map<string, number> {
  const zones = new Map<string, number>();
  let z = 0;
  for (const inp of result.inputs) for (const id of inp.detectorIds) zones.set(id, ++z);
  return zones;
}

/** The DOM id of the thing a finding concerns, for its "show" link. */
export function targetDomId(t: FindingTarget): string {
  switch (t.kind) {
    case "board":
      return `board-${t.boardKey}`;
    case "input":
      return `input-${t.boardKey}-${t.input}`;
    case "detector":
      return `detector-${t.detectorId}`;
    case "supply":
      return `supply-${t.supplyKey}`;
    default:
      return "layout-figures";
  }
}

/** Findings grouped by the DOM id they point at, for the markers in place. */
export function findingsByDomId(findings: Finding[]): Map<string, Finding[]> {
  const m = new Map<string, Finding[]>();
  for (const f of findings) {
    const k = targetDomId(f.target);
    const list = m.get(k);
    if (list) list.push(f);
    else m.set(k, [f]);
  }
  return m;
}

export interface ResistorLine {
  label: string;
  ohms: number;
  /** The designer's fitted value rather than the input type's expected one. */
  fitted: boolean;
}

/** The resistors an input is wired with, fitted values first, else the input type's expected ones. */
export function resistorLines(inp: Pick<LayoutInput, "scheme" | "eolOhms" | "alarmOhms" | "sharedOhms">, type: InputType | undefined): ResistorLine[] {
  const line = (label: string, fitted: number | undefined, expected: number | undefined): ResistorLine[] =>
    fitted !== undefined ? [{ label, ohms: fitted, fitted: true }] : expected !== undefined ? [{ label, ohms: expected, fitted: false }] : [];
  switch (inp.scheme) {
    case "single-eol":
      return line("EOL", inp.eolOhms, type?.eolOhms);
    case "double-eol":
      return [...line("EOL", inp.eolOhms, type?.eolOhms), ...line("alarm", inp.alarmOhms, type?.alarmOhms)];
    case "shared":
      return [...line("line", inp.eolOhms, type?.eolOhms), ...line("A", inp.sharedOhms?.[0], type?.sharedOhms?.[0]), ...line("B", inp.sharedOhms?.[1], type?.sharedOhms?.[1])];
    default:
      return [];
  }
}

export function resistorText(lines: ResistorLine[]): string {
  return lines.length ? lines.map((l) => `${l.label} ${formatOhms(l.ohms)}`).join(" · ") : "no resistors";
}

export const schemeLabels: Record<string, string> = SCHEME_WORDS;

export const placementLabels: Record<string, string> = PLACEMENT_WORDS;

/**
 * Detectors deleted from the schedule since the layout was saved cannot stay on inputs (the server refuses
 * the save). They are taken off here, and their ids returned for a visible notice.
 */
export function withoutMissingDetectors(doc: LayoutDocument, ctx: LayoutContext): { doc: LayoutDocument; removed: string[] } {
  const ids = new Set(ctx.schedule.map((d) => d.id));
  const ix = indexCatalog(ctx.catalog);
  const removed = doc.inputs.flatMap((i) => i.detectorIds.filter((d) => !ids.has(d)));
  if (!removed.length) return { doc, removed };
  const inputs = doc.inputs
    .map((i) => {
      const kept = i.detectorIds.filter((d) => ids.has(d));
      if (kept.length === i.detectorIds.length) return i;
      if (kept.length === 1 && i.scheme === "shared") {
        const { sharedOhms: _s, ...rest } = i;
        const type = inputBlockOf(doc, ix, i.boardKey)?.inputType;
        return { ...rest, detectorIds: kept, scheme: defaultScheme(type, ctx.schedule.find((d) => d.id === kept[0])?.supervision) };
      }
      return { ...i, detectorIds: kept };
    })
    .filter((i) => i.detectorIds.length > 0);
  return { doc: { ...doc, inputs }, removed };
}

/** Whether the schedule holds fire (life-safety) devices: the editor then shows the fire caution. */
export function hasLifeSafety(ctx: LayoutContext): boolean {
  const ix = indexCatalog(ctx.catalog);
  return ctx.schedule.some((d) => {
    const c = ix.detectors.get(d.catalogId);
    return !!c && isLifeSafety(c);
  });
}

/** Change the control panel: inputs beyond its count go back to the unplaced, schemes it does not take fall back to its default. */
export function changePanel(doc: LayoutDocument, ctx: LayoutContext, panelId: string): LayoutEdit {
  const ix = indexCatalog(ctx.catalog);
  const panel = ix.panels.get(panelId);
  if (!panel) return { ok: false, layout: doc, message: "That control panel is not in the catalog" };
  if (panelId === doc.panelId) return { ok: false, layout: doc, message: `${panel.name} is already the control panel` };
  const type = ix.inputTypes.get(panel.onboardInputs.inputType);
  let freed = 0;
  const inputs: LayoutInput[] = [];
  for (const i of doc.inputs) {
    if (i.boardKey !== "panel") inputs.push(i);
    else if (i.input > panel.onboardInputs.count) freed += i.detectorIds.length;
    else if (type && !type.schemes.includes(i.scheme)) {
      const { eolOhms: _e, alarmOhms: _a, sharedOhms: _s, ...plain } = i;
      if (i.detectorIds.length > 1) freed += i.detectorIds.length; // a pair cannot stay on an input that does not share
      else inputs.push({ ...plain, scheme: defaultScheme(type, ctx.schedule.find((d) => d.id === i.detectorIds[0])?.supervision) });
    } else inputs.push(i);
  }
  const others = doc.boards.filter((b) => {
    const e = boardEntry(ix, b.kind, b.catalogId);
    return e && !e.entry.families.includes(panel.family);
  }).length;
  const parts = [`Control panel changed to ${panel.name}`];
  if (freed) parts.push(`${plural(freed, "detector")} back to unplaced`);
  if (others) parts.push(`${others} board${others === 1 ? " is" : "s are"} of another family`);
  return { ok: true, layout: { ...doc, panelId, inputs }, message: parts.join("; ") };
}
