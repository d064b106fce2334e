"use client";

import type { InputType, WiringScheme } from "@/lib/catalog/schema";
import type { DetectorState, Fault, Placement } from "@/lib/loop";
import { detectorLabels, FAULT_CHOICES, MAX_DETECTORS, PLACEMENT_HINTS, PLACEMENT_WORDS, SCHEME_WORDS, STATE_WORDS, withScheme } from "./bench-state";
import { withState, withTamper } from "./bench-actions";
import { Section, Segmented, SelectField } from "./controls";
import type { Bench } from "./use-bench";

/** The input type, scheme, contact type and where the resistors sit. */
export function InputWiringControls({ bench, inputTypes }: { bench: Bench; inputTypes: InputType[] }) {
  const { s, update, inputType } = bench;
  return (
    <Section title="Input and wiring">
      <SelectField label="Input type" value={s.inputTypeId} onChange={bench.chooseInputType} hint={inputType.description} testId="input-type">
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
        onChange={(scheme) => update((prev) => withScheme(prev, inputType, scheme))}
      />
      <Segmented
        legend="Contact type"
        name="contact"
        value={s.contact}
        options={[
          { value: "NC", label: "normally closed (NC)" },
          { value: "NO", label: "normally open (NO)" },
        ]}
        onChange={(contact) => update({ contact })}
      />
      <Segmented<Placement>
        legend="Resistor placement"
        name="placement"
        value={s.placement}
        columns={1}
        disabled={s.scheme === "none"}
        options={(["at-detector", "at-panel", "loop-back"] as const).map((p) => ({ value: p, label: PLACEMENT_WORDS[p] }))}
        hints={PLACEMENT_HINTS}
        onChange={(placement) => update({ placement })}
        testId="placement"
      />
    </Section>
  );
}

/** How many detectors, tamper contacts, life safety, each detector's state and the injected fault. */
export function DetectorFaultControls({ bench }: { bench: Bench }) {
  const { s, update, states } = bench;
  const n = bench.loop.detectors.length;
  return (
    <Section title="Detectors and fault">
      <Segmented
        legend="Number of detectors"
        name="count"
        value={String(n)}
        disabled={s.scheme === "shared"}
        options={Array.from({ length: MAX_DETECTORS }, (_, i) => ({ value: String(i + 1), label: String(i + 1) }))}
        onChange={(v) => update({ detectorCount: Number(v) })}
      />
      {s.scheme === "shared" ? <p className="-mt-2 text-xs text-slate-500">A shared input takes exactly two detectors, A and B.</p> : null}
      <label className="flex items-center gap-2 text-sm">
        <input type="checkbox" checked={s.tamper} onChange={(e) => update((prev) => withTamper(prev, e.target.checked))} />
        Each detector has a tamper contact (NC, in series)
      </label>
      <label className="flex items-center gap-2 text-sm">
        <input type="checkbox" checked={s.lifeSafety} onChange={(e) => update({ lifeSafety: e.target.checked })} />
        Smoke, heat or other life-safety detectors
      </label>
      {detectorLabels(s.scheme, n).map((label, i) => (
        <Segmented<DetectorState>
          key={`${s.scheme}-${i}`}
          legend={label}
          name={`state-${i}`}
          value={states[i]}
          options={(s.tamper ? (["rest", "active", "tamper"] as const) : (["rest", "active"] as const)).map((x) => ({ value: x, label: STATE_WORDS[x] }))}
          onChange={(st) => update((prev) => withState(prev, i, st))}
          testId={`detector-state-${i}`}
        />
      ))}
      <Segmented<Fault>
        legend="Inject a fault"
        name="fault"
        value={s.fault}
        columns={1}
        options={(["none", "short-panel", "short-detector", "cut"] as const).map((f) => ({ value: f, label: FAULT_CHOICES[f] }))}
        onChange={(fault) => update({ fault, conductor: null })}
        testId="fault"
      />
    </Section>
  );
}
