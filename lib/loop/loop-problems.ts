// What makes a loop description impossible to analyse. Shared by the request schema and analyzeLoop.
import type { InputType } from "@/lib/catalog/schema";
import type { LoopSpec } from "./types";
import { SCHEME_WORDS } from "@/lib/vocabulary/words";

export interface LoopProblem {
  /** Path inside the loop description, e.g. ["cable", "lengthM"]. */
  path: (string | number)[];
  message: string;
}

export const TEMP_MIN_C = -60;
export const TEMP_MAX_C = 150;
export const AWG_MIN = -3; // 0000 AWG
export const AWG_MAX = 40;
export const MAX_DETECTORS_PER_LOOP = 64;

const TEMP_KEYS = ["tempMinC", "tempMaxC"] as const;
const positiveFinite = (x: unknown): x is number => typeof x === "number" && Number.isFinite(x) && x > 0;
const nonNegativeFinite = (x: unknown): x is number => typeof x === "number" && Number.isFinite(x) && x >= 0;

/** Resistor values the loop actually has: what was fitted, else what the input type expects. */
export function fittedValues(loop: LoopSpec, inputType?: InputType): { eolOhms?: number; alarmOhms?: number; sharedOhms?: [number, number] } {
  return {
    eolOhms: loop.eolOhms ?? inputType?.eolOhms,
    alarmOhms: loop.alarmOhms ?? inputType?.alarmOhms,
    sharedOhms: loop.sharedOhms ?? inputType?.sharedOhms,
  };
}

function add(out: LoopProblem[], path: (string | number)[], message: string): void {
  out.push({ path, message });
}

/** Every reason the loop can't be analysed against this input type (or on its own, without one). */
export function loopProblems(loop: LoopSpec, inputType?: InputType): LoopProblem[] {
  return inputTypeProblems(loop, inputType, loopShapeProblems(loop));
}

/** Problems of the loop on its own: counts, lengths, temperatures, values (appended to `out`). */
export function loopShapeProblems(loop: LoopSpec, out: LoopProblem[] = []): LoopProblem[] {
  const n = loop.detectors.length;

  if (n === 0) add(out, ["detectors"], "a loop needs at least one detector");
  if (n > MAX_DETECTORS_PER_LOOP) add(out, ["detectors"], `at most ${MAX_DETECTORS_PER_LOOP} detectors on one loop (this one has ${n})`);
  if (loop.scheme === "shared" && n !== 2) add(out, ["detectors"], `a shared input takes exactly two detectors (this loop has ${n})`);
  if (loop.scheme !== "shared" && n > 1) {
    let nc = 0;
    for (const d of loop.detectors) if (d.contact === "NC") nc++;
    if (nc !== 0 && nc !== n)
      add(out, ["detectors"], "normally closed and normally open contacts can't share one loop: NC contacts go in series, NO contacts in parallel; wire them to separate inputs");
  }

  const c = loop.cable;
  if (!Number.isFinite(c.lengthM)) add(out, ["cable", "lengthM"], "cable length must be a finite number of metres");
  else if (c.lengthM < 0) add(out, ["cable", "lengthM"], `cable length can't be negative (${c.lengthM} m)`);
  if ("awg" in c.gauge) {
    if (!Number.isInteger(c.gauge.awg) || c.gauge.awg < AWG_MIN || c.gauge.awg > AWG_MAX)
      add(out, ["cable", "gauge", "awg"], `AWG must be a whole number from ${AWG_MIN} (0000) to ${AWG_MAX} (got ${c.gauge.awg})`);
  } else if (!positiveFinite(c.gauge.mm2)) add(out, ["cable", "gauge", "mm2"], `conductor cross-section must be more than 0 mm² (got ${c.gauge.mm2})`);
  for (const k of TEMP_KEYS)
    if (!Number.isFinite(c[k]) || c[k] < TEMP_MIN_C || c[k] > TEMP_MAX_C)
      add(out, ["cable", k], `cable temperature must be between ${TEMP_MIN_C} °C and ${TEMP_MAX_C} °C (got ${c[k]})`);
  if (c.tempMinC > c.tempMaxC) add(out, ["cable", "tempMaxC"], `the temperature range is upside down: minimum ${c.tempMinC} °C is above maximum ${c.tempMaxC} °C`);

  if (!Number.isFinite(loop.tolerancePct) || loop.tolerancePct <= 0 || loop.tolerancePct > 20)
    add(out, ["tolerancePct"], `part tolerance must be more than 0 % and at most 20 % (got ${loop.tolerancePct})`);
  if (!nonNegativeFinite(loop.contactOhms)) add(out, ["contactOhms"], `contact resistance must be 0 Ω or more (got ${loop.contactOhms})`);
  if (loop.shortOhms !== undefined && !nonNegativeFinite(loop.shortOhms)) add(out, ["shortOhms"], `short resistance must be 0 Ω or more (got ${loop.shortOhms})`);
  if (loop.eolOhms !== undefined && !positiveFinite(loop.eolOhms)) add(out, ["eolOhms"], `a resistor value must be more than 0 Ω (got ${loop.eolOhms})`);
  if (loop.alarmOhms !== undefined && !positiveFinite(loop.alarmOhms)) add(out, ["alarmOhms"], `a resistor value must be more than 0 Ω (got ${loop.alarmOhms})`);
  if (loop.sharedOhms)
    for (let i = 0; i < loop.sharedOhms.length; i++)
      if (!positiveFinite(loop.sharedOhms[i])) add(out, ["sharedOhms", i], `a resistor value must be more than 0 Ω (got ${loop.sharedOhms[i]})`);

  return out;
}

/** Problems of the loop against an input type: scheme support and resistor values neither fitted nor expected. */
export function inputTypeProblems(loop: LoopSpec, inputType?: InputType, out: LoopProblem[] = []): LoopProblem[] {
  const f = { eolOhms: loop.eolOhms ?? inputType?.eolOhms, alarmOhms: loop.alarmOhms ?? inputType?.alarmOhms, sharedOhms: loop.sharedOhms ?? inputType?.sharedOhms };
  const where = inputType ? "fitted or expected by the input type" : "fitted";
  if ((loop.scheme === "single-eol" || loop.scheme === "double-eol") && f.eolOhms === undefined)
    add(out, ["eolOhms"], `a ${loop.scheme === "single-eol" ? "single" : "double"} end-of-line loop needs an end-of-line resistor value (none ${where})`);
  if (loop.scheme === "double-eol" && f.alarmOhms === undefined) add(out, ["alarmOhms"], `a double end-of-line loop needs the alarm resistor value (none ${where})`);
  if (loop.scheme === "shared" && f.sharedOhms === undefined) add(out, ["sharedOhms"], `a shared input needs one resistor value per detector (none ${where})`);

  if (inputType) {
    if (!inputType.schemes.includes(loop.scheme))
      add(out, ["scheme"], `${inputType.name} does not take ${SCHEME_WORDS[loop.scheme]} wiring (it takes ${inputType.schemes.map((s) => SCHEME_WORDS[s]).join(", ")})`);
    else if (!inputType.bands[loop.scheme]) add(out, ["scheme"], `${inputType.name} has no bands for ${SCHEME_WORDS[loop.scheme]} wiring`);
  }
  return out;
}
