"use client";

import { useDroppable } from "@dnd-kit/core";
import { useMemo, useRef } from "react";
import { VirtualUnplaced, VIRTUAL_FROM } from "@/components/editor/virtual-unplaced";
import { useEditor } from "@/components/editor/editor-context";
import { DetectorChip } from "@/components/editor/detector-chip";
import { UNPLACED_DROP_ID } from "@/components/editor/editor-model";
import { unplacedDetectorIds } from "@/lib/layout/operations";

/** The detectors on no input, grouped by area; also the place to drop a detector to take it off its input. */
export function UnplacedList() {
  const { doc, ctx, canWrite, selected, select, detectorsById } = useEditor();
  const { setNodeRef, isOver } = useDroppable({ id: UNPLACED_DROP_ID, data: { accepts: ["detector"] }, disabled: !canWrite });
  const groups = useMemo(() => {
    const m = new Map<string, string[]>();
    for (const id of unplacedDetectorIds(doc, ctx.schedule)) {
      const area = detectorsById.get(id)?.area || "No area";
      const list = m.get(area);
      if (list) list.push(id);
      else m.set(area, [id]);
    }
    return [...m.entries()];
  }, [doc, ctx.schedule, detectorsById]);
  const count = groups.reduce((n, [, ids]) => n + ids.length, 0);
  const scrollRef = useRef<HTMLDivElement | null>(null);
  const selectedLabel = selected ? detectorsById.get(selected)?.label : null;
  return (
    <section aria-labelledby="unplaced-heading" className="flex min-h-0 flex-col">
      <h2 id="unplaced-heading" className="mb-2 text-sm font-semibold">
        Unplaced detectors <span className="font-normal text-slate-500">({count} of {ctx.schedule.length})</span>
      </h2>
      {canWrite ? (
        <p className="mb-2 text-xs text-slate-600" id="placing-help">
          Drag a detector onto an input, or select it (click or Enter) and press an input&apos;s <span className="font-medium">Place here</span>. With the keyboard: Space picks it up, arrow keys move between
          inputs, Space drops, Escape cancels.
        </p>
      ) : null}
      {selectedLabel ? (
        <p className="mb-2 flex items-center justify-between gap-2 rounded-md bg-signal-soft px-2 py-1 text-xs" data-testid="selected-detector">
          <span>
            Selected: <span className="font-medium">{selectedLabel}</span>
          </span>
          <button type="button" className="text-signal underline" onClick={() => select(null)}>
            Clear
          </button>
        </p>
      ) : null}
      <div
        ref={(el) => {
          setNodeRef(el);
          scrollRef.current = el;
        }}
        data-testid="unplaced"
        className={`min-h-24 flex-1 overflow-y-auto rounded-lg border-2 border-dashed p-2 ${isOver ? "border-signal bg-signal-soft" : "border-line bg-white/60"}`}
      >
        {count === 0 ? <p className="p-2 text-xs text-slate-500">Every detector is on an input.</p> : null}
        {count >= VIRTUAL_FROM ? <VirtualUnplaced groups={groups} scrollRef={scrollRef} /> : null}
        {count >= VIRTUAL_FROM ? null : groups.map(([area, ids]) => (
          <div key={area} className="mb-3" role="group" aria-label={area}>
            <h3 className="mb-1 text-[11px] font-semibold uppercase tracking-wide text-slate-500">
              {area} ({ids.length})
            </h3>
            <ul className="flex flex-col gap-1">
              {ids.map((id) => (
                <li key={id}>
                  <DetectorChip detectorId={id} onInput={false} />
                </li>
              ))}
            </ul>
          </div>
        ))}
      </div>
    </section>
  );
}
