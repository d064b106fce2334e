"use client";
// The loop bench: wire a loop virtually, set each detector's state, inject a fault, and see what the input
// reads and the panel reports. The engine is pure, so it runs here on every change.
import { useMemo, useState, type ReactNode } from "react";
import type { InputType, WiringScheme } from "@/lib/catalog/schema";
import { analyzeLoop, awgAreaMm2, conductorOhmsPerM, formatOhms, LIFE_SAFETY_CAUTION, type DetectorState, type Fault, type Placement } from "@/lib/loop";
import { LoopSchematic } from "@/components/loop-schematic/loop-schematic";
import {
  currentReading,
  detectorLabels,
  FAULT_CHOICES,
  MAX_DETECTORS,
  MAX_LENGTH_M,
  PLACEMENT_HINTS,
  PLACEMENT_WORDS,
  SCHEME_WORDS,
  settingsFor,
  STATE_WORDS,
  toLoopSpec,
  withScheme,
  type BenchSettings,
} from "./bench-state";
import { NumberField, Section, Segmented, SelectField } from "./controls";
import { ResistorField } from "./resistor-field";
import { ReadingPanel } from "./reading-panel";
import { Verdicts } from "./verdicts";
import { StatesTable } from "./states-table";
import { FindingsList } from "./findings-list";
import { ResistorCards } from "./resistor-cards";
import { CableSummary } from "./cable-summary";
import { DecodeTable } from "./decode-table";

const AWG_CHOICES = [14, 16, 18, 20, 22, 24, 26];
const MM2_CHOICES = [0.14, 0.22, 0.5, 0.75, 1, 1.5];

function nearestAwg(mm2: number): number {
  let best = 22;
  for (let awg = 10; awg <= 30; awg++) if (Math.abs(Math.log(awgAreaMm2(awg) / mm2)) < Math.abs(Math.log(awgAreaMm2(best) / mm2))) best = awg;
  return best;
}

function Card({ title, children, testId, className = "" }: { title: string; children: ReactNode; testId?: string; className?: string }) {
  return (
    <section className={`rounded-lg border border-line bg-white p-4 shadow-sm ${className}`} data-testid={testId}>
      <h2 className="mb-3 text-base font-semibold">{title}</h2>
      {children}
    </section>
  );
}

export function LoopBench({ inputTypes }: { inputTypes: InputType[] }) {
  const first = inputTypes.find((t) => t.schemes.includes("single-eol")) ?? inputTypes[0];
  const [s, setS] = useState<BenchSettings>(() => settingsFor(first));
  const inputType = inputTypes.find((t) => t.id === s.inputTypeId) ?? first;
  const loop = useMemo(() => toLoopSpec(s), [s]);
  const analysis = useMemo(() => analyzeLoop(loop, inputType), [loop, inputType]);
  const n = loop.detectors.length;
  const states = s.states.slice(0, n);
  const reading = analysis.valid === false ? null : currentReading(analysis, loop, inputType, states, s.fault);
  const lifeSafety = s.lifeSafety || inputType.lifeSafety;
  const gaugeText = s.gauge.unit === "awg" ? `${s.gauge.value} AWG` : `${s.gauge.value} mm²`;
  const conductors = loop.placement === "loop-back" && loop.scheme !== "none" ? 4 : 2;
  const perKm = Number.isFinite(s.gauge.value) && s.gauge.value > 0 ? conductorOhmsPerM(loop.cable.gauge, 20) * 1000 : NaN;

  const set = (patch: Partial<BenchSettings>) => setS((prev) => ({ ...prev, ...patch }));
  const setState = (i: number, st: DetectorState) => setS((prev) => ({ ...prev, states: prev.states.map((x, k) => (k === i ? st : x)) }));
  const hasEol = s.scheme === "single-eol" || s.scheme === "double-eol" || s.scheme === "shared";

  return (
    <div className="grid gap-6 lg:grid-cols-[22rem_minmax(0,1fr)]" data-testid="loop-bench">
      {/* controls */}
      <div className="grid content-start gap-4">
        <Section title="Input and wiring">
          <SelectField
            label="Input type"
            value={s.inputTypeId}
            onChange={(id) => {
              const t = inputTypes.find((x) => x.id === id);
              if (t) setS((prev) => settingsFor(t, prev));
            }}
            hint={inputType.description}
            testId="input-type"
          >
            {inputTypes.map((t) => (
              <option key={t.id} value={t.id}>
                {t.name}
              </option>
            ))}
          </SelectField>
          <Segmented<WiringScheme>
            legend="Scheme"
            name="scheme"
            value={s.scheme}
            options={inputType.schemes.map((x) => ({ value: x, label: SCHEME_WORDS[x] }))}
            onChange={(scheme) => setS((prev) => withScheme(prev, inputType, scheme))}
          />
          <Segmented
            legend="Contact type"
            name="contact"
            value={s.contact}
            options={[
              { value: "NC", label: "normally closed (NC)" },
              { value: "NO", label: "normally open (NO)" },
            ]}
            onChange={(contact) => set({ contact })}
          />
          <Segmented<Placement>
            legend="Resistor placement"
            name="placement"
            value={s.placement}
            columns={1}
            disabled={s.scheme === "none"}
            options={(["at-detector", "at-panel", "loop-back"] as const).map((p) => ({ value: p, label: PLACEMENT_WORDS[p] }))}
            hints={PLACEMENT_HINTS}
            onChange={(placement) => set({ placement })}
            testId="placement"
          />
        </Section>

        <Section title="Detectors and fault">
          <Segmented
            legend="Number of detectors"
            name="count"
            value={String(n)}
            disabled={s.scheme === "shared"}
            options={Array.from({ length: MAX_DETECTORS }, (_, i) => ({ value: String(i + 1), label: String(i + 1) }))}
            onChange={(v) => set({ detectorCount: Number(v) })}
          />
          {s.scheme === "shared" ? <p className="-mt-2 text-xs text-slate-500">A shared input takes exactly two detectors, A and B.</p> : null}
          <label className="flex items-center gap-2 text-sm">
            <input type="checkbox" checked={s.tamper} onChange={(e) => setS((prev) => ({ ...prev, tamper: e.target.checked, states: prev.states.map((x) => (x === "tamper" && !e.target.checked ? "rest" : x)) }))} />
            Each detector has a tamper contact (NC, in series)
          </label>
          <label className="flex items-center gap-2 text-sm">
            <input type="checkbox" checked={s.lifeSafety} onChange={(e) => set({ lifeSafety: e.target.checked })} />
            Smoke, heat or other life-safety detectors
          </label>
          {detectorLabels(s.scheme, n).map((label, i) => (
            <Segmented<DetectorState>
              key={`${s.scheme}-${i}`}
              legend={label}
              name={`state-${i}`}
              value={states[i]}
              options={(s.tamper ? (["rest", "active", "tamper"] as const) : (["rest", "active"] as const)).map((x) => ({ value: x, label: STATE_WORDS[x] }))}
              onChange={(st) => setState(i, st)}
              testId={`detector-state-${i}`}
            />
          ))}
          <Segmented<Fault>
            legend="Inject a fault"
            name="fault"
            value={s.fault}
            columns={1}
            options={(["none", "short-panel", "short-detector", "cut"] as const).map((f) => ({ value: f, label: FAULT_CHOICES[f] }))}
            onChange={(fault) => set({ fault })}
            testId="fault"
          />
        </Section>

        <Section title="Resistors">
          {hasEol ? (
            <ResistorField label={s.scheme === "shared" ? "Line resistor (EOL)" : "End-of-line resistor"} value={s.eolOhms} expected={inputType.eolOhms ?? null} onChange={(v) => set({ eolOhms: v })} testId="resistor-field-eol" />
          ) : (
            <p className="text-sm text-slate-600">No resistors in this scheme.</p>
          )}
          {s.scheme === "double-eol" ? <ResistorField label="Alarm resistor (across the contacts)" value={s.alarmOhms} expected={inputType.alarmOhms ?? null} onChange={(v) => set({ alarmOhms: v })} /> : null}
          {s.scheme === "shared"
            ? ([0, 1] as const).map((k) => (
                <ResistorField
                  key={k}
                  label={`Detector ${k === 0 ? "A" : "B"}'s resistor (across its contact)`}
                  value={s.sharedOhms[k]}
                  expected={inputType.sharedOhms?.[k] ?? null}
                  onChange={(v) => setS((prev) => ({ ...prev, sharedOhms: (k === 0 ? [v, prev.sharedOhms[1]] : [prev.sharedOhms[0], v]) as [number, number] }))}
                />
              ))
            : null}
          <NumberField label="Part tolerance" unit="%" value={s.tolerancePct} min={0.1} max={20} onChange={(tolerancePct) => set({ tolerancePct })} list="bench-tolerances" />
          <datalist id="bench-tolerances">
            {[1, 2, 5, 10].map((x) => (
              <option key={x} value={x} />
            ))}
          </datalist>
        </Section>

        <Section title="Cable">
          <div className="grid grid-cols-[7rem_1fr] items-end gap-2">
            <SelectField
              label="Gauge in"
              value={s.gauge.unit}
              onChange={(u) => {
                if (u === s.gauge.unit) return;
                set({ gauge: u === "awg" ? { unit: "awg", value: nearestAwg(s.gauge.value) } : { unit: "mm2", value: Number(awgAreaMm2(s.gauge.value).toPrecision(2)) } });
              }}
            >
              <option value="mm2">mm²</option>
              <option value="awg">AWG</option>
            </SelectField>
            <NumberField
              label="Conductor size"
              unit={s.gauge.unit === "awg" ? "AWG" : "mm²"}
              value={s.gauge.value}
              step={s.gauge.unit === "awg" ? 1 : "any"}
              onChange={(value) => set({ gauge: { unit: s.gauge.unit, value } })}
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
              Cable length (one way): <span className="tabular-nums">{s.lengthM} m</span>
            </label>
            <input
              id="bench-length-slider"
              type="range"
              min={0}
              max={MAX_LENGTH_M}
              step={1}
              value={Math.min(Math.max(s.lengthM, 0), MAX_LENGTH_M)}
              onChange={(e) => set({ lengthM: e.target.valueAsNumber })}
              className="mt-2 w-full accent-[var(--color-signal)]"
              aria-valuetext={`${s.lengthM} metres`}
            />
            <div className="flex justify-between text-xs text-slate-500">
              <span>0 m</span>
              <span>{MAX_LENGTH_M} m</span>
            </div>
          </div>
          <NumberField label="Cable length (one way)" unit="m" value={s.lengthM} min={0} step={1} onChange={(lengthM) => set({ lengthM })} testId="cable-length" />
          <div className="grid grid-cols-2 gap-2">
            <NumberField label="Coldest" unit="°C" value={s.tempMinC} onChange={(tempMinC) => set({ tempMinC })} />
            <NumberField label="Hottest" unit="°C" value={s.tempMaxC} onChange={(tempMaxC) => set({ tempMaxC })} />
          </div>
        </Section>
      </div>

      {/* results */}
      <div className="grid min-w-0 content-start gap-4">
        {lifeSafety ? (
          <div role="note" className="rounded-lg border border-warn bg-warn-soft p-3 text-sm" data-testid="life-safety-caution">
            <p className="font-semibold text-warn">Life-safety devices</p>
            <p className="mt-1">
              {LIFE_SAFETY_CAUTION} Installation and certification are for licensed people.
            </p>
          </div>
        ) : null}

        <section className="overflow-x-auto rounded-lg border border-line bg-white p-3 shadow-sm">
          <h2 className="sr-only">The loop as wired</h2>
          <LoopSchematic loop={loop} states={states} fault={s.fault} inputType={inputType} readingText={reading ? formatOhms(reading.nominalOhms) : "–"} className="w-full" />
        </section>

        <ReadingPanel reading={reading} fault={s.fault} placement={s.placement} bands={inputType.bands[s.scheme]} tolerancePct={s.tolerancePct} tempMinC={s.tempMinC} tempMaxC={s.tempMaxC} />

        {analysis.valid !== false ? <Verdicts faults={analysis.faults} /> : null}

        <aside className="rounded-lg border border-line bg-signal-soft/50 p-4 text-sm" aria-labelledby="why-end-of-line">
          <h2 id="why-end-of-line" className="font-semibold">
            Why the resistor belongs at the end of the line
          </h2>
          <p className="mt-1">
            A short across the cable joins the two conductors there, so the panel sees nothing beyond it. With the resistor at the detector, the short bypasses the resistor too and the
            reading drops to a few ohms of cable: the panel reports a short. With the resistor at the panel, the resistor stays in circuit whatever happens on the cable, so the short
            still reads as normal and the detectors are silenced without a trace.
          </p>
          <button
            type="button"
            className="mt-2 text-sm font-medium text-signal underline"
            onClick={() => setS((prev) => ({ ...(prev.scheme === "none" ? withScheme(prev, inputType, inputType.schemes.find((x) => x !== "none") ?? prev.scheme) : prev), placement: "at-panel", fault: "short-detector", states: prev.states.map(() => "rest") }))}
          >
            Try it: resistor at the panel, short at the detector end
          </button>
        </aside>
        {analysis.valid !== false ? (
          <Card title="Every state and fault" testId="all-rows">
            <StatesTable rows={analysis.rows} detectors={loop.detectors} current={reading?.row ?? null} onSelect={(st, fault) => setS((prev) => ({ ...prev, states: prev.states.map((x, i) => st[i] ?? x), fault }))} />
          </Card>
        ) : null}
        <Card title={`Findings (${analysis.findings.length})`} testId="findings-card">
          <FindingsList findings={analysis.findings} />
        </Card>
        {analysis.valid !== false ? (
          <div className="grid gap-4">
            <Card title="Resistors">
              <ResistorCards resistors={analysis.resistors} tolerancePct={s.tolerancePct} scheme={s.scheme} placement={s.placement} />
            </Card>
            <Card title="Cable">
              <CableSummary analysis={analysis} lengthM={s.lengthM} gaugeText={gaugeText} conductors={conductors} maxLoopOhms={inputType.maxLoopOhms} tempMaxC={s.tempMaxC} />
            </Card>
          </div>
        ) : null}
        {analysis.decode ? (
          <Card title="Shared input: decode table" testId="decode">
            <DecodeTable decode={analysis.decode} lost={analysis.sharedLost} />
          </Card>
        ) : null}
        <p className="text-xs text-slate-500">
          Readings are intervals over the parts&apos; tolerance and the cable&apos;s temperature range (copper, IEC 60028; AWG by ASTM B258). Loopwright&apos;s figures are an aid, not an
          approval.
        </p>
      </div>
    </div>
  );
}
