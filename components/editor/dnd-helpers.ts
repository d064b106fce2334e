import { closestCenter, pointerWithin, rectIntersection, type CollisionDetection, type DroppableContainer, type KeyboardCoordinateGetter, type UniqueIdentifier } from "@dnd-kit/core";
import { sortableKeyboardCoordinates } from "@dnd-kit/sortable";

// Drag-and-drop plumbing of the editor: what may be dropped where, and arrow keys that jump between drop targets.

const typeOf = (data: unknown): string | undefined => (data as { current?: { type?: string } } | undefined)?.current?.type;
const accepts = (data: unknown): string[] => (data as { current?: { accepts?: string[] } } | undefined)?.current?.accepts ?? [];

/** Detectors only land on inputs and the unplaced list, boards only on board positions; the pointer decides where it can. */
export const editorCollisions: CollisionDetection = (args) => {
  const type = typeOf(args.active.data);
  const droppableContainers = args.droppableContainers.filter((c) => type !== undefined && accepts(c.data).includes(type));
  const narrowed = { ...args, droppableContainers };
  if (type === "board") return closestCenter(narrowed);
  // the pointer decides where it can; a keyboard drag (no pointer) lands where the dragged chip overlaps most
  const hits = args.pointerCoordinates ? pointerWithin(narrowed) : [];
  if (hits.length) return hits;
  const overlaps = rectIntersection(narrowed);
  return overlaps.length ? overlaps : closestCenter(narrowed);
};

/**
 * Arrow keys while a detector is picked up: down or right to the next drop target in reading order
 * (the unplaced list, then each board's inputs), up or left to the one before.
 */
/** The drop targets in reading order, updated after each render, read when an arrow key is pressed. */
export class DropTargetOrder {
  private ids: string[] = [];
  private outputIds: string[] = [];
  set(ids: string[], outputIds: string[] = []) {
    this.ids = ids;
    this.outputIds = outputIds;
  }
  /** A sounder or strobe moves between outputs; a detector between inputs. */
  get(type?: string): string[] {
    return type === "output-device" ? this.outputIds : this.ids;
  }
}

export function editorKeyboardCoordinates(order: DropTargetOrder): KeyboardCoordinateGetter {
  return (event, args) => {
    const { context } = args;
    if (typeOf(context.active?.data) === "board") {
      // the sortable helper looks at every drop target; a board only goes to another board's place
      const all = context.droppableContainers;
      const Same = all.constructor as new (entries: [UniqueIdentifier, DroppableContainer][]) => typeof all;
      const boards = new Same([...all.entries()].filter(([, c]) => accepts(c.data).includes("board")));
      return sortableKeyboardCoordinates(event, { ...args, context: { ...context, droppableContainers: boards } });
    }
    const step = event.code === "ArrowDown" || event.code === "ArrowRight" ? 1 : event.code === "ArrowUp" || event.code === "ArrowLeft" ? -1 : 0;
    if (!step) return undefined;
    event.preventDefault();
    const cr = context.collisionRect;
    if (!cr) return undefined;
    const ids = order.get(typeOf(context.active?.data)).filter((id) => context.droppableRects.has(id));
    // before the first move there may be no "over" yet: the target under the chip's centre is where it starts
    const cx = cr.left + cr.width / 2;
    const cy = cr.top + cr.height / 2;
    const under = ids.findIndex((id) => {
      const r = context.droppableRects.get(id)!;
      return cx >= r.left && cx <= r.left + r.width && cy >= r.top && cy <= r.top + r.height;
    });
    const at = context.over && ids.includes(String(context.over.id)) ? ids.indexOf(String(context.over.id)) : under;
    let next = at < 0 ? (step > 0 ? 0 : ids.length - 1) : at + step;
    // leaving the unplaced list (always in view beside the boards), start at the first input in view rather
    // than one scrolled out above: the sensor scrolls the page in the arrow's direction only
    if (step > 0 && at <= 0) {
      const firstInView = ids.findIndex((id, i) => i > 0 && context.droppableRects.get(id)!.top >= 0 && context.droppableRects.get(id)!.top < window.innerHeight);
      if (firstInView > 0) next = firstInView;
    }
    if (next < 0 || next >= ids.length) return undefined;
    const rect = context.droppableRects.get(ids[next])!;
    return { x: rect.left + rect.width / 2 - cr.width / 2, y: rect.top + rect.height / 2 - cr.height / 2 };
  };
}
