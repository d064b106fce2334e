"use client";

import { useMemo, useState } from "react";
import type { InputType } from "@/lib/catalog/schema";
import { analyzeLoop, conductorOhmsPerM } from "@/lib/loop";
import { currentReading, settingsFor, toLoopSpec, type BenchSettings } from "@/components/loop-bench/bench-state";

// The bench's settings and everything derived from them; the engine is pure, so it runs on every change.

export function useBench(inputTypes: InputType[]) {
  const first = inputTypes.find((t) => t.schemes.includes("single-eol")) ?? inputTypes[0];
  const [s, setS] = useState<BenchSettings>(() => settingsFor(first));
  const inputType = inputTypes.find((t) => t.id === s.inputTypeId) ?? first;
  const loop = useMemo(() => toLoopSpec(s), [s]);
  const analysis = useMemo(() => analyzeLoop(loop, inputType), [loop, inputType]);
  const n = loop.detectors.length;
  const states = s.states.slice(0, n);
  const reading = analysis.valid === false ? null : currentReading(analysis, loop, inputType, states, s.fault);

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
    lifeSafety: s.lifeSafety || inputType.lifeSafety,
    gaugeText: s.gauge.unit === "awg" ? `${s.gauge.value} AWG` : `${s.gauge.value} mm²`,
    conductors: loop.placement === "loop-back" && loop.scheme !== "none" ? 4 : 2,
    /** Ohms per km of one conductor at 20 °C; NaN while the size is not a positive number. */
    perKm: Number.isFinite(s.gauge.value) && s.gauge.value > 0 ? conductorOhmsPerM(loop.cable.gauge, 20) * 1000 : NaN,
  };
}

export type Bench = ReturnType<typeof useBench>;
