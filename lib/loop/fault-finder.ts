// The fault finder: from what an installer measured at the panel end (at rest, with the first detector active,
// with the far end shorted), rank the wiring faults and mistakes that explain the readings, and estimate the
// distance to a short from the loop resistance: d = R / (2 · r per metre), refined for the loop still
// connected beyond the short, with its spread from part tolerance and the cable's temperature range.
import type { InputType } from "@/lib/catalog/schema";
import { nearestPreferred } from "@/lib/resistors/e-series";
import { conductorOhmsPerM } from "./cable";
import { fittedValues } from "./loop-problems";
import { readingAt } from "./loop-model";
import type { DetectorState, Fault, LoopSpec } from "./types";

/** Readings in ohms; `Infinity` (or anything from `OPEN_OHMS` up) is an open loop. At least one is needed. */
export interface MeasuredReadings {
  restOhms?: number;
  activeOhms?: number;
  farEndShortedOhms?: number;
}

export type ExplanationKind = "as-designed" | "wrong-value" | "resistor-at-panel" | "swapped-resistors" | "short-at-distance" | "open-at-distance";

export interface Predicted {
  nominalOhms: number;
  minOhms: number;
  maxOhms: number;
}

export interface Explanation {
  kind: ExplanationKind;
  /** Plain words, e.g. "A 4.7 kΩ resistor fitted instead of 5.6 kΩ". */
  label: string;
  /** 1 = every reading at its predicted value; about 0.6 at the edge of the predicted interval; 0 = impossible. */
  fit: number;
  predicted: Partial<Record<keyof MeasuredReadings, Predicted>>;
  /** Short at a distance only: metres from the panel, with the spread from tolerance and temperature. */
  distance?: { metres: number; minM: number; maxM: number };
}

/** A meter reading this high is an open loop (common practice, no published source: meters show OL above a few MΩ). */
export const OPEN_OHMS = 1e6;
/** Meter resolution and lead resistance, ohms, added to both sides so readings near 0 Ω compare sensibly (common practice, no published source). */
const FLOOR_OHMS = 0.05;
/** Narrowest half-width in log space: a meter's own error, about 1 % (common practice, no published source). */
const MIN_SPREAD = Math.log(1.01);

const KEYS = ["restOhms", "activeOhms", "farEndShortedOhms"] as const;

function par(a: number, b: number): number {
  if (a === 0 || b === 0) return 0;
  if (a === Infinity) return b;
  if (b === Infinity) return a;
  return (a * b) / (a + b);
}

const isOpen = (x: number) => !(x < OPEN_OHMS);

/** How well one measured value sits in a predicted interval: exp(−½ (ln(m/nominal) / half-width)²). */
export function readingFit(measured: number, p: Predicted): number {
  if (isOpen(measured) || isOpen(p.nominalOhms)) return isOpen(measured) === isOpen(p.nominalOhms) ? 1 : 0;
  const m = measured + FLOOR_OHMS;
  const nom = p.nominalOhms + FLOOR_OHMS;
  const up = isOpen(p.maxOhms) ? Infinity : Math.log((p.maxOhms + FLOOR_OHMS) / nom);
  const down = Math.log(nom / (p.minOhms + FLOOR_OHMS));
  const z = Math.log(m / nom) / Math.max(m > nom ? up : down, MIN_SPREAD);
  return Math.exp(-0.5 * z * z);
}

/** Geometric mean of the fits of the readings given. */
function fitOf(measured: MeasuredReadings, predicted: Explanation["predicted"]): number {
  let logSum = 0;
  let n = 0;
  for (const k of KEYS) {
    const m = measured[k];
    const p = predicted[k];
    if (m === undefined || !p) continue;
    const f = readingFit(m, p);
    if (f === 0) return 0;
    logSum += Math.log(f);
    n++;
  }
  return n === 0 ? 0 : Math.exp(logSum / n);
}

function statesFor(loop: LoopSpec, active: boolean): DetectorState[] {
  return loop.detectors.map((_, i) => (active && i === 0 ? "active" : "rest"));
}

/** A reading of the loop as wired in `spec`, over tolerance and temperature. */
function predict(spec: LoopSpec, states: DetectorState[], fault: Fault, inputType: InputType | undefined): Predicted {
  const f = fittedValues(spec, inputType);
  const c = spec.cable;
  const at = (tempC: number, k: number) =>
    readingAt(
      spec,
      states,
      fault,
      { tempC, eolOhms: f.eolOhms && f.eolOhms * k, alarmOhms: f.alarmOhms && f.alarmOhms * k, sharedOhms: f.sharedOhms && [f.sharedOhms[0] * k, f.sharedOhms[1] * k] },
      inputType,
    );
  const tol = spec.tolerancePct / 100;
  return { nominalOhms: at((c.tempMinC + c.tempMaxC) / 2, 1), minOhms: at(c.tempMinC, 1 - tol), maxOhms: at(c.tempMaxC, 1 + tol) };
}

function predictAll(spec: LoopSpec, measured: MeasuredReadings, inputType: InputType | undefined): Explanation["predicted"] {
  const out: Explanation["predicted"] = {};
  // The far-end short is a test link: no resistance of its own.
  const linked: LoopSpec = { ...spec, shortOhms: 0 };
  if (measured.restOhms !== undefined) out.restOhms = predict(spec, statesFor(spec, false), "none", inputType);
  if (measured.activeOhms !== undefined) out.activeOhms = predict(spec, statesFor(spec, true), "none", inputType);
  if (measured.farEndShortedOhms !== undefined) out.farEndShortedOhms = predict(linked, statesFor(spec, false), "short-detector", inputType);
  return out;
}

function explain(kind: ExplanationKind, label: string, spec: LoopSpec, measured: MeasuredReadings, inputType: InputType | undefined): Explanation {
  const predicted = predictAll(spec, measured, inputType);
  return { kind, label, fit: fitOf(measured, predicted), predicted };
}

function ohmsWords(ohms: number): string {
  return ohms >= 1000 ? `${Number((ohms / 1000).toPrecision(3))} kΩ` : `${Number(ohms.toPrecision(3))} Ω`;
}

/**
 * Distance to a short from the panel end, metres. With the short at d the panel reads x ∥ (S − x), x = 2·r·d,
 * S = 2·r·L + D (D the detector end at rest); solving x² − S·x + R·S = 0 for the smaller root gives x, and
 * d = x / (2·r). When D is large this is d = R / (2·r per metre).
 */
export function distanceToShort(readingOhms: number, ohmsPerM: number, lengthM: number, detectorEndOhms: number): number {
  if (!(ohmsPerM > 0)) return NaN;
  const s = 2 * ohmsPerM * lengthM + detectorEndOhms;
  if (s === Infinity) return readingOhms / (2 * ohmsPerM);
  const disc = s * s - 4 * readingOhms * s;
  const x = disc <= 0 ? s / 2 : (s - Math.sqrt(disc)) / 2;
  return x / (2 * ohmsPerM);
}

function shortAtDistance(loop: LoopSpec, measured: MeasuredReadings, inputType: InputType | undefined): Explanation | null {
  const rest = measured.restOhms;
  if (rest === undefined || isOpen(rest) || loop.placement !== "at-detector") return null;
  const c = loop.cable;
  const L = c.lengthM;
  const tol = loop.tolerancePct / 100;
  const rMid = conductorOhmsPerM(c.gauge, (c.tempMinC + c.tempMaxC) / 2);
  const rLo = conductorOhmsPerM(c.gauge, c.tempMinC);
  const rHi = conductorOhmsPerM(c.gauge, c.tempMaxC);
  // The detector end at rest (parts nominal): the loop on a zero-length cable.
  const dAt = (k: number) => predictAt0(loop, inputType, k);
  const d0 = dAt(1);
  const dist = distanceToShort(rest, rMid, L, d0);
  if (!(dist <= L * 1.05)) return null; // more cable than the run: not a short on this loop
  const far = distanceToShort(rest, rLo, L, dAt(1 - tol)); // cold conductors, low parts: the most cable for this reading
  const near = distanceToShort(rest, rHi, L, dAt(1 + tol));
  const d = Math.min(dist, L);
  const reading = (r: number, de: number) => par(2 * r * d, 2 * r * (L - d) + de);
  const predicted: Explanation["predicted"] = {};
  const activeEnd = predictAt0(loop, inputType, 1, true);
  predicted.restOhms = { nominalOhms: reading(rMid, d0), minOhms: reading(rLo, dAt(1 - tol)), maxOhms: reading(rHi, dAt(1 + tol)) };
  if (measured.activeOhms !== undefined) predicted.activeOhms = { nominalOhms: reading(rMid, activeEnd), minOhms: reading(rLo, predictAt0(loop, inputType, 1 - tol, true)), maxOhms: reading(rHi, predictAt0(loop, inputType, 1 + tol, true)) };
  if (measured.farEndShortedOhms !== undefined) predicted.farEndShortedOhms = { nominalOhms: reading(rMid, 0), minOhms: reading(rLo, 0), maxOhms: reading(rHi, 0) };
  const metres = Math.round(dist * 10) / 10;
  return {
    kind: "short-at-distance",
    label: `A short across the pair about ${metres} m from the panel`,
    fit: fitOf(measured, predicted),
    predicted,
    distance: { metres: dist, minM: Math.min(near, far), maxM: Math.max(near, far) },
  };
}

/** The loop's reading on a zero-length cable, parts scaled by k (the detector end plus anything at the panel). */
function predictAt0(loop: LoopSpec, inputType: InputType | undefined, k: number, active = false): number {
  const f = fittedValues(loop, inputType);
  return readingAt(
    loop,
    statesFor(loop, active),
    "none",
    { tempC: 20, lengthM: 0, eolOhms: f.eolOhms && f.eolOhms * k, alarmOhms: f.alarmOhms && f.alarmOhms * k, sharedOhms: f.sharedOhms && [f.sharedOhms[0] * k, f.sharedOhms[1] * k] },
    inputType,
  );
}

/** The E24 value a single resistor would need to give the rest reading, when it differs from the one designed. */
function wrongValue(loop: LoopSpec, measured: MeasuredReadings, inputType: InputType | undefined): Explanation | null {
  const rest = measured.restOhms;
  const f = fittedValues(loop, inputType);
  if (rest === undefined || isOpen(rest) || f.eolOhms === undefined || (loop.scheme !== "single-eol" && loop.scheme !== "double-eol")) return null;
  // Double end-of-line with an NO contact reads both resistors at rest: one reading can't say which is wrong.
  if (loop.scheme === "double-eol" && loop.detectors.some((d) => d.contact === "NO")) return null;
  const c = loop.cable;
  const cable = (loop.placement === "loop-back" ? 4 : 2) * conductorOhmsPerM(c.gauge, (c.tempMinC + c.tempMaxC) / 2) * c.lengthM;
  const contacts = loop.detectors.length * loop.contactOhms;
  const r = rest - cable - contacts; // the end-of-line resistor at rest: NC contacts closed in series, or NO contacts open across it
  if (!(r >= 10 && r <= 1e6)) return null;
  const candidates = nearestPreferred(r, "E24").filter((v) => Math.abs(v - f.eolOhms!) > 0.005 * f.eolOhms!);
  let best: Explanation | null = null;
  for (const v of candidates) {
    const e = explain("wrong-value", `A ${ohmsWords(v)} end-of-line resistor fitted instead of ${ohmsWords(f.eolOhms)}`, { ...loop, eolOhms: v }, measured, inputType);
    if (!best || e.fit > best.fit) best = e;
  }
  return best;
}

/** Every explanation considered, best fit first. Without an input type the loop's own fitted values are used. */
export function findFaults(loop: LoopSpec, inputType: InputType | undefined, measured: MeasuredReadings): Explanation[] {
  if (KEYS.every((k) => measured[k] === undefined)) return [];
  const out: Explanation[] = [explain("as-designed", "Wired as designed: nothing wrong", loop, measured, inputType)];
  const wv = wrongValue(loop, measured, inputType);
  if (wv) out.push(wv);
  if (loop.scheme !== "none" && loop.placement !== "at-panel")
    out.push(explain("resistor-at-panel", "The resistor fitted at the panel, not at the detector", { ...loop, placement: "at-panel" }, measured, inputType));
  const shared = fittedValues(loop, inputType).sharedOhms;
  if (loop.scheme === "shared" && shared && shared[0] !== shared[1])
    out.push(explain("swapped-resistors", `The two detectors' resistors swapped (${ohmsWords(shared[1])} on ${loop.detectors[0].label}, ${ohmsWords(shared[0])} on ${loop.detectors[1].label})`, { ...loop, sharedOhms: [shared[1], shared[0]] }, measured, inputType));
  const sh = shortAtDistance(loop, measured, inputType);
  if (sh) out.push(sh);
  const open: Explanation["predicted"] = {};
  const inf: Predicted = { nominalOhms: Infinity, minOhms: Infinity, maxOhms: Infinity };
  for (const k of KEYS) if (measured[k] !== undefined) open[k] = inf;
  out.push({ kind: "open-at-distance", label: "A conductor open between the panel and the detector", fit: fitOf(measured, open), predicted: open });
  return out.sort((a, b) => b.fit - a.fit);
}
