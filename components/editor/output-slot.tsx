"use client";

import { useDroppable } from "@dnd-kit/core";
import { useEditor } from "@/components/editor/editor-context";
import { OutputDeviceChip } from "@/components/editor/output-device-chip";
import { outputDropId, slotWords } from "@/components/editor/output-drag-model";
import { boardName } from "@/lib/layout/names";
import { slotsOf, type OutputSlot as Slot } from "@/lib/layout/outputs";
import { documentParts } from "@/lib/layout/schema";
import { mA } from "@/lib/solver/supply-lines";

/** One output: its purpose, switching and rating, what it drives and draws; a drop target for sounders and strobes. */
function OutputSlot({ slot, slots }: { slot: Slot; slots: Slot[] }) {
  const { doc, canWrite, result } = useEditor();
  const { setNodeRef, isOver } = useDroppable({ id: outputDropId(slot.boardKey, slot.output), data: { accepts: ["output-device"] }, disabled: !canWrite });
  const ids = documentParts(doc).outputs.find((o) => o.boardKey === slot.boardKey && o.output === slot.output)?.deviceIds ?? [];
  const figures = result.outputs.find((o) => o.boardKey === slot.boardKey && o.output === slot.output);
  const words = slotWords(slot, slots);
  const domId = `output-${slot.boardKey}-${slot.output}`;
  const over = figures && !figures.ok;
  return (
    <li
      ref={setNodeRef}
      id={domId}
      data-testid={domId}
      aria-label={`${boardName(doc, slot.boardKey)}, ${words}${ids.length ? "" : ", free"}`}
      className={`flex min-h-20 flex-col rounded-md border-2 p-1.5 text-xs ${over ? "border-fault" : ids.length ? "border-line" : "border-dashed border-line"} ${isOver ? "bg-signal-soft" : ids.length ? "bg-white" : "bg-slate-50"}`}
    >
      <div className="mb-1 flex flex-wrap items-baseline gap-x-1">
        <span className="font-semibold">{words.charAt(0).toUpperCase() + words.slice(1)}</span>
        <span className="text-slate-500">
          {slot.switching}, rated {mA(slot.ratingMa)}
        </span>
      </div>
      {figures ? (
        <p className={`mb-1 text-[11px] ${over ? "font-semibold text-fault" : "text-slate-600"}`} data-testid={`${domId}-load`}>
          {mA(figures.alarmMa)} in alarm, {mA(figures.restMa)} at rest{over ? `: over its ${mA(slot.ratingMa)}` : ""}
        </p>
      ) : null}
      <div className="flex flex-col gap-1">
        {ids.map((id) => (
          <OutputDeviceChip key={id} deviceId={id} onOutput />
        ))}
      </div>
    </li>
  );
}

/** The outputs of the panel or a board: siren outputs first, then programmable outputs. */
export function OutputGrid({ boardKey }: { boardKey: string }) {
  const { doc, ix } = useEditor();
  const slots = slotsOf(doc, ix, boardKey);
  if (!slots.length) return null;
  return (
    <div className="mt-3">
      <h4 className="text-xs font-semibold text-slate-600">Outputs</h4>
      <ul className="mt-1 grid grid-cols-[repeat(auto-fill,minmax(10.5rem,1fr))] gap-1.5" aria-label={`Outputs of ${boardName(doc, boardKey)}`}>
        {slots.map((s) => (
          <OutputSlot key={s.output} slot={s} slots={slots} />
        ))}
      </ul>
    </div>
  );
}
