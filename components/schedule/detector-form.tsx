"use client";

import { useState } from "react";
import { createDetectorFormSchema, formatGauge, parseGauge, supervisionPreferenceSchema, TEXT_LIMITS, type ScheduleDetector } from "@/lib/schedule/schema";
import { Button } from "@/components/ui/button";
import { supervisionLabels, type DetectorType, type SiteArea } from "@/components/schedule/schedule-labels";
import { PlacePicker } from "@/components/schedule/place-picker";
import { useFormat } from "@/components/format/format-provider";
import { fieldToMetres, lengthUnit, metresToTyped } from "@/lib/format/length-input";

type Values = Omit<ScheduleDetector, "id">;

const blank: Values = { label: "", catalogId: "", area: "", room: "", cableM: 0, gauge: { awg: 22 }, supervision: "double-eol" };

/** Add or edit one detector; validated with the same schema as the route handler. */
export function DetectorForm({ types, areas, initial, submitLabel, onSubmit, onCancel }: { types: DetectorType[]; areas: SiteArea[]; initial?: Values; submitLabel: string; onSubmit: (v: Values) => Promise<string | null>; onCancel?: () => void }) {
  const start = initial ?? { ...blank, catalogId: types[0]?.id ?? "" };
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [serverError, setServerError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  // a new key after a successful add resets the area and room pickers
  const [resetKey, setResetKey] = useState(0);
  const formId = initial ? "edit-detector" : "add-detector";
  // the cable run is typed in the organisation's unit and sent in metres
  const { units } = useFormat().settings;

  async function submit(e: React.FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const f = new FormData(e.currentTarget);
    const gauge = parseGauge(String(f.get("gauge") ?? ""));
    const parsed = createDetectorFormSchema.safeParse({
      label: f.get("label"),
      catalogId: f.get("catalogId"),
      area: f.get("area"),
      room: f.get("room"),
      cableM: fieldToMetres(String(f.get("cableM") ?? ""), units, initial?.cableM),
      gauge: gauge ?? undefined,
      supervision: f.get("supervision"),
    });
    if (!parsed.success || !gauge) {
      const errs: Record<string, string> = {};
      for (const i of parsed.success ? [] : parsed.error.issues) errs[String(i.path[0])] ??= i.message;
      if (!gauge) errs.gauge = 'write a gauge such as "22 AWG" or "0.5 mm2"';
      setErrors(errs);
      return;
    }
    setErrors({});
    setBusy(true);
    const err = await onSubmit(parsed.data);
    setBusy(false);
    setServerError(err);
    if (!err && !initial) {
      (e.target as HTMLFormElement).reset();
      setResetKey((k) => k + 1);
    }
  }

  const field = "mt-1 block w-full rounded-md border bg-white px-2 py-1.5 text-sm";
  const err = (k: string) =>
    errors[k] ? (
      <span className="mt-0.5 block text-xs text-fault [overflow-wrap:anywhere]" id={`${formId}-${k}-error`} role="alert">
        {errors[k]}
      </span>
    ) : null;
  const limit = (k: keyof typeof TEXT_LIMITS) => (
    <span className="mt-0.5 block text-xs text-slate-600" id={`${formId}-${k}-limit`}>
      up to {TEXT_LIMITS[k]} characters
    </span>
  );
  return (
    <form onSubmit={submit} className="grid grid-cols-1 gap-3 sm:grid-cols-2 lg:grid-cols-4" aria-label={submitLabel} noValidate>
      <label className="text-sm sm:col-span-2">
        <span className="font-medium">Label</span>
        <input name="label" defaultValue={start.label} className={`${field} ${errors.label ? "border-fault" : "border-line"}`} aria-invalid={!!errors.label} aria-describedby={`${formId}-label-limit`} />
        {limit("label")}
        {err("label")}
      </label>
      <label className="text-sm sm:col-span-2">
        <span className="font-medium">Detector type</span>
        <select name="catalogId" defaultValue={start.catalogId} className={`${field} border-line`}>
          {types.map((t) => (
            <option key={t.id} value={t.id}>
              {t.name}
              {t.lifeSafety ? " (fire, life-safety)" : ""}
            </option>
          ))}
        </select>
        {err("catalogId")}
      </label>
      <PlacePicker key={resetKey} formId={formId} fallbackAreas={areas} initialArea={start.area} initialRoom={start.room} />
      <label className="text-sm">
        <span className="font-medium">Cable run ({lengthUnit(units)})</span>
        <input name="cableM" type="number" step="any" min={0} defaultValue={start.cableM ? metresToTyped(start.cableM, units) : ""} className={`${field} ${errors.cableM ? "border-fault" : "border-line"}`} aria-invalid={!!errors.cableM} />
        {err("cableM")}
      </label>
      <label className="text-sm">
        <span className="font-medium">Gauge</span>
        <input name="gauge" defaultValue={formatGauge(start.gauge)} className={`${field} ${errors.gauge ? "border-fault" : "border-line"}`} aria-invalid={!!errors.gauge} placeholder="22 AWG or 0.5 mm2" />
        {err("gauge")}
      </label>
      <label className="text-sm sm:col-span-2">
        <span className="font-medium">Supervision wanted</span>
        <select name="supervision" defaultValue={start.supervision} className={`${field} border-line`}>
          {supervisionPreferenceSchema.options.map((s) => (
            <option key={s} value={s}>
              {supervisionLabels[s]}
            </option>
          ))}
        </select>
      </label>
      <div className="flex items-end gap-2 sm:col-span-2">
        <Button type="submit" disabled={busy}>
          {submitLabel}
        </Button>
        {onCancel ? (
          <Button type="button" variant="secondary" onClick={onCancel}>
            Cancel
          </Button>
        ) : null}
      </div>
      {serverError ? (
        <p role="alert" className="text-sm text-fault sm:col-span-4">
          {serverError}
        </p>
      ) : null}
    </form>
  );
}
