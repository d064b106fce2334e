"use client";

import { KeyboardSensor, PointerSensor, useSensor, useSensors, type Announcements, type DragEndEvent, type DragStartEvent } from "@dnd-kit/core";
import { useLayoutEffect, useMemo, useRef, useState, type RefObject } from "react";
import type { CatalogIndex } from "@/lib/layout/catalog-index";
import type { LayoutContext, LayoutEdit } from "@/lib/layout/operations";
import type { LayoutDocument } from "@/lib/layout/schema";
import { DropTargetOrder, editorKeyboardCoordinates } from "@/components/editor/dnd-helpers";
import { dragOriginId, dragPlace, dropTargetIds } from "@/components/editor/drag-model";
import { outputDropTargetIds } from "@/components/editor/output-drag-model";
import { dropEdit, overSentence, parseDragId, parseDropId, type DragItem } from "@/components/editor/editor-model";

// Drag and drop of the editor: sensors (pointer and keyboard), the screen reader's sentences, and the drop.

export function useEditorDnd(opts: {
  doc: LayoutDocument;
  docRef: RefObject<LayoutDocument>;
  ctx: LayoutContext;
  ix: CatalogIndex;
  labelOf: (detectorId: string) => string;
  apply: (edit: LayoutEdit | null, live?: boolean) => void;
  select: (detectorId: string | null) => void;
}) {
  const { doc, docRef, ctx, ix, labelOf, apply, select } = opts;
  const [activeDrag, setActiveDrag] = useState<DragItem | null>(null);

  // Keyboard drags jump between drop targets in reading order: the unplaced list, then every input of every board.
  const [targets] = useState(() => new DropTargetOrder());
  const orderIds = useMemo(() => dropTargetIds(doc, ix), [doc, ix]);
  const outputOrderIds = useMemo(() => outputDropTargetIds(doc, ix), [doc, ix]);
  useLayoutEffect(() => targets.set(orderIds, outputOrderIds), [targets, orderIds, outputOrderIds]);
  const coordinateGetter = useMemo(() => editorKeyboardCoordinates(targets), [targets]);
  const sensors = useSensors(
    useSensor(PointerSensor, { activationConstraint: { distance: 6 } }),
    useSensor(KeyboardSensor, { coordinateGetter, keyboardCodes: { start: ["Space"], cancel: ["Escape"], end: ["Space", "Enter"] } }),
  );

  const where = (item: DragItem) => dragPlace(docRef.current, ix, item, labelOf);
  const between = (item: DragItem) => (item.type === "board" ? "board positions" : item.type === "output-device" ? "outputs" : "inputs");
  // where the dragged item started: being "over" it before any move is not news (it would drown "Picked up")
  const dragOrigin = useRef<{ id: string; left: boolean }>({ id: "", left: false });
  const announcements: Announcements = {
    onDragStart: ({ active }) => {
      const item = parseDragId(active.id);
      if (item) dragOrigin.current = { id: dragOriginId(docRef.current, item), left: false };
      return item ? `Picked up ${where(item)}. Arrow keys move between ${between(item)}, Space drops, Escape cancels.` : undefined;
    },
    onDragOver: ({ active, over }) => {
      const item = parseDragId(active.id);
      if (!item) return undefined;
      if (!dragOrigin.current.left && String(over?.id ?? "") === dragOrigin.current.id) return undefined;
      dragOrigin.current.left = true;
      return overSentence(docRef.current, ctx, item, parseDropId(over?.id));
    },
    onDragEnd: ({ active, over }) => {
      const item = parseDragId(active.id);
      if (!item) return undefined;
      const edit = dropEdit(docRef.current, ctx, item, parseDropId(over?.id));
      return edit ? edit.message : `Dropped; ${where(item)}, unchanged`;
    },
    onDragCancel: ({ active }) => {
      const item = parseDragId(active.id);
      return item ? `Cancelled; ${where(item)}, unchanged` : undefined;
    },
  };

  const onDragStart = (e: DragStartEvent) => setActiveDrag(parseDragId(e.active.id));
  const onDragEnd = (e: DragEndEvent) => {
    setActiveDrag(null);
    const item = parseDragId(e.active.id);
    if (!item) return;
    // the drag's own live region reads the sentence; the message line shows it
    apply(dropEdit(docRef.current, ctx, item, parseDropId(e.over?.id)), false);
    if (item.type === "detector") select(null);
  };
  const onDragCancel = () => setActiveDrag(null);

  return { sensors, announcements, activeDrag, onDragStart, onDragEnd, onDragCancel };
}

export type EditorDnd = ReturnType<typeof useEditorDnd>;
