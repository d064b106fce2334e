import type { Finding } from "@/lib/findings";
import type { CatalogIndex } from "@/lib/layout/catalog-index";
import { PANEL_KEY, type LayoutDocument, type LayoutInput } from "@/lib/layout/schema";
import type { ScheduleDetector } from "@/lib/schedule/schema";
import type { PlacedDetector, Resolved, ResolvedInput } from "@/lib/solver/resolve";

// Resolution patched from the previous one: when a document differs from the last only in some input objects
// (the editor's operations share every untouched object), the resolved inputs of the untouched ones are kept and
// only the added inputs are tied to the schedule and catalog. Anything a patch could get wrong — a finding
// about an input's placement, a change of boards, power or programming, many inputs at once — gives null, and
// the caller solves in full.

/** Findings of the resolution that concern one input; with any of them the order of inputs matters, so no patch. */
const INPUT_LEVEL_CODES = new Set(["input-board-unknown", "input-out-of-range", "input-duplicate", "detector-unknown", "detector-placed-twice", "wireless-on-input", "detector-type-unknown"]);

/** More changed inputs than this and a full pass is as quick. */
const MAX_CHANGED_INPUTS = 16;

export interface ResolveState {
  layout: LayoutDocument;
  r: Resolved;
  /** The resolution's own findings (boards, panel), reused as they are by a patch. */
  findings: Finding[];
  /** Every input object of the document. */
  inputSet: Set<LayoutInput>;
  /** Input object → its resolved input. */
  resolvedOf: Map<LayoutInput, ResolvedInput>;
  /** Detectors on inputs (wireless ones not included). */
  wiredPlaced: Set<string>;
}

export interface ResolvePatch {
  state: ResolveState;
  added: ResolvedInput[];
  removed: ResolvedInput[];
  /** Keys of the boards whose inputs changed. */
  touched: Set<string>;
}

/** The state after a full resolution, or null when it said something about an input (patches then stay off). */
export function resolveState(layout: LayoutDocument, r: Resolved, findings: Finding[]): ResolveState | null {
  for (const f of findings) if (INPUT_LEVEL_CODES.has(f.code)) return null;
  const inputSet = new Set(layout.inputs);
  if (inputSet.size !== layout.inputs.length) return null;
  const resolvedOf = new Map<LayoutInput, ResolvedInput>();
  const wiredPlaced = new Set<string>();
  for (const ri of r.inputs) {
    resolvedOf.set(ri.input, ri);
    for (const d of ri.detectors) wiredPlaced.add(d.sched.id);
  }
  return { layout, r, findings, inputSet, resolvedOf, wiredPlaced };
}

function sameExceptInputs(a: LayoutDocument, b: LayoutDocument): boolean {
  const ka = Object.keys(a);
  if (ka.length !== Object.keys(b).length) return false;
  for (const k of ka) if (k !== "inputs" && a[k as keyof LayoutDocument] !== b[k as keyof LayoutDocument]) return false;
  return true;
}

const slotKey = (inp: LayoutInput) => `${inp.boardKey}#${inp.input}`;

export function patchResolve(prev: ResolveState, layout: LayoutDocument, ix: CatalogIndex, schedule: Map<string, ScheduleDetector>): ResolvePatch | null {
  if (!sameExceptInputs(prev.layout, layout)) return null;
  const inputSet = new Set(layout.inputs);
  if (inputSet.size !== layout.inputs.length) return null;
  const removedInputs: LayoutInput[] = [];
  for (const inp of prev.layout.inputs) if (!inputSet.has(inp)) removedInputs.push(inp);
  const addedInputs: LayoutInput[] = [];
  for (const inp of layout.inputs) if (!prev.inputSet.has(inp)) addedInputs.push(inp);
  if (removedInputs.length + addedInputs.length > MAX_CHANGED_INPUTS) return null;

  const { r } = prev;
  const removed: ResolvedInput[] = [];
  const freedSlots = new Set<string>();
  const freedIds = new Set<string>();
  for (const inp of removedInputs) {
    const ri = prev.resolvedOf.get(inp);
    if (!ri) continue;
    removed.push(ri);
    freedSlots.add(slotKey(inp));
    for (const d of ri.detectors) freedIds.add(d.sched.id);
  }
  const taken = new Set<string>();
  const takenIds = new Set<string>();
  const added: ResolvedInput[] = [];
  for (const inp of addedInputs) {
    if (inp.detectorIds.length === 0) continue;
    const board = r.byKey.get(inp.boardKey);
    if (!board) return null;
    if (!board.entry && board.key !== PANEL_KEY) continue; // ignored by the full resolution too
    if (!Number.isInteger(inp.input) || inp.input < 1 || inp.input > board.inputCount) return null;
    const slot = slotKey(inp);
    if (taken.has(slot) || (!freedSlots.has(slot) && slotInUse(prev, inp))) return null;
    taken.add(slot);
    const detectors: PlacedDetector[] = [];
    for (const id of inp.detectorIds) {
      const sched = schedule.get(id);
      const cat = sched && ix.detectors.get(sched.catalogId);
      if (!sched || !cat || takenIds.has(id) || (prev.wiredPlaced.has(id) && !freedIds.has(id))) return null;
      takenIds.add(id);
      detectors.push({ sched, cat });
    }
    added.push({ input: inp, board, detectors });
  }

  // Only now, with nothing refused, the state moves on.
  const wiredPlaced = prev.wiredPlaced;
  for (const id of freedIds) wiredPlaced.delete(id);
  for (const id of takenIds) wiredPlaced.add(id);
  const resolvedOf = prev.resolvedOf;
  for (const ri of removed) resolvedOf.delete(ri.input);
  for (const ri of added) resolvedOf.set(ri.input, ri);
  const gone = new Set(removed);
  const inputs = gone.size ? r.inputs.filter((ri) => !gone.has(ri)) : r.inputs.slice();
  for (const ri of added) inputs.splice(insertionPoint(inputs, ri), 0, ri);
  const touched = new Set<string>();
  for (const ri of removed) touched.add(ri.board.key);
  for (const ri of added) touched.add(ri.board.key);
  const next: Resolved = { ...r, layout, inputs, placed: wiredPlaced };
  return { state: { layout, r: next, findings: prev.findings, inputSet, resolvedOf, wiredPlaced }, added, removed, touched };
}

/** Whether a kept input holds this slot (the previous resolution had no duplicates, so one lookup settles it). */
function slotInUse(prev: ResolveState, inp: LayoutInput): boolean {
  const board = prev.r.byKey.get(inp.boardKey)!;
  const list = prev.r.inputs;
  const i = insertionPoint(list, { input: inp, board, detectors: [] });
  return i < list.length && list[i].board === board && list[i].input.input === inp.input;
}

/** Board order, then input number: where the full resolution sorts inputs. */
function insertionPoint(list: ResolvedInput[], ri: ResolvedInput): number {
  let lo = 0;
  let hi = list.length;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    const m = list[mid];
    if ((m.board.order - ri.board.order || m.input.input - ri.input.input) < 0) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}
