"use client";

import { useDraggable } from "@dnd-kit/core";
import type { HTMLAttributes } from "react";
import { useEditor } from "@/components/editor/editor-context";
import { outputDeviceDragId } from "@/components/editor/output-drag-model";
import { documentParts } from "@/lib/layout/schema";
import { placeOutputDevice } from "@/lib/layout/zone-output-operations";
import { deviceDraw } from "@/lib/solver/output-rules";
import { useFormat } from "@/components/format/format-provider";
import { lengthCell } from "@/lib/format/length-input";

/** What a sounder or strobe chip shows: its label, type, cable and current; also drawn in the drag overlay. */
export function OutputDeviceFace({ deviceId, labelProps }: { deviceId: string; labelProps?: HTMLAttributes<HTMLSpanElement> }) {
  const { doc, ix } = useEditor();
  const { units } = useFormat().settings;
  const d = documentParts(doc).outputDevices.find((x) => x.id === deviceId);
  const cat = d ? (d.kind === "sounder" ? ix.sounders.get(d.catalogId) : ix.strobes.get(d.catalogId)) : undefined;
  const draw = cat ? deviceDraw(cat) : null;
  return (
    <span className="flex min-w-0 flex-col text-left">
      <span className="flex items-start gap-1 font-medium leading-tight">
        <span className="mt-px shrink-0 rounded bg-slate-600 px-1 text-[10px] font-semibold uppercase text-white">{d?.kind === "strobe" ? "strobe" : "sounder"}</span>
        <span className="line-clamp-2 break-words" {...labelProps}>
          {d?.label ?? "Unknown sounder or strobe"}
        </span>
      </span>
      <span className="truncate text-[11px] text-slate-500">
        {cat?.name ?? "type not in the catalog"}
        {d ? ` · ${lengthCell(d.cableM, units)}` : ""}
      </span>
      {draw ? (
        <span className="text-[11px] text-slate-500" data-testid={`draw-${deviceId}`}>
          {draw.alarmMa} mA in alarm · {draw.restMa} mA at rest{cat && "ownBattery" in cat && cat.ownBattery ? " (charging its own battery)" : ""}
        </span>
      ) : null}
    </span>
  );
}

/** A sounder or strobe: dragged onto an output with the mouse or the keyboard (Space), or sent with the output list beside it. */
export function OutputDeviceChip({ deviceId, onOutput }: { deviceId: string; onOutput: boolean }) {
  const { doc, ctx, canWrite, apply } = useEditor();
  const { attributes, listeners, setNodeRef, isDragging } = useDraggable({ id: outputDeviceDragId(deviceId), data: { type: "output-device" }, disabled: !canWrite });
  const label = documentParts(doc).outputDevices.find((x) => x.id === deviceId)?.label ?? deviceId;
  return (
    <div data-testid={`output-device-${deviceId}`} className={`flex items-center gap-1 rounded-md border border-line bg-white px-2 py-1 text-xs shadow-sm ${isDragging ? "opacity-40" : ""}`}>
      <div ref={setNodeRef} {...listeners} className={`min-w-0 flex-1 ${canWrite ? "cursor-grab touch-none" : "cursor-default"}`}>
        <OutputDeviceFace deviceId={deviceId} labelProps={{ ...attributes, role: "button", tabIndex: 0 }} />
      </div>
      {onOutput && canWrite ? (
        <button type="button" className="rounded px-1 text-slate-400 hover:bg-slate-100 hover:text-ink" aria-label={`Take ${label} off its output`} title="Off its output" onClick={() => apply(placeOutputDevice(doc, ctx, deviceId, null))}>
          ×
        </button>
      ) : null}
    </div>
  );
}
