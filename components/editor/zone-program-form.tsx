"use client";

import { useState } from "react";
import { useEditor } from "@/components/editor/editor-context";
import { zoneTypeSchema, type ZoneType } from "@/lib/catalog/schema";
import { documentParts, zoneProgramSchema, type ZoneProgram } from "@/lib/layout/schema";
import { setZoneProgram } from "@/lib/layout/zone-output-operations";
import { ZONE_TYPE_WORDS } from "@/lib/vocabulary/words";

type Patch = Partial<Omit<ZoneProgram, "detectorId">>;

/** Entry or exit time in seconds, checked against the document's own range on leaving the field. */
function SecondsField({ label, name, value, onCommit }: { label: string; name: string; value: number | undefined; onCommit: (v: number | undefined) => void }) {
  const [error, setError] = useState<string | null>(null);
  return (
    <label className="flex flex-col gap-0.5">
      <span>{label} (s)</span>
      <input
        key={value ?? "none"}
        type="number"
        min={0}
        max={600}
        inputMode="numeric"
        aria-label={`${label} of ${name}, seconds`}
        defaultValue={value ?? ""}
        className="w-20 rounded border border-line px-1 py-0.5"
        onBlur={(e) => {
          const t = e.currentTarget.value.trim();
          if (t === "") return value === undefined ? undefined : onCommit(undefined);
          const parsed = zoneProgramSchema.shape.entryS.safeParse(Number(t));
          if (!parsed.success) return setError(`${label}: whole seconds from 0 to 600`);
          setError(null);
          if (parsed.data !== value) onCommit(parsed.data);
        }}
        onKeyDown={(e) => {
          if (e.key === "Enter") e.currentTarget.blur();
        }}
      />
      {error ? (
        <span role="alert" className="text-fault">
          {error}
        </span>
      ) : null}
    </label>
  );
}

/** How one placed detector's zone is programmed: type, area, part-set, the options its type allows, keypad label. */
export function ZoneProgramForm({ detectorId }: { detectorId: string }) {
  const { doc, ctx, ix, canWrite, apply, result, detectorsById } = useEditor();
  const parts = documentParts(doc);
  const program = parts.zones.find((z) => z.detectorId === detectorId);
  const figures = result.zones.find((z) => z.detectorId === detectorId);
  const name = detectorsById.get(detectorId)?.label ?? detectorId;
  const type: ZoneType = figures?.type ?? program?.type ?? "instant";
  const offered = ix.panels.get(doc.panelId)?.zoneTypes ?? zoneTypeSchema.options;
  // an unprogrammed zone has a type by default (fire, hold-up or instant): keep it when another field changes
  const set = (patch: Patch) => apply(setZoneProgram(doc, ctx, detectorId, { type, ...patch }));
  const box = (label: string, checked: boolean, patch: (v: boolean) => Patch) => (
    <label className="flex items-center gap-1">
      <input type="checkbox" checked={checked} disabled={!canWrite} aria-label={`${label}: ${name}`} onChange={(e) => set(patch(e.target.checked))} />
      <span>{label}</span>
    </label>
  );
  return (
    <div className="flex flex-col gap-1 rounded bg-slate-50 p-1" role="group" aria-label={`Zone programming of ${name}`} data-testid={`zone-form-${detectorId}`}>
      <label className="flex flex-col gap-0.5">
        <span>Zone type</span>
        <select aria-label={`Zone type of ${name}`} className="rounded border border-line px-1 py-0.5" value={type} disabled={!canWrite} onChange={(e) => set({ type: e.target.value as ZoneType })}>
          {[...new Set([...offered, type])].map((t) => (
            <option key={t} value={t} disabled={!offered.includes(t)}>
              {ZONE_TYPE_WORDS[t]}
            </option>
          ))}
        </select>
      </label>
      {parts.areas.length ? (
        <label className="flex flex-col gap-0.5">
          <span>Area</span>
          <select aria-label={`Area of ${name}`} className="rounded border border-line px-1 py-0.5" value={program?.areaKey ?? ""} disabled={!canWrite} onChange={(e) => set({ areaKey: e.target.value || undefined })}>
            <option value="">first area ({parts.areas[0].name})</option>
            {parts.areas.map((a) => (
              <option key={a.key} value={a.key}>
                {a.name}
              </option>
            ))}
          </select>
        </label>
      ) : (
        <p className="text-slate-500">No areas yet: add them under Zones, areas and grade.</p>
      )}
      {type !== "hold-up" ? box("In the part-set", program?.partSet ?? false, (v) => ({ partSet: v })) : null}
      {type === "entry-exit" ? (
        <div className="flex gap-2">
          <SecondsField label="Entry time" name={name} value={program?.entryS} onCommit={(v) => set({ entryS: v })} />
          <SecondsField label="Exit time" name={name} value={program?.exitS} onCommit={(v) => set({ exitS: v })} />
        </div>
      ) : null}
      {type === "instant" ? box("On the entry route", program?.entryRoute ?? false, (v) => ({ entryRoute: v })) : null}
      {box("Chime", program?.chime ?? false, (v) => ({ chime: v }))}
      <label className="flex flex-col gap-0.5">
        <span>Keypad label</span>
        <input
          key={program?.keypadLabel ?? "none"}
          aria-label={`Keypad label of ${name}`}
          maxLength={64}
          placeholder={name}
          defaultValue={program?.keypadLabel ?? ""}
          disabled={!canWrite}
          className="rounded border border-line px-1 py-0.5"
          onBlur={(e) => {
            const v = e.currentTarget.value.trim() || undefined;
            if (v !== program?.keypadLabel) set({ keypadLabel: v });
          }}
        />
      </label>
      {figures ? (
        <p className={figures.labelCut ? "text-warn" : "text-slate-500"} data-testid={`keypad-shows-${detectorId}`}>
          The keypad shows &quot;{figures.keypadLabel}&quot;{figures.labelCut ? " (cut off)" : ""}
        </p>
      ) : null}
    </div>
  );
}

/** Reached from a placed detector's input: its zone type in the summary, the form when opened. */
export function ZoneProgramDetails({ detectorId }: { detectorId: string }) {
  const { result, detectorsById } = useEditor();
  const figures = result.zones.find((z) => z.detectorId === detectorId);
  const name = detectorsById.get(detectorId)?.label ?? detectorId;
  return (
    <details className="mt-1 text-[11px]">
      <summary className="cursor-pointer text-signal">
        Zone{figures ? ` ${figures.number}: ${ZONE_TYPE_WORDS[figures.type]}${figures.areaName ? `, ${figures.areaName}` : ""}` : ""}
        <span className="sr-only"> programming of {name}</span>
      </summary>
      <ZoneProgramForm detectorId={detectorId} />
    </details>
  );
}
