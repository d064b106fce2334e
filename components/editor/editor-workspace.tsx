"use client";

import { DndContext, DragOverlay } from "@dnd-kit/core";
import { SortableContext, verticalListSortingStrategy } from "@dnd-kit/sortable";
import { BoardCard, PanelCard } from "@/components/editor/board-card";
import { ChipFace } from "@/components/editor/detector-chip";
import { editorCollisions } from "@/components/editor/dnd-helpers";
import { useEditor } from "@/components/editor/editor-context";
import { boardSortId } from "@/components/editor/editor-model";
import { FiguresPanel } from "@/components/editor/figures-panel";
import { FindingsPanel } from "@/components/editor/findings-panel";
import { SettingsPanel } from "@/components/editor/settings-panel";
import { UnplacedList } from "@/components/editor/unplaced-list";
import { AreasGradePanel } from "@/components/editor/areas-grade-panel";
import { OutputDeviceFace } from "@/components/editor/output-device-chip";
import { OutputDeviceList } from "@/components/editor/output-device-list";
import type { EditorDnd } from "@/components/editor/use-editor-dnd";

const DRAG_INSTRUCTIONS =
  "Press Space to pick up. Arrow keys move between inputs, between outputs for a sounder or strobe, or between board positions for a board. Space drops, Escape cancels. Or press Enter to select a detector and use an input's Place here button.";

/** The three columns under drag and drop: unplaced detectors, the panel and its boards, findings and settings. */
export function EditorWorkspace({ dnd }: { dnd: EditorDnd }) {
  const { doc, canWrite } = useEditor();
  const boardIds = doc.boards.map((b) => boardSortId(b.key));
  return (
    <DndContext
      sensors={canWrite ? dnd.sensors : []}
      collisionDetection={editorCollisions}
      onDragStart={dnd.onDragStart}
      onDragEnd={dnd.onDragEnd}
      onDragCancel={dnd.onDragCancel}
      accessibility={{ announcements: dnd.announcements, screenReaderInstructions: { draggable: DRAG_INSTRUCTIONS } }}
    >
      <div className="grid grid-cols-1 gap-4 lg:grid-cols-[15rem_minmax(0,1fr)_20rem] 2xl:grid-cols-[17rem_minmax(0,1fr)_24rem]">
        <aside className="lg:sticky lg:top-4 lg:flex lg:max-h-[calc(100vh-2rem)] lg:flex-col lg:self-start">
          <UnplacedList />
          <OutputDeviceList />
        </aside>
        <div className="flex min-w-0 flex-col gap-3" data-testid="boards">
          <PanelCard />
          <SortableContext items={boardIds} strategy={verticalListSortingStrategy}>
            {doc.boards.map((b, i) => (
              <BoardCard key={b.key} board={b} index={i} />
            ))}
          </SortableContext>
          {canWrite ? <p className="text-xs text-slate-500">Add expansion boards, keypads and power supplies under Hardware and power.</p> : null}
        </div>
        <div className="flex min-w-0 flex-col gap-3 lg:sticky lg:top-4 lg:max-h-[calc(100vh-2rem)] lg:self-start lg:overflow-y-auto">
          <FindingsPanel />
          <FiguresPanel />
          <AreasGradePanel />
          <SettingsPanel />
        </div>
      </div>
      <DragOverlay dropAnimation={null}>
        {dnd.activeDrag?.type === "detector" ? (
          <div className="w-56 rounded-md border border-signal bg-white px-2 py-1 text-xs shadow-lg">
            <ChipFace detectorId={dnd.activeDrag.detectorId} />
          </div>
        ) : dnd.activeDrag?.type === "output-device" ? (
          <div className="w-56 rounded-md border border-signal bg-white px-2 py-1 text-xs shadow-lg">
            <OutputDeviceFace deviceId={dnd.activeDrag.deviceId} />
          </div>
        ) : null}
      </DragOverlay>
    </DndContext>
  );
}
