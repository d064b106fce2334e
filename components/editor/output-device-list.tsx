"use client";

import { useDroppable } from "@dnd-kit/core";
import { useEditor } from "@/components/editor/editor-context";
import { AddOutputDevice } from "@/components/editor/add-output-device";
import { OutputDeviceChip } from "@/components/editor/output-device-chip";
import { allOutputs, OUTPUT_POOL_DROP_ID, outputName } from "@/components/editor/output-drag-model";
import { documentParts, type OutputDevice } from "@/lib/layout/schema";
import { outputOf, placeOutputDevice, removeOutputDevice } from "@/lib/layout/zone-output-operations";

/** The non-drag way: choose the output from a list. */
function OutputChoice({ device }: { device: OutputDevice }) {
  const { doc, ctx, ix, canWrite, apply } = useEditor();
  const at = outputOf(doc, device.id);
  const value = at ? `${at.boardKey}:${at.output}` : "";
  return (
    <select
      aria-label={`Output for ${device.label}`}
      className="min-w-0 flex-1 rounded border border-line px-1 py-0.5"
      value={value}
      disabled={!canWrite}
      onChange={(e) => {
        const [boardKey, n] = e.target.value.split(":");
        apply(placeOutputDevice(doc, ctx, device.id, e.target.value ? { boardKey, output: Number(n) } : null));
      }}
    >
      <option value="">on no output</option>
      {allOutputs(doc, ix).map((s) => (
        <option key={`${s.boardKey}:${s.output}`} value={`${s.boardKey}:${s.output}`}>
          {outputName(doc, ix, s)}
        </option>
      ))}
    </select>
  );
}

/** The layout's sounders and strobes: those on no output as chips to drag, every one with its output and a remove button. */
export function OutputDeviceList() {
  const { doc, ctx, canWrite, apply } = useEditor();
  const { setNodeRef, isOver } = useDroppable({ id: OUTPUT_POOL_DROP_ID, data: { accepts: ["output-device"] }, disabled: !canWrite });
  const devices = documentParts(doc).outputDevices;
  const free = devices.filter((d) => !outputOf(doc, d.id));
  return (
    <section aria-labelledby="output-devices-heading" className="mt-4 shrink-0 lg:max-h-[50vh] lg:overflow-y-auto lg:pr-1">
      <h2 id="output-devices-heading" className="mb-2 text-sm font-semibold">
        Sounders and strobes <span className="font-normal text-slate-500">({free.length} of {devices.length} on no output)</span>
      </h2>
      {canWrite ? (
        <p className="mb-2 text-xs text-slate-600">Drag one onto an output of the panel or a board (Space picks it up, arrow keys move between outputs, Space drops), or choose its output from the list.</p>
      ) : null}
      <div ref={setNodeRef} data-testid="output-pool" className={`min-h-12 rounded-lg border-2 border-dashed p-2 ${isOver ? "border-signal bg-signal-soft" : "border-line bg-white/60"}`}>
        {free.length === 0 ? <p className="p-1 text-xs text-slate-500">Every sounder and strobe is on an output.</p> : null}
        <ul className="flex flex-col gap-1">
          {free.map((d) => (
            <li key={d.id}>
              <OutputDeviceChip deviceId={d.id} onOutput={false} />
            </li>
          ))}
        </ul>
      </div>
      {devices.length ? (
        <ul className="mt-2 flex flex-col gap-1 text-xs" aria-label="Where each sounder and strobe is">
          {devices.map((d) => (
            <li key={d.id} className="flex items-center gap-1">
              <span className="w-24 shrink-0 truncate" title={d.label}>
                {d.label}
              </span>
              <OutputChoice device={d} />
              {canWrite ? (
                <button type="button" className="rounded px-1 text-fault hover:bg-fault-soft" aria-label={`Remove ${d.label}`} onClick={() => apply(removeOutputDevice(doc, ctx, d.id))}>
                  ×
                </button>
              ) : null}
            </li>
          ))}
        </ul>
      ) : null}
      {canWrite ? <AddOutputDevice /> : null}
    </section>
  );
}
