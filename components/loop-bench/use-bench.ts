"use client";

import { useMemo, useState } from "react";
import type { InputType } from "@/lib/catalog/schema";
import { analyzeLoop, conductorFaultReading, conductorOhmsPerM, type ConductorFaultResult, type DetectorState, type LoopAnalysis, type LoopSpec } from "@/lib/loop";
import { currentReading, settingsFor, toLoopSpec, type BenchSettings, type CurrentReading } from "@/components/loop-bench/bench-state";

// The bench's settings and everything derived from them; the engine is pure, so it runs on every change.

/** The chosen conductor fault's reading for the current states: its analysed row, or worked out for a mix it doesn't list. */
function conductorCurrent(result: ConductorFaultResult, loop: LoopSpec, t: InputType, states: readonly DetectorState[]): CurrentReading {
  const row = result.rows.find((r) => r.states.every((x, i) => x === states[i])) ?? conductorFaultReading(loop, t, result.fault, states);
  return { minOhms: row.minOhms, maxOhms: row.maxOhms, nominalOhms: row.nominalOhms ?? row.minOhms, reports: row.reports, uncertain: row.uncertain, expected: row.expected, label: row.label ?? result.label, row: null };
}

export function useBench(inputTypes: InputType[]) {
  const first = inputTypes.find((t) => t.schemes.includes("single-eol")) ?? inputTypes[0];
  const [s, setS] = useState<BenchSettings>(() => settingsFor(first));
  const inputType = inputTypes.find((t) => t.id === s.inputTypeId) ?? first;
  const loop = useMemo(() => toLoopSpec(s), [s]);
  const analysis: LoopAnalysis = useMemo(() => analyzeLoop(loop, inputType), [loop, inputType]);
  const n = loop.detectors.length;
  const states = s.states.slice(0, n);
  /** The conductor fault in force, once its cores are chosen. */
  const conductor = analysis.valid !== false ? (analysis.conductors?.faults[0] ?? null) : null;
  const reading = analysis.valid === false ? null : conductor ? conductorCurrent(conductor, loop, inputType, states) : currentReading(analysis, loop, inputType, states, s.fault);

  /** Change the settings: a patch of fields, or a function of the previous settings. */
  const update = (change: Partial<BenchSettings> | ((prev: BenchSettings) => BenchSettings)) => setS((prev) => (typeof change === "function" ? change(prev) : { ...prev, ...change }));
  const chooseInputType = (id: string) => {
    const t = inputTypes.find((x) => x.id === id);
    if (t) setS((prev) => settingsFor(t, prev));
  };

  return {
    s,
    update,
    chooseInputType,
    inputType,
    loop,
    analysis,
    states,
    reading,
    conductor,
    lifeSafety: s.lifeSafety || inputType.lifeSafety,
    gaugeText: s.gauge.unit === "awg" ? `${s.gauge.value} AWG` : `${s.gauge.value} mm²`,
    conductors: loop.placement === "loop-back" && loop.scheme !== "none" ? 4 : 2,
    /** Ohms per km of one conductor at 20 °C; NaN while the size is not a positive number. */
    perKm: Number.isFinite(s.gauge.value) && s.gauge.value > 0 ? conductorOhmsPerM(loop.cable.gauge, 20) * 1000 : NaN,
  };
}

export type Bench = ReturnType<typeof useBench>;
