"use client";

import { formatOhms } from "@/lib/loop";
import { MAX_LENGTH_M } from "./bench-state";
import { AWG_CHOICES, gaugeIn, MM2_CHOICES, withSharedOhms } from "./bench-actions";
import { NumberField, Section, SelectField } from "./controls";
import { ResistorField } from "./resistor-field";
import type { Bench } from "./use-bench";
import { useFormat } from "@/components/format/format-provider";
import { lengthCell, lengthUnit, metresToTyped, typedToMetres } from "@/lib/format/length-input";

/** The fitted resistor values and the parts' tolerance. */
export function ResistorControls({ bench }: { bench: Bench }) {
  const { s, update, inputType } = bench;
  const hasEol = s.scheme === "single-eol" || s.scheme === "double-eol" || s.scheme === "shared";
  return (
    <Section title="Resistors">
      {hasEol ? (
        <ResistorField label={s.scheme === "shared" ? "Line resistor (EOL)" : "End-of-line resistor"} value={s.eolOhms} expected={inputType.eolOhms ?? null} onChange={(v) => update({ eolOhms: v })} testId="resistor-field-eol" />
      ) : (
        <p className="text-sm text-slate-600">No resistors in this scheme.</p>
      )}
      {s.scheme === "double-eol" ? <ResistorField label="Alarm resistor (across the contacts)" value={s.alarmOhms} expected={inputType.alarmOhms ?? null} onChange={(v) => update({ alarmOhms: v })} /> : null}
      {s.scheme === "shared"
        ? ([0, 1] as const).map((k) => (
            <ResistorField
              key={k}
              label={`Detector ${k === 0 ? "A" : "B"}'s resistor (across its contact)`}
              value={s.sharedOhms[k]}
              expected={inputType.sharedOhms?.[k] ?? null}
              onChange={(v) => update((prev) => withSharedOhms(prev, k, v))}
            />
          ))
        : null}
      <NumberField label="Part tolerance" unit="%" value={s.tolerancePct} min={0.1} max={20} onChange={(tolerancePct) => update({ tolerancePct })} list="bench-tolerances" />
      <datalist id="bench-tolerances">
        {[1, 2, 5, 10].map((x) => (
          <option key={x} value={x} />
        ))}
      </datalist>
    </Section>
  );
}

/** The cable: conductor size in either unit, length (slider and field) and the temperature range. */
export function CableControls({ bench }: { bench: Bench }) {
  const { s, update, perKm } = bench;
  // typed and shown in the organisation's unit; the bench computes in metres
  const { units } = useFormat().settings;
  return (
    <Section title="Cable">
      <div className="grid grid-cols-[7rem_1fr] items-end gap-2">
        <SelectField label="Gauge in" value={s.gauge.unit} onChange={(u) => u !== s.gauge.unit && update({ gauge: gaugeIn(s.gauge, u as "mm2" | "awg") })}>
          <option value="mm2">mm²</option>
          <option value="awg">AWG</option>
        </SelectField>
        <NumberField
          label="Conductor size"
          unit={s.gauge.unit === "awg" ? "AWG" : "mm²"}
          value={s.gauge.value}
          step={s.gauge.unit === "awg" ? 1 : "any"}
          onChange={(value) => update({ gauge: { unit: s.gauge.unit, value } })}
          list={s.gauge.unit === "awg" ? "bench-awg" : "bench-mm2"}
        />
      </div>
      <datalist id="bench-awg">
        {AWG_CHOICES.map((x) => (
          <option key={x} value={x} />
        ))}
      </datalist>
      <datalist id="bench-mm2">
        {MM2_CHOICES.map((x) => (
          <option key={x} value={x} />
        ))}
      </datalist>
      <p className="-mt-2 text-xs text-slate-500">{Number.isFinite(perKm) ? `${formatOhms(perKm)} per km of one conductor at 20 °C (copper)` : ""}</p>
      <div>
        <label htmlFor="bench-length-slider" className="text-sm font-medium">
          Cable length (one way): <span className="tabular-nums">{lengthCell(s.lengthM, units)}</span>
        </label>
        <input
          id="bench-length-slider"
          type="range"
          min={0}
          max={MAX_LENGTH_M}
          step={1}
          value={Math.min(Math.max(s.lengthM, 0), MAX_LENGTH_M)}
          onChange={(e) => update({ lengthM: e.target.valueAsNumber })}
          className="mt-2 w-full accent-[var(--color-signal)]"
          aria-valuetext={units === "imperial" ? `${metresToTyped(s.lengthM, units)} feet` : `${s.lengthM} metres`}
        />
        <div className="flex justify-between text-xs text-slate-500">
          <span>0 {lengthUnit(units)}</span>
          <span>{lengthCell(MAX_LENGTH_M, units)}</span>
        </div>
      </div>
      <NumberField label="Cable length (one way)" unit={lengthUnit(units)} value={metresToTyped(s.lengthM, units)} min={0} step={1} onChange={(v) => update({ lengthM: typedToMetres(v, units) })} testId="cable-length" />
      <div className="grid grid-cols-2 gap-2">
        <NumberField label="Coldest" unit="°C" value={s.tempMinC} onChange={(tempMinC) => update({ tempMinC })} />
        <NumberField label="Hottest" unit="°C" value={s.tempMaxC} onChange={(tempMaxC) => update({ tempMaxC })} />
      </div>
    </Section>
  );
}
