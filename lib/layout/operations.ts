import { isLifeSafety } from "@/lib/catalog/life-safety";
import type { Catalog, InputType, WiringScheme } from "@/lib/catalog/schema";
import type { Schedule, ScheduleDetector, SupervisionPreference } from "@/lib/schedule/schema";
import { boardEntry, boardInputs, indexCatalog, type CatalogIndex } from "@/lib/layout/catalog-index";
import { boardName, inputName } from "@/lib/layout/names";
import { PANEL_KEY, type BoardKind, type InputRef, type LayoutBoard, type LayoutDocument, type LayoutInput } from "@/lib/layout/schema";
import { plural } from "@/lib/vocabulary/plural";
import { BOARD_KIND_WORDS, PLACEMENT_WORDS, SCHEME_WORDS } from "@/lib/vocabulary/words";
import { formatOhms } from "@/lib/resistors/format-ohms";

// Pure editor operations. Each returns a new document (the old one is untouched) and one sentence
// describing the change, for the screen-reader announcement. A refused edit returns the same document.

export interface LayoutContext {
  schedule: Schedule;
  catalog: Catalog;
}

export type LayoutEdit = { ok: true; layout: LayoutDocument; message: string } | { ok: false; layout: LayoutDocument; message: string };

const refuse = (layout: LayoutDocument, message: string): LayoutEdit => ({ ok: false, layout, message });
const done = (layout: LayoutDocument, message: string): LayoutEdit => ({ ok: true, layout, message });

function detectorOf(ctx: LayoutContext, id: string): ScheduleDetector | undefined {
  return ctx.schedule.find((d) => d.id === id);
}

function label(ctx: LayoutContext, id: string): string {
  return detectorOf(ctx, id)?.label ?? id;
}

/** The input count and input type of a board (or the panel), or null when the board or its catalog entry is missing. */
export function inputBlockOf(doc: LayoutDocument, ix: CatalogIndex, boardKey: string): { count: number; inputType: InputType | undefined } | null {
  if (boardKey === PANEL_KEY) {
    const p = ix.panels.get(doc.panelId);
    return p ? { count: p.onboardInputs.count, inputType: ix.inputTypes.get(p.onboardInputs.inputType) } : null;
  }
  const b = doc.boards.find((x) => x.key === boardKey);
  const e = b && boardEntry(ix, b.kind, b.catalogId);
  const block = e && boardInputs(e);
  return block ? { count: block.count, inputType: ix.inputTypes.get(block.inputType) } : null;
}

/** The scheme a new input gets: the detector's preference where the input type supports it, else the best supervised one it has. */
export function defaultScheme(type: InputType | undefined, preference: SupervisionPreference | undefined): WiringScheme {
  const schemes = type?.schemes ?? ["single-eol"];
  const wanted: WiringScheme[] =
    preference === "none" ? ["none", "single-eol", "double-eol"] : preference === "single-eol" ? ["single-eol", "double-eol"] : ["double-eol", "single-eol"];
  return wanted.find((s) => schemes.includes(s)) ?? schemes.find((s) => s !== "shared") ?? schemes[0];
}

export function findDetector(doc: LayoutDocument, detectorId: string): { index: number; input: LayoutInput } | null {
  const index = doc.inputs.findIndex((i) => i.detectorIds.includes(detectorId));
  return index < 0 ? null : { index, input: doc.inputs[index] };
}

const sameRef = (a: InputRef, b: InputRef) => a.boardKey === b.boardKey && a.input === b.input;

/** Detector ids in the schedule that are on no input, in schedule order. */
export function unplacedDetectorIds(doc: LayoutDocument, schedule: Schedule): string[] {
  const placed = new Set(doc.inputs.flatMap((i) => i.detectorIds));
  return schedule.filter((d) => !placed.has(d.id)).map((d) => d.id);
}

/** Takes a detector off its input; an emptied input disappears, a shared input left with one detector goes back to a plain scheme. */
function without(doc: LayoutDocument, ctx: LayoutContext, detectorId: string): LayoutDocument {
  const at = findDetector(doc, detectorId);
  if (!at) return doc;
  const rest = at.input.detectorIds.filter((d) => d !== detectorId);
  const inputs = doc.inputs.slice();
  if (rest.length === 0) inputs.splice(at.index, 1);
  else if (at.input.scheme === "shared") {
    const block = inputBlockOf(doc, indexCatalog(ctx.catalog), at.input.boardKey);
    const { sharedOhms: _s, alarmOhms: _a, eolOhms: _e, ...plain } = at.input;
    inputs[at.index] = { ...plain, detectorIds: rest, scheme: defaultScheme(block?.inputType, detectorOf(ctx, rest[0])?.supervision) };
  } else inputs[at.index] = { ...at.input, detectorIds: rest };
  return { ...doc, inputs };
}

function checkTarget(doc: LayoutDocument, ctx: LayoutContext, to: InputRef): string | null {
  const block = inputBlockOf(doc, indexCatalog(ctx.catalog), to.boardKey);
  if (!block) return `${boardName(doc, to.boardKey)} has no inputs`;
  if (!Number.isInteger(to.input) || to.input < 1 || to.input > block.count) return `${boardName(doc, to.boardKey)} has inputs 1 to ${block.count}, not ${to.input}`;
  return null;
}

/** Place a detector on an empty input (or move it there from another input). */
export function assign(doc: LayoutDocument, ctx: LayoutContext, detectorId: string, to: InputRef): LayoutEdit {
  const det = detectorOf(ctx, detectorId);
  if (!det) return refuse(doc, `Detector ${detectorId} is not in the device schedule`);
  const bad = checkTarget(doc, ctx, to);
  if (bad) return refuse(doc, bad);
  const from = findDetector(doc, detectorId);
  if (from && sameRef(from.input, to)) return refuse(doc, `${det.label} is already on ${inputName(doc, to)}`);
  const occupant = doc.inputs.find((i) => sameRef(i, to) && i.detectorIds.length > 0);
  if (occupant)
    return refuse(doc, `${inputName(doc, to)} is taken by ${occupant.detectorIds.map((d) => label(ctx, d)).join(" and ")}; drop onto it to share it, or choose a free input`);
  const base = without(doc, ctx, detectorId);
  const block = inputBlockOf(base, indexCatalog(ctx.catalog), to.boardKey);
  const entry: LayoutInput = { boardKey: to.boardKey, input: to.input, detectorIds: [detectorId], scheme: defaultScheme(block?.inputType, det.supervision), placement: "at-detector" };
  const inputs = base.inputs.filter((i) => !sameRef(i, to));
  inputs.push(entry);
  const layout = { ...base, inputs };
  return done(layout, from ? `${det.label} moved from ${inputName(doc, from.input)} to ${inputName(doc, to)}` : `${det.label} placed on ${inputName(doc, to)}`);
}

/** Put a detector back among the unplaced. */
export function unassign(doc: LayoutDocument, ctx: LayoutContext, detectorId: string): LayoutEdit {
  const at = findDetector(doc, detectorId);
  if (!at) return refuse(doc, `${label(ctx, detectorId)} is not placed`);
  return done(without(doc, ctx, detectorId), `${label(ctx, detectorId)} back to unplaced, was on ${inputName(doc, at.input)}`);
}

/** Move an input's detectors and wiring to another input; when the other input is in use the two swap. */
export function moveBetween(doc: LayoutDocument, ctx: LayoutContext, from: InputRef, to: InputRef): LayoutEdit {
  if (sameRef(from, to)) return refuse(doc, `${inputName(doc, from)} is already there`);
  const src = doc.inputs.find((i) => sameRef(i, from));
  if (!src || src.detectorIds.length === 0) return refuse(doc, `${inputName(doc, from)} is empty`);
  const bad = checkTarget(doc, ctx, to);
  if (bad) return refuse(doc, bad);
  const ix = indexCatalog(ctx.catalog);
  const dst = doc.inputs.find((i) => sameRef(i, to) && i.detectorIds.length > 0);
  const fits = (entry: LayoutInput, ref: InputRef): LayoutInput => {
    const type = inputBlockOf(doc, ix, ref.boardKey)?.inputType;
    const moved = { ...entry, boardKey: ref.boardKey, input: ref.input };
    if (type && !type.schemes.includes(entry.scheme)) {
      if (entry.scheme === "shared") return moved; // kept so the solver flags it: the editor never splits a pair silently
      return { ...moved, scheme: defaultScheme(type, undefined) };
    }
    return moved;
  };
  const inputs = doc.inputs.filter((i) => !sameRef(i, from) && !sameRef(i, to));
  inputs.push(fits(src, to));
  if (dst) inputs.push(fits(dst, from));
  const names = (e: LayoutInput) => e.detectorIds.map((d) => label(ctx, d)).join(" and ");
  return done(
    { ...doc, inputs },
    dst ? `${inputName(doc, from)} and ${inputName(doc, to)} swapped: ${names(src)} now on input ${to.input}, ${names(dst)} on input ${from.input}` : `${names(src)} moved from ${inputName(doc, from)} to ${inputName(doc, to)}`,
  );
}

/** Drop a detector onto an input holding one other detector, making it a shared input where the input type allows it. */
export function makeShared(doc: LayoutDocument, ctx: LayoutContext, detectorId: string, to: InputRef): LayoutEdit {
  const det = detectorOf(ctx, detectorId);
  if (!det) return refuse(doc, `Detector ${detectorId} is not in the device schedule`);
  const bad = checkTarget(doc, ctx, to);
  if (bad) return refuse(doc, bad);
  const ix = indexCatalog(ctx.catalog);
  const target = doc.inputs.find((i) => sameRef(i, to));
  if (!target || target.detectorIds.length === 0) return assign(doc, ctx, detectorId, to);
  if (target.detectorIds.includes(detectorId)) return refuse(doc, `${det.label} is already on ${inputName(doc, to)}`);
  if (target.detectorIds.length >= 2) return refuse(doc, `${inputName(doc, to)} already holds two detectors`);
  const type = inputBlockOf(doc, ix, to.boardKey)?.inputType;
  if (!type?.schemes.includes("shared")) return refuse(doc, `${inputName(doc, to)} cannot be shared: its input type does not take two detectors`);
  const other = target.detectorIds[0];
  const lifeSafety = [detectorId, other].find((d) => {
    const c = ix.detectors.get(detectorOf(ctx, d)?.catalogId ?? "");
    return !!c && isLifeSafety(c);
  });
  if (lifeSafety) return refuse(doc, `${label(ctx, lifeSafety)} is a life-safety device and must have an input of its own`);
  const base = without(doc, ctx, detectorId);
  const i = base.inputs.findIndex((x) => sameRef(x, to));
  const { alarmOhms: _a, sharedOhms: _s, ...plain } = base.inputs[i];
  const inputs = base.inputs.slice();
  inputs[i] = { ...plain, detectorIds: [other, detectorId], scheme: "shared" };
  return done({ ...base, inputs }, `${det.label} shares ${inputName(doc, to)} with ${label(ctx, other)}`);
}

const RESISTOR_WORDS = { eolOhms: "end-of-line resistor", alarmOhms: "alarm resistor", sharedOhms: "shared input resistors" } as const;

/** Add a board at the end, with the lowest free bus address when it takes one. */
export function addBoard(doc: LayoutDocument, ctx: LayoutContext, kind: BoardKind, catalogId: string, boardLabel?: string, busRunM?: number): LayoutEdit {
  const ix = indexCatalog(ctx.catalog);
  const entry = boardEntry(ix, kind, catalogId);
  if (!entry) return refuse(doc, `That ${BOARD_KIND_WORDS[kind]} is not in the catalog`);
  const keys = new Set(doc.boards.map((b) => b.key));
  let n = doc.boards.length + 1;
  for (let k = 1; ; k++)
    if (!keys.has(`b${k}`)) {
      n = k;
      break;
    }
  let busAddress: number | null = null;
  const panel = ix.panels.get(doc.panelId);
  if (entry.entry.takesBusAddress && panel) {
    const used = new Set(doc.boards.map((b) => b.busAddress));
    for (let a = panel.bus.addressMin; a <= panel.bus.addressMax; a++)
      if (!used.has(a)) {
        busAddress = a;
        break;
      }
  }
  // a bus device adds its run of data bus cable to the total; a run of 0 m or less is refused rather than kept
  const onBus = entry.entry.takesBusAddress;
  if (onBus && busRunM !== undefined && !(Number.isFinite(busRunM) && busRunM > 0)) return refuse(doc, "Give the length of data bus cable to the new board, more than 0 m");
  const board: LayoutBoard = { key: `b${n}`, kind, catalogId, busAddress, ...(boardLabel ? { label: boardLabel } : {}) };
  const busCableM = onBus && busRunM !== undefined ? Math.round((doc.busCableM + busRunM) * 100) / 100 : doc.busCableM;
  const layout = { ...doc, boards: [...doc.boards, board], busCableM };
  const name = boardName(layout, board.key);
  const where = !onBus ? "" : busAddress === null ? ", with no free bus address" : ` at bus address ${busAddress}`;
  const run = busCableM !== doc.busCableM ? `; data bus cable now ${busCableM} m` : "";
  return done(layout, `${name} added${where}${run}`);
}

/** Remove a board; its detectors go back to the unplaced, boards it powered go back to the panel's auxiliary output. */
export function removeBoard(doc: LayoutDocument, ctx: LayoutContext, boardKey: string): LayoutEdit {
  if (!doc.boards.some((b) => b.key === boardKey)) return refuse(doc, `No board ${boardKey} to remove`);
  const name = boardName(doc, boardKey);
  const freed = doc.inputs.filter((i) => i.boardKey === boardKey).reduce((n, i) => n + i.detectorIds.length, 0);
  let repowered = 0;
  const boards = doc.boards
    .filter((b) => b.key !== boardKey)
    .map((b) => {
      if (b.poweredBy !== boardKey) return b;
      repowered++;
      const { poweredBy: _p, ...rest } = b;
      return rest;
    });
  const parts = [`${name} removed`];
  if (freed) parts.push(`${plural(freed, "detector")} back to unplaced`);
  if (repowered) parts.push(`${plural(repowered, "board")} now on the panel's auxiliary output`);
  // sounders and strobes on its outputs go back to no output; wireless detectors it learnt back to unplaced
  const outputs = doc.outputs?.filter((o) => o.boardKey !== boardKey);
  const wireless = doc.wireless?.filter((w) => w.boardKey !== boardKey);
  return done({ ...doc, boards, inputs: doc.inputs.filter((i) => i.boardKey !== boardKey), ...(outputs ? { outputs } : {}), ...(wireless ? { wireless } : {}) }, parts.join("; "));
}

/** Move the board at `fromIndex` to `toIndex` in the board list. */
export function reorderBoards(doc: LayoutDocument, _ctx: LayoutContext, fromIndex: number, toIndex: number): LayoutEdit {
  const n = doc.boards.length;
  if (!(fromIndex >= 0 && fromIndex < n && toIndex >= 0 && toIndex < n) || fromIndex === toIndex) return refuse(doc, "Board order unchanged");
  const name = boardName(doc, doc.boards[fromIndex].key);
  const boards = doc.boards.slice();
  const [b] = boards.splice(fromIndex, 1);
  boards.splice(toIndex, 0, b);
  return done({ ...doc, boards }, `${name} moved to position ${toIndex + 1} of ${n}`);
}

export function setBusAddress(doc: LayoutDocument, _ctx: LayoutContext, boardKey: string, busAddress: number | null): LayoutEdit {
  const i = doc.boards.findIndex((b) => b.key === boardKey);
  if (i < 0) return refuse(doc, `No board ${boardKey}`);
  if (busAddress !== null && !(Number.isInteger(busAddress) && busAddress >= 0)) return refuse(doc, `${busAddress} is not a bus address`);
  const boards = doc.boards.slice();
  boards[i] = { ...boards[i], busAddress };
  return done({ ...doc, boards }, `${boardName(doc, boardKey)} ${busAddress === null ? "has no bus address" : `set to bus address ${busAddress}`}`);
}

/** Power a board from a supply board (a board key), or from the panel's auxiliary output (null). */
export function setPoweredBy(doc: LayoutDocument, _ctx: LayoutContext, boardKey: string, supplyKey: string | null): LayoutEdit {
  const i = doc.boards.findIndex((b) => b.key === boardKey);
  if (i < 0) return refuse(doc, `No board ${boardKey}`);
  if (supplyKey !== null && !doc.boards.some((b) => b.key === supplyKey && b.kind === "supply")) return refuse(doc, `${boardName(doc, supplyKey)} is not a power supply`);
  if (supplyKey === boardKey) return refuse(doc, "A board cannot power itself");
  const boards = doc.boards.slice();
  const { poweredBy: _p, ...rest } = boards[i];
  boards[i] = supplyKey === null ? rest : { ...rest, poweredBy: supplyKey };
  return done({ ...doc, boards }, `${boardName(doc, boardKey)} powered from ${supplyKey === null ? "the panel's auxiliary output" : boardName(doc, supplyKey)}`);
}

export interface WiringPatch {
  scheme?: WiringScheme;
  placement?: LayoutInput["placement"];
  /** null clears the fitted value (back to the input type's expected value). */
  eolOhms?: number | null;
  alarmOhms?: number | null;
  sharedOhms?: [number, number] | null;
  /** "class-a" returns the loop to the input (NFPA 72 Class A); "class-b" is the default and clears the field. */
  pathway?: "class-a" | "class-b";
}

/** Whether an input of this type, wired this way, may return its loop to the panel: a life-safety input type on an end-of-line scheme. */
export function classAAllowed(type: InputType | undefined, scheme: WiringScheme): boolean {
  return !!type?.lifeSafety && (scheme === "single-eol" || scheme === "double-eol");
}

/** Change how an input is wired: scheme, where the resistors are, and the fitted values. */
export function setInputWiring(doc: LayoutDocument, ctx: LayoutContext, at: InputRef, patch: WiringPatch): LayoutEdit {
  const i = doc.inputs.findIndex((x) => sameRef(x, at));
  if (i < 0) return refuse(doc, `${inputName(doc, at)} is empty`);
  const next: LayoutInput = { ...doc.inputs[i] };
  if (patch.scheme) next.scheme = patch.scheme;
  if (patch.placement) next.placement = patch.placement;
  for (const k of ["eolOhms", "alarmOhms", "sharedOhms"] as const) {
    const v = patch[k];
    if (v === null) delete next[k];
    else if (v !== undefined) (next as Record<string, unknown>)[k] = v;
  }
  if (patch.pathway === "class-a") next.pathway = "class-a";
  else if (patch.pathway === "class-b") delete next.pathway;
  const type = inputBlockOf(doc, indexCatalog(ctx.catalog), at.boardKey)?.inputType;
  if (type && !type.schemes.includes(next.scheme)) return refuse(doc, `${inputName(doc, at)} does not take ${SCHEME_WORDS[next.scheme]} wiring`);
  if (next.pathway === "class-a" && !classAAllowed(type, next.scheme)) return refuse(doc, `${inputName(doc, at)} can't return its loop to the panel (Class A): that needs a life-safety input type wired single or double end-of-line`);
  const inputs = doc.inputs.slice();
  inputs[i] = next;
  const bits: string[] = [];
  if (patch.scheme) bits.push(SCHEME_WORDS[patch.scheme]);
  if (patch.placement) bits.push(PLACEMENT_WORDS[patch.placement]);
  if (patch.pathway) bits.push(patch.pathway === "class-a" ? "return path to the panel (Class A)" : "no return path (Class B)");
  for (const k of ["eolOhms", "alarmOhms", "sharedOhms"] as const) {
    const v = patch[k];
    if (v === undefined) continue;
    bits.push(v === null ? `${RESISTOR_WORDS[k]} as the input type expects` : `${RESISTOR_WORDS[k]} ${(Array.isArray(v) ? v : [v]).map(formatOhms).join(" and ")}`);
  }
  return done({ ...doc, inputs }, `${inputName(doc, at)} wiring set: ${bits.join(", ") || "no change"}`);
}
