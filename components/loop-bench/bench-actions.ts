import type { InputType } from "@/lib/catalog/schema";
import { awgAreaMm2, type DetectorState, type Fault } from "@/lib/loop";
import { withScheme, type BenchSettings } from "@/components/loop-bench/bench-state";

// Changes of the bench's settings that touch more than one field, kept pure so they can be tested.

export const AWG_CHOICES = [14, 16, 18, 20, 22, 24, 26];
export const MM2_CHOICES = [0.14, 0.22, 0.5, 0.75, 1, 1.5];

/** The AWG size nearest a copper area (by ratio, so 0.2 and 0.4 mm² are equally far from 0.28). */
export function nearestAwg(mm2: number): number {
  let best = 22;
  for (let awg = 10; awg <= 30; awg++) if (Math.abs(Math.log(awgAreaMm2(awg) / mm2)) < Math.abs(Math.log(awgAreaMm2(best) / mm2))) best = awg;
  return best;
}

/** The same conductor written in the other unit. */
export function gaugeIn(gauge: BenchSettings["gauge"], unit: BenchSettings["gauge"]["unit"]): BenchSettings["gauge"] {
  if (unit === gauge.unit) return gauge;
  return unit === "awg" ? { unit: "awg", value: nearestAwg(gauge.value) } : { unit: "mm2", value: Number(awgAreaMm2(gauge.value).toPrecision(2)) };
}

/** One detector's state. */
export const withState = (s: BenchSettings, i: number, st: DetectorState): BenchSettings => ({ ...s, states: s.states.map((x, k) => (k === i ? st : x)) });

/** Tamper contacts on or off; a detector left in tamper goes back to rest when they go. */
export const withTamper = (s: BenchSettings, tamper: boolean): BenchSettings => ({ ...s, tamper, states: s.states.map((x) => (x === "tamper" && !tamper ? "rest" : x)) });

/** One of the shared input's two detector resistors. */
export const withSharedOhms = (s: BenchSettings, k: 0 | 1, ohms: number | null): BenchSettings => ({ ...s, sharedOhms: k === 0 ? [ohms, s.sharedOhms[1]] : [s.sharedOhms[0], ohms] });

/** A row of the states table taken as the current states and fault (states it does not give are kept). */
export const withRow = (s: BenchSettings, states: readonly (DetectorState | undefined)[], fault: Fault): BenchSettings => ({ ...s, states: s.states.map((x, i) => states[i] ?? x), fault, conductor: null });

/** The lesson of the bench: the resistor at the panel and a short at the detector end, every detector at rest. */
export function resistorAtPanelShort(s: BenchSettings, t: InputType): BenchSettings {
  const wired = s.scheme === "none" ? withScheme(s, t, t.schemes.find((x) => x !== "none") ?? s.scheme) : s;
  return { ...wired, placement: "at-panel", fault: "short-detector", conductor: null, states: s.states.map(() => "rest") };
}
