"use client";

import { useDraggable } from "@dnd-kit/core";
import { memo, type HTMLAttributes, type KeyboardEvent } from "react";
import type { Finding } from "@/lib/findings";
import type { DetectorVoltage } from "@/lib/solver";
import { useEditorStable } from "@/components/editor/editor-stable-context";
import { samePropsWithLists } from "@/components/editor/memo-compare";
import { useEditor } from "@/components/editor/editor-context";
import { detectorDragId } from "@/components/editor/editor-model";
import { FindingMarker } from "@/components/editor/finding-marker";
import { voltsText } from "@/lib/solver/supply-lines";
import { isLifeSafety } from "@/lib/catalog/life-safety";
import { unassign } from "@/lib/layout/operations";
import { useFormat } from "@/components/format/format-provider";
import { lengthCell } from "@/lib/format/length-input";

/** What a chip shows; also drawn in the drag overlay. On a chip the label is the control (`labelProps`), so its
 * name is what it shows; the zone, the fire badge and the figures sit beside it. */
export function ChipFace({ detectorId, labelProps }: { detectorId: string; labelProps?: HTMLAttributes<HTMLSpanElement> }) {
  const { zones, voltsOf } = useEditor();
  return <ChipFaceView detectorId={detectorId} zone={zones.get(detectorId)} v={voltsOf.get(detectorId)} labelProps={labelProps} />;
}

function ChipFaceView({ detectorId, zone, v, labelProps }: { detectorId: string; zone: number | undefined; v: DetectorVoltage | undefined; labelProps?: HTMLAttributes<HTMLSpanElement> }) {
  const { detectorsById, ix } = useEditorStable();
  const d = detectorsById.get(detectorId);
  const c = d ? ix.detectors.get(d.catalogId) : undefined;
  const { units } = useFormat().settings;
  return (
    <span className="flex min-w-0 flex-col text-left">
      <span className="flex items-start gap-1 font-medium leading-tight">
        {zone ? (
          <span className="mt-px shrink-0 rounded bg-ink px-1 text-[10px] font-semibold text-white" title={`Zone ${zone}`}>
            Z{zone}
          </span>
        ) : null}
        <span className="line-clamp-2 break-words" {...labelProps}>
          {d?.label ?? `Unknown detector ${detectorId}`}
        </span>
        {c && isLifeSafety(c) ? <span className="mt-px shrink-0 rounded bg-fault px-1 text-[10px] font-semibold text-white">FIRE</span> : null}
      </span>
      {/* the cable length never gives way to a long type name: the name is cut, the length stays */}
      <span className="flex min-w-0 gap-1 text-[11px] text-slate-500" title={`${c?.name ?? "detector type not in the catalog"}${d ? ` · ${lengthCell(d.cableM, units)}` : ""}`}>
        <span className="truncate">{c?.name ?? "detector type not in the catalog"}</span>
        {d ? <span className="shrink-0 tabular-nums" data-testid={`cable-${detectorId}`}>· {lengthCell(d.cableM, units)}</span> : null}
      </span>
      {v ? (
        <span className={`text-[11px] ${v.ok ? "text-slate-500" : "font-semibold text-fault"}`} data-testid={`volts-${detectorId}`}>
          {voltsText(v)}
        </span>
      ) : null}
    </span>
  );
}

/** A detector: dragged with the mouse or the keyboard (Space), or selected (click, Enter) for an input's "place here". */
export function DetectorChip({ detectorId, onInput, sharedAs }: { detectorId: string; onInput: boolean; sharedAs?: "A" | "B" }) {
  const { selected, zones, voltsOf, findingsAt, highlighted } = useEditor();
  const domId = `detector-${detectorId}`;
  return (
    <DetectorChipView
      detectorId={detectorId}
      onInput={onInput}
      sharedAs={sharedAs}
      zone={zones.get(detectorId)}
      v={voltsOf.get(detectorId)}
      findings={findingsAt.get(domId)}
      isSelected={selected === detectorId}
      isHighlighted={highlighted === domId}
    />
  );
}

interface ChipViewProps {
  detectorId: string;
  onInput: boolean;
  sharedAs?: "A" | "B";
  zone: number | undefined;
  v: DetectorVoltage | undefined;
  findings: Finding[] | undefined;
  isSelected: boolean;
  isHighlighted: boolean;
}

/** The chip itself, re-rendered only when its own props change (not on every edit elsewhere in the layout). */
const DetectorChipView = memo(function DetectorChipView({ detectorId, onInput, sharedAs, zone, v, findings, isSelected, isHighlighted }: ChipViewProps) {
  const { canWrite, select, ctx, applyTo, detectorsById } = useEditorStable();
  const { attributes, listeners, setNodeRef, isDragging } = useDraggable({ id: detectorDragId(detectorId), data: { type: "detector" }, disabled: !canWrite });
  const domId = `detector-${detectorId}`;
  const label = detectorsById.get(detectorId)?.label ?? detectorId;
  const onKeyDown = (e: KeyboardEvent<HTMLDivElement>) => {
    if (isDragging) return; // the keyboard sensor has the keys while it is picked up
    if (canWrite && e.key === "Enter") {
      e.preventDefault();
      select(isSelected ? null : detectorId);
      return;
    }
    if (isSelected && e.key === "Escape") select(null);
    listeners?.onKeyDown?.(e);
  };
  return (
    <div
      id={domId}
      data-testid={domId}
      className={`group flex items-center gap-1 rounded-md border bg-white px-2 py-1 text-xs shadow-sm ${isSelected ? "border-signal ring-2 ring-signal" : "border-line"} ${isDragging ? "opacity-40" : ""} ${isHighlighted ? "ring-4 ring-warn" : ""}`}
    >
      <div ref={setNodeRef} {...listeners} onKeyDown={onKeyDown} onClick={() => canWrite && select(isSelected ? null : detectorId)} className={`min-w-0 flex-1 ${canWrite ? "cursor-grab touch-none" : "cursor-default"}`}>
        <ChipFaceView detectorId={detectorId} zone={zone} v={v} labelProps={{ ...attributes, role: "button", tabIndex: 0, "aria-pressed": canWrite ? isSelected : undefined }} />
      </div>
      {sharedAs ? (
        <span className="shrink-0 rounded border border-line px-1 text-[10px] font-semibold text-slate-600" title={`Detector ${sharedAs} of the shared input: the ${sharedAs} resistor goes across its contact`}>
          {sharedAs}
        </span>
      ) : null}
      <FindingMarker domId={domId} findings={findings} />
      {onInput && canWrite ? (
        <button type="button" className="rounded px-1 text-slate-400 hover:bg-slate-100 hover:text-ink" aria-label={`Take ${label} off its input`} title="Back to unplaced" onClick={() => applyTo((doc) => unassign(doc, ctx, detectorId))}>
          ×
        </button>
      ) : null}
    </div>
  );
}, samePropsWithLists<ChipViewProps>(["findings"]));
