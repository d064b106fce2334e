import type { Detector, InputType, Panel } from "@/lib/catalog/schema";
import type { Finding } from "@/lib/findings";
import { boardEntry, boardInputs, type BoardEntry, type CatalogIndex } from "@/lib/layout/catalog-index";
import { boardNames } from "@/lib/layout/names";
import { PANEL_KEY, type LayoutBoard, type LayoutDocument, type LayoutInput } from "@/lib/layout/schema";
import type { ScheduleDetector } from "@/lib/schedule/schema";
import { listNames } from "@/lib/solver/format";
import { BOARD_KIND_WORDS } from "@/lib/vocabulary/words";
import { plural, pluralWord } from "@/lib/vocabulary/plural";

// Ties a layout to the catalog and the schedule, and reports what does not tie up.

export interface ResolvedBoard {
  key: string;
  /** Position in the layout's board list, the panel being 0. */
  order: number;
  name: string;
  /** null for the control panel. */
  board: LayoutBoard | null;
  entry: BoardEntry | null;
  inputCount: number;
  inputType: InputType | undefined;
  inputTypeId: string | null;
}

export interface PlacedDetector {
  sched: ScheduleDetector;
  cat: Detector;
}

export interface ResolvedInput {
  input: LayoutInput;
  board: ResolvedBoard;
  detectors: PlacedDetector[];
}

export interface Resolved {
  layout: LayoutDocument;
  panel: Panel;
  ix: CatalogIndex;
  names: Map<string, string>;
  /** The panel first, then boards in layout order. */
  boards: ResolvedBoard[];
  byKey: Map<string, ResolvedBoard>;
  /** Inputs holding at least one known detector, on an existing board, within its input count, first occurrence only. */
  inputs: ResolvedInput[];
  placed: Set<string>;
}

const inputTarget = (inp: LayoutInput) => ({ kind: "input" as const, boardKey: inp.boardKey, input: inp.input });
const inputWhere = (names: Map<string, string>, inp: LayoutInput) => `${names.get(inp.boardKey) ?? "A board not in this layout"}, input ${inp.input}`;

/** Resolved detectors of an input object from an earlier solve; the schedule and catalog are fixed for one cache. */
export type DetectorCache = WeakMap<LayoutInput, { ids: string[]; detectors: PlacedDetector[] }>;

/** The fast path: the same input object, the same ids, none placed elsewhere. Null sends the input down the slow path. */
function resolveDetectors(inp: LayoutInput, cache: DetectorCache, placed: Set<string>): PlacedDetector[] | null {
  const c = cache.get(inp);
  if (!c || c.ids.length !== inp.detectorIds.length) return null;
  for (let i = 0; i < c.ids.length; i++) if (c.ids[i] !== inp.detectorIds[i] || placed.has(c.ids[i])) return null;
  if (c.ids.length === 2 && c.ids[0] === c.ids[1]) return null;
  for (const id of c.ids) placed.add(id);
  return c.detectors;
}

function resolveDetectorsSlowly(inp: LayoutInput, cache: DetectorCache, ix: CatalogIndex, schedule: Map<string, ScheduleDetector>, placed: Set<string>, names: Map<string, string>, out: Finding[]): PlacedDetector[] {
  const detectors: PlacedDetector[] = [];
  let complete = true;
  for (const id of inp.detectorIds) {
    const sched = schedule.get(id);
    if (!sched) {
      out.push({ code: "detector-unknown", severity: "error", message: `${inputWhere(names, inp)}: a detector placed here is no longer in the device schedule`, why: "It may have been deleted from the schedule after it was placed.", target: inputTarget(inp) });
      complete = false;
      continue;
    }
    if (placed.has(id)) {
      out.push({ code: "detector-placed-twice", severity: "error", message: `${sched.label} is placed on more than one input (again on ${inputWhere(names, inp)})`, why: "A detector is wired to one input.", target: { kind: "detector", detectorId: id } });
      complete = false;
      continue;
    }
    placed.add(id);
    const cat = ix.detectors.get(sched.catalogId);
    if (!cat && ix.wirelessDetectors.has(sched.catalogId)) {
      out.push({ code: "wireless-on-input", severity: "error", message: `${sched.label} is a wireless detector, placed on ${inputWhere(names, inp)}`, why: "A wireless detector has no loop; set it on a wireless receiver instead.", target: { kind: "detector", detectorId: id } });
      complete = false;
      continue;
    }
    if (!cat) {
      out.push({ code: "detector-type-unknown", severity: "error", message: `${sched.label}: its detector type is not in the catalog`, why: "Its contact, tamper and current are unknown, so its loop and power cannot be checked.", target: { kind: "detector", detectorId: id } });
      complete = false;
      continue;
    }
    detectors.push({ sched, cat });
  }
  if (complete) cache.set(inp, { ids: [...inp.detectorIds], detectors });
  return detectors;
}

export { isLifeSafety } from "@/lib/catalog/life-safety";

export function resolveLayout(
  layout: LayoutDocument,
  ix: CatalogIndex,
  schedule: Map<string, ScheduleDetector>,
  out: Finding[],
  cache: DetectorCache = new WeakMap(),
): Resolved | null {
  const panel = ix.panels.get(layout.panelId);
  if (!panel) {
    out.push({
      code: "panel-unknown",
      severity: "error",
      message: "The control panel chosen for this layout is not in the catalog",
      why: "Without the panel's figures nothing else in the layout can be checked.",
      target: { kind: "layout" },
    });
    return null;
  }
  const names = boardNames(layout);
  const panelType = ix.inputTypes.get(panel.onboardInputs.inputType);
  const panelBoard: ResolvedBoard = {
    key: PANEL_KEY,
    order: 0,
    name: "Control panel",
    board: null,
    entry: null,
    inputCount: panel.onboardInputs.count,
    inputType: panelType,
    inputTypeId: panel.onboardInputs.inputType,
  };
  const boards: ResolvedBoard[] = [panelBoard];
  const byKey = new Map<string, ResolvedBoard>([[PANEL_KEY, panelBoard]]);
  for (const b of layout.boards) {
    const name = names.get(b.key) ?? b.key;
    const target = { kind: "board" as const, boardKey: b.key };
    if (byKey.has(b.key)) {
      out.push({ code: "board-key-duplicate", severity: "error", message: `${name} is listed twice under one key`, why: "Inputs name their board by key; two boards with one key cannot be told apart.", target });
      continue;
    }
    const entry = boardEntry(ix, b.kind, b.catalogId);
    if (!entry)
      out.push({ code: "board-unknown", severity: "error", message: `${name}: this ${BOARD_KIND_WORDS[b.kind]} is not in the catalog`, why: "Its inputs, current and bus use are unknown, so they are left out of every total.", target });
    else if (!entry.entry.families.includes(panel.family))
      out.push({
        code: "board-family-mismatch",
        severity: "error",
        message: `${name} (${entry.entry.name}) works with the ${entry.entry.families.join(" or ")} family, not with the ${panel.family} family of ${panel.name}`,
        why: "A board from another family does not speak this panel's data bus.",
        target,
      });
    if (entry && ix.inputTypes.get(boardInputs(entry)?.inputType ?? "") === undefined && boardInputs(entry))
      out.push({ code: "input-type-unknown", severity: "error", message: `${name}: its input type is not in the catalog`, why: "Its inputs cannot be checked.", target });
    const block = entry ? boardInputs(entry) : null;
    const rb: ResolvedBoard = { key: b.key, order: boards.length, name, board: b, entry, inputCount: block?.count ?? 0, inputType: block ? ix.inputTypes.get(block.inputType) : undefined, inputTypeId: block?.inputType ?? null };
    boards.push(rb);
    byKey.set(b.key, rb);
  }
  if (!panelType)
    out.push({ code: "input-type-unknown", severity: "error", message: `${panel.name}: its input type is not in the catalog`, why: "Its inputs cannot be checked.", target: { kind: "board", boardKey: PANEL_KEY } });

  const inputs: ResolvedInput[] = [];
  const seen = new Map<string, Uint8Array>();
  for (const b of boards) seen.set(b.key, new Uint8Array(b.inputCount + 1));
  const placed = new Set<string>();
  for (const inp of layout.inputs) {
    if (inp.detectorIds.length === 0) continue;
    const board = byKey.get(inp.boardKey);
    if (!board) {
      out.push({ code: "input-board-unknown", severity: "error", message: `Input ${inp.input} of a board that is not in this layout`, why: "Detectors on a board that is not there are not wired anywhere.", target: inputTarget(inp) });
      continue;
    }
    if (!board.entry && board.key !== PANEL_KEY) continue; // board-unknown already said so
    if (!Number.isInteger(inp.input) || inp.input < 1 || inp.input > board.inputCount) {
      out.push({
        code: "input-out-of-range",
        severity: "error",
        message: board.inputCount === 0 ? `${inputWhere(names, inp)}: ${board.name} has no inputs` : `${inputWhere(names, inp)}: ${board.name} has inputs 1 to ${board.inputCount}`,
        why: "There is no such terminal pair to wire the detector to.",
        target: inputTarget(inp),
      });
      continue;
    }
    const used = seen.get(board.key)!;
    if (used[inp.input]) {
      out.push({ code: "input-duplicate", severity: "error", message: `${inputWhere(names, inp)} is listed twice`, why: "One terminal pair measures one loop.", target: inputTarget(inp) });
      continue;
    }
    used[inp.input] = 1;
    const detectors = resolveDetectors(inp, cache, placed) ?? resolveDetectorsSlowly(inp, cache, ix, schedule, placed, names, out);
    if (detectors.length > 0) inputs.push({ input: inp, board, detectors });
  }
  // Keep figures in board order, then input number, whatever order the document lists inputs in.
  const before = (a: ResolvedInput, b: ResolvedInput) => a.board.order - b.board.order || a.input.input - b.input.input;
  let sorted = true;
  for (let i = 1; i < inputs.length && sorted; i++) if (before(inputs[i - 1], inputs[i]) > 0) sorted = false;
  if (!sorted) inputs.sort(before);
  return { layout, panel, ix, names, boards, byKey, inputs, placed };
}

export function unplacedFinding(unplaced: ScheduleDetector[]): Finding | null {
  if (unplaced.length === 0) return null;
  return {
    code: "detectors-unplaced",
    severity: "warning",
    message: `${plural(unplaced.length, "detector")} ${pluralWord(unplaced.length, "is", "are")} not on any input: ${listNames(unplaced.map((d) => d.label))}`,
    why: "An unplaced detector is not wired anywhere and reports nothing.",
    target: { kind: "layout" },
  };
}
