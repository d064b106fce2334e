import type { CatalogIndex } from "@/lib/layout/catalog-index";
import { boardName } from "@/lib/layout/names";
import type { LayoutContext, LayoutEdit } from "@/lib/layout/operations";
import { slotsOf, type OutputSlot } from "@/lib/layout/outputs";
import { documentParts, PANEL_KEY, type LayoutDocument, type OutputRef } from "@/lib/layout/schema";
import { outputOf, placeOutputDevice } from "@/lib/layout/zone-output-operations";
import { OUTPUT_PURPOSE_WORDS } from "@/lib/vocabulary/words";

// Pure helpers of dragging sounders and strobes onto outputs, beside detectors onto inputs (editor-model.ts):
// the ids dnd-kit carries, what a drop does, the screen reader's sentences and the keyboard order of outputs.

export const outputDeviceDragId = (id: string) => `odev:${id}`;
export const outputDropId = (boardKey: string, output: number) => `out:${boardKey}:${output}`;
/** The list of the layout's sounders and strobes: dropping there takes one off its output. */
export const OUTPUT_POOL_DROP_ID = "output-pool";

export type OutputDragItem = { type: "output-device"; deviceId: string };
export type OutputDropTarget = { type: "output"; boardKey: string; output: number } | { type: "output-pool" };

export function parseOutputDragId(s: string): OutputDragItem | null {
  return s.startsWith("odev:") && s.length > 5 ? { type: "output-device", deviceId: s.slice(5) } : null;
}

export function parseOutputDropId(s: string): OutputDropTarget | null {
  if (s === OUTPUT_POOL_DROP_ID) return { type: "output-pool" };
  const m = /^out:([A-Za-z0-9_-]+):(\d+)$/.exec(s);
  return m ? { type: "output", boardKey: m[1], output: Number(m[2]) } : null;
}

/** "siren output 1", "programmable output 2": numbered within its purpose, as the board's terminals are marked. */
export function slotWords(slot: OutputSlot, slots: OutputSlot[]): string {
  return `${OUTPUT_PURPOSE_WORDS[slot.purpose]} ${slots.filter((s) => s.purpose === slot.purpose && s.output <= slot.output).length}`;
}

/** "Control panel, siren output 1"; the bare number where the board has no such output. */
export function outputName(doc: LayoutDocument, ix: CatalogIndex, ref: OutputRef): string {
  const slots = slotsOf(doc, ix, ref.boardKey);
  const slot = slots.find((s) => s.output === ref.output);
  return `${boardName(doc, ref.boardKey)}, ${slot ? slotWords(slot, slots) : `output ${ref.output}`}`;
}

/** Every output of the panel and its boards, in reading order. */
export function allOutputs(doc: LayoutDocument, ix: CatalogIndex): OutputSlot[] {
  return [PANEL_KEY, ...doc.boards.map((b) => b.key)].flatMap((k) => slotsOf(doc, ix, k));
}

/** Keyboard drop targets of a sounder or strobe: the list, then every output in reading order. */
export function outputDropTargetIds(doc: LayoutDocument, ix: CatalogIndex): string[] {
  return [OUTPUT_POOL_DROP_ID, ...allOutputs(doc, ix).map((s) => outputDropId(s.boardKey, s.output))];
}

const labelOf = (doc: LayoutDocument, id: string) => documentParts(doc).outputDevices.find((d) => d.id === id)?.label ?? "Unknown sounder or strobe";

/** What dropping a sounder or strobe does: onto an output it goes there (others stay with it), onto the list it comes off. Null: nothing to do. */
export function outputDropEdit(doc: LayoutDocument, ctx: LayoutContext, item: OutputDragItem, target: OutputDropTarget | null): LayoutEdit | null {
  if (!target) return null;
  const at = outputOf(doc, item.deviceId);
  if (target.type === "output-pool") return at ? placeOutputDevice(doc, ctx, item.deviceId, null) : null;
  if (at && at.boardKey === target.boardKey && at.output === target.output) return null;
  return placeOutputDevice(doc, ctx, item.deviceId, { boardKey: target.boardKey, output: target.output });
}

/** The sentence while a sounder or strobe is over a target. */
export function outputOverSentence(doc: LayoutDocument, ix: CatalogIndex, item: OutputDragItem, target: OutputDropTarget | null): string {
  const name = labelOf(doc, item.deviceId);
  if (!target) return `${name} is not over an output`;
  if (target.type === "output-pool") return `${name} is over the list of sounders and strobes`;
  const where = outputName(doc, ix, target);
  const here = documentParts(doc).outputs.find((o) => o.boardKey === target.boardKey && o.output === target.output)?.deviceIds ?? [];
  if (here.includes(item.deviceId)) return `${name} is over its own output, ${where}`;
  const others = here.map((id) => labelOf(doc, id));
  return others.length ? `${name} is over ${where}, with ${others.join(" and ")}` : `${name} is over ${where}, free`;
}

/** The dragged sounder or strobe and where it is. */
export function outputDragPlace(doc: LayoutDocument, ix: CatalogIndex, item: OutputDragItem): string {
  const at = outputOf(doc, item.deviceId);
  return `${labelOf(doc, item.deviceId)}${at ? `, on ${outputName(doc, ix, at)}` : ", on no output"}`;
}

/** The drop target it sits on before it moves. */
export function outputDragOriginId(doc: LayoutDocument, item: OutputDragItem): string {
  const at = outputOf(doc, item.deviceId);
  return at ? outputDropId(at.boardKey, at.output) : OUTPUT_POOL_DROP_ID;
}
