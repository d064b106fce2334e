import type { CatalogIndex } from "@/lib/layout/catalog-index";
import { inputBlockOf } from "@/lib/layout/operations";
import { boardName, inputName } from "@/lib/layout/names";
import { PANEL_KEY, type LayoutDocument } from "@/lib/layout/schema";
import { outputDragOriginId, outputDragPlace } from "@/components/editor/output-drag-model";
import { boardSortId, inputDropId, UNPLACED_DROP_ID, type DragItem } from "@/components/editor/editor-model";

// Pure helpers of the editor's drag and drop that read the document: the keyboard order of drop targets,
// where a dragged item starts, and the words that name it for the screen reader.

/** Drop targets in reading order: the unplaced list, then every input of the panel and of each board. */
export function dropTargetIds(doc: LayoutDocument, ix: CatalogIndex): string[] {
  const ids = [UNPLACED_DROP_ID];
  for (const key of [PANEL_KEY, ...doc.boards.map((b) => b.key)]) {
    const n = inputBlockOf(doc, ix, key)?.count ?? 0;
    for (let i = 1; i <= n; i++) ids.push(inputDropId(key, i));
  }
  return ids;
}

/** The drop target the item sits on before it moves. */
export function dragOriginId(doc: LayoutDocument, item: DragItem): string {
  if (item.type === "board") return boardSortId(item.boardKey);
  if (item.type === "output-device") return outputDragOriginId(doc, item);
  const at = doc.inputs.find((i) => i.detectorIds.includes(item.detectorId));
  return at ? inputDropId(at.boardKey, at.input) : UNPLACED_DROP_ID;
}

/** The dragged item and where it is: "Keypad 1, position 2 of 3", "Shop door, on Control panel, input 1". */
export function dragPlace(doc: LayoutDocument, ix: CatalogIndex, item: DragItem, labelOf: (detectorId: string) => string): string {
  if (item.type === "output-device") return outputDragPlace(doc, ix, item);
  if (item.type === "board") return `${boardName(doc, item.boardKey)}, position ${doc.boards.findIndex((b) => b.key === item.boardKey) + 1} of ${doc.boards.length}`;
  const at = doc.inputs.find((i) => i.detectorIds.includes(item.detectorId));
  return `${labelOf(item.detectorId)}${at ? `, on ${inputName(doc, at)}` : ", unplaced"}`;
}

/** The notice when detectors deleted from the schedule were taken off their inputs. */
export function removedNotice(count: number): string | null {
  return count ? `${count} detector${count === 1 ? " was" : "s were"} deleted from the device schedule since the last save and have been taken off their inputs.` : null;
}

/** The name of a layout made from changes that could not be saved over a newer version (at most 200 characters). */
export function copyName(name: string, kind: "reload" | "copy", stamp: string): string {
  return (kind === "reload" ? `${name} — my changes ${stamp}` : `${name} (copy ${stamp})`).slice(0, 200);
}
