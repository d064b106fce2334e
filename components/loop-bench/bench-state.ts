// The loop bench's settings, the loop they describe, and the reading for the chosen states and fault.
// Pure: the bench runs the engine in the browser on every change.
import type { ContactType, InputType, Report, WiringScheme } from "@/lib/catalog/schema";
import { analyzeLoop, readingAt, reportsOf, rowLabel, type CableCores, type DetectorState, type Fault, type LoopAnalysis, type LoopSpec, type Placement } from "@/lib/loop";
import { conductorFaultOf, type ConductorChoice } from "./conductor-choice";

export const MAX_DETECTORS = 4;
export const MAX_LENGTH_M = 1000;

export interface BenchSettings {
  inputTypeId: string;
  scheme: WiringScheme;
  contact: ContactType;
  placement: Placement;
  detectorCount: number;
  tamper: boolean;
  lifeSafety: boolean;
  /** Fitted values, ohms (default: what the input type expects). */
  eolOhms: number | null;
  alarmOhms: number | null;
  sharedOhms: [number | null, number | null];
  tolerancePct: number;
  gauge: { unit: "mm2" | "awg"; value: number };
  lengthM: number;
  tempMinC: number;
  tempMaxC: number;
  /** One per possible detector; only the first detectorCount count. */
  states: DetectorState[];
  fault: Fault;
  /** A fault on the cable's cores instead of the input-pair fault (which is then "none"). */
  conductor: ConductorChoice | null;
  /** A cable carrying the tamper pair too (resistor at the detector, tamper contacts); null: the pair the placement needs. */
  cable?: TamperCable | null;
}

export type TamperCable = Extract<CableCores, "four-core-alarm-tamper" | "six-core-alarm-tamper">;

/** The cable the bench's loop uses: a tamper-pair cable only where the loop can carry one. */
export function benchCores(s: Pick<BenchSettings, "cable" | "placement" | "scheme" | "tamper">): TamperCable | undefined {
  return s.cable && s.placement === "at-detector" && s.tamper ? s.cable : undefined;
}

export { SCHEME_WORDS, PLACEMENT_WORDS } from "@/lib/vocabulary/words";

export const PLACEMENT_HINTS: Record<Placement, string> = {
  "at-detector": "fitted at the far end, as intended",
  "at-panel": "fitted across or in series at the input terminals",
  "loop-back": "at the panel, reached through a second pair out to the detector and back",
};

export const FAULT_CHOICES: Record<Fault, string> = {
  none: "no fault",
  "short-panel": "short at the panel end",
  "short-detector": "short at the detector end",
  cut: "cut (one conductor)",
};

export const STATE_WORDS: Record<DetectorState, string> = { rest: "rest", active: "active", tamper: "tamper" };

/** The scheme to start with: single end-of-line if the input type takes it, else the first with resistors. */
export function defaultScheme(t: InputType): WiringScheme {
  if (t.schemes.includes("single-eol")) return "single-eol";
  return t.schemes.find((s) => s !== "none") ?? t.schemes[0];
}

export function detectorLabels(scheme: WiringScheme, count: number): string[] {
  if (scheme === "shared") return ["Detector A", "Detector B"];
  return Array.from({ length: count }, (_, i) => `Detector ${i + 1}`);
}

export function toLoopSpec(s: BenchSettings): LoopSpec {
  const count = s.scheme === "shared" ? 2 : s.detectorCount;
  const labels = detectorLabels(s.scheme, count);
  const loop: LoopSpec = {
    scheme: s.scheme,
    placement: s.placement,
    detectors: labels.map((label) => ({ label, contact: s.contact, tamper: s.tamper, lifeSafety: s.lifeSafety })),
    tolerancePct: s.tolerancePct,
    cable: { gauge: s.gauge.unit === "awg" ? { awg: s.gauge.value } : { mm2: s.gauge.value }, lengthM: s.lengthM, tempMinC: s.tempMinC, tempMaxC: s.tempMaxC },
    contactOhms: 0.05, // a clean closed contact, common practice, no published source
  };
  if (s.scheme === "single-eol" || s.scheme === "double-eol" || s.scheme === "shared") loop.eolOhms = s.eolOhms ?? undefined;
  if (s.scheme === "double-eol") loop.alarmOhms = s.alarmOhms ?? undefined;
  if (s.scheme === "shared" && s.sharedOhms[0] !== null && s.sharedOhms[1] !== null) loop.sharedOhms = [s.sharedOhms[0], s.sharedOhms[1]];
  const cores = benchCores(s);
  if (cores) loop.cores = cores;
  const cf = conductorFaultOf(s.conductor, loop);
  if (cf) loop.conductorFaults = [cf];
  return loop;
}

/** The contact type whose loop reads normal at rest on this input type and scheme (NC unless only NO does). */
export function defaultContact(t: InputType, scheme: WiringScheme, base: BenchSettings): ContactType {
  for (const contact of ["NC", "NO"] as const) {
    const a = analyzeLoop(toLoopSpec({ ...base, scheme, contact, placement: "at-detector", states: base.states.map(() => "rest"), fault: "none", conductor: null }), t);
    if (a.valid !== false && a.rows[0]?.reports.length === 1 && a.rows[0].reports[0] === "normal") return contact;
  }
  return "NC";
}

/** Settings for a fresh input type: its scheme, its resistor values and tolerance; the cable is kept. */
export function settingsFor(t: InputType, keep?: Partial<BenchSettings>): BenchSettings {
  const scheme = keep?.scheme && t.schemes.includes(keep.scheme) ? keep.scheme : defaultScheme(t);
  const base: BenchSettings = {
    inputTypeId: t.id,
    scheme,
    contact: "NC",
    placement: keep?.placement ?? "at-detector",
    detectorCount: keep?.detectorCount ?? 1,
    tamper: keep?.tamper ?? true,
    lifeSafety: t.lifeSafety,
    eolOhms: t.eolOhms ?? null,
    alarmOhms: t.alarmOhms ?? null,
    sharedOhms: t.sharedOhms ? [t.sharedOhms[0], t.sharedOhms[1]] : [null, null],
    tolerancePct: t.tolerancePct,
    gauge: keep?.gauge ?? { unit: "mm2", value: 0.22 }, // 7/0.2 alarm cable, common practice, no published source
    lengthM: keep?.lengthM ?? 50,
    tempMinC: keep?.tempMinC ?? -10,
    tempMaxC: keep?.tempMaxC ?? 40,
    states: Array.from({ length: MAX_DETECTORS }, () => "rest" as DetectorState),
    fault: "none",
    conductor: keep?.conductor ?? null,
    cable: keep?.cable ?? null,
  };
  return { ...base, contact: defaultContact(t, scheme, base) };
}

/** A change of scheme: the contact type that suits it, and two detectors for a shared input. */
export function withScheme(s: BenchSettings, t: InputType, scheme: WiringScheme): BenchSettings {
  const next = { ...s, scheme, detectorCount: scheme === "shared" ? 2 : Math.min(s.detectorCount, MAX_DETECTORS) };
  return { ...next, contact: defaultContact(t, scheme, next) };
}

export interface CurrentReading {
  minOhms: number;
  maxOhms: number;
  nominalOhms: number;
  reports: Report[];
  uncertain: boolean;
  expected: Report;
  label: string;
  /** Index into analysis.rows, or null when the combination is not one the analysis enumerates. */
  row: number | null;
}

export function expectedReport(loop: LoopSpec, states: readonly DetectorState[], fault: Fault): Report {
  if (fault === "cut") return "open";
  if (fault !== "none") return "short";
  if (states.includes("tamper")) return "open";
  if (loop.scheme === "shared") {
    const a = states[0] === "active";
    const b = states[1] === "active";
    return a && b ? "active-both" : a ? "active-a" : b ? "active-b" : "normal";
  }
  return states.includes("active") ? "active" : "normal";
}

/**
 * The reading for the chosen states and fault: the analysed row when there is one, otherwise (three or four
 * detectors in a mix the analysis does not enumerate) computed the same way — low parts at the coldest
 * temperature, high parts at the hottest, since every reading is monotone in every resistance.
 */
export function currentReading(analysis: LoopAnalysis, loop: LoopSpec, t: InputType, states: readonly DetectorState[], fault: Fault): CurrentReading | null {
  if (analysis.valid === false) return null;
  const row = analysis.rows.findIndex((r) => r.fault === fault && r.states.every((x, i) => x === states[i]));
  if (row >= 0) {
    const r = analysis.rows[row];
    return { minOhms: r.minOhms, maxOhms: r.maxOhms, nominalOhms: r.nominalOhms ?? r.minOhms, reports: r.reports, uncertain: r.uncertain, expected: r.expected, label: r.label ?? "", row };
  }
  const iv = readingInterval(loop, t, states, fault);
  if (!iv) return null;
  return { ...iv, uncertain: iv.reports.length > 1, expected: expectedReport(loop, states, fault), label: rowLabel(loop.detectors, states, fault), row: null };
}

/** A reading interval worked out directly, the way analyzeLoop does: low parts when coldest, high parts when hottest. */
export function readingInterval(loop: LoopSpec, t: InputType, states: readonly DetectorState[], fault: Fault): { minOhms: number; maxOhms: number; nominalOhms: number; reports: Report[] } | null {
  const bands = t.bands[loop.scheme];
  if (!bands) return null;
  const k = loop.tolerancePct / 100;
  const scale = (x: number | undefined, f: number) => (x === undefined ? undefined : x * f);
  const sharedAt = (f: number): [number, number] | undefined => (loop.sharedOhms ?? t.sharedOhms)?.map((x) => x * f) as [number, number] | undefined;
  const at = (tempC: number, f: number) =>
    readingAt(loop, states, fault, { tempC, eolOhms: scale(loop.eolOhms ?? t.eolOhms, f), alarmOhms: scale(loop.alarmOhms ?? t.alarmOhms, f), sharedOhms: sharedAt(f) }, t);
  const minOhms = at(loop.cable.tempMinC, 1 - k);
  const maxOhms = at(loop.cable.tempMaxC, 1 + k);
  return { minOhms, maxOhms, nominalOhms: at((loop.cable.tempMinC + loop.cable.tempMaxC) / 2, 1), reports: reportsOf(bands, minOhms, maxOhms) };
}

export type RowStatus = "ok" | "uncertain" | "misread" | "defeat";

/** A short or an open may also read as trouble (lib/loop/README.md); everything else must read as itself. */
export function acceptableReport(expected: Report, x: Report): boolean {
  return x === expected || ((expected === "short" || expected === "open") && x === "trouble");
}

/** How a row fares: reads as it should; may read either side of an edge; reads as something else; a fault reads normal (defeat). */
export function rowStatus(r: { reports: readonly Report[]; expected: Report; uncertain: boolean; fault: Fault }): RowStatus {
  if (r.fault !== "none" && r.reports.includes("normal")) return "defeat";
  const ok = r.reports.filter((x) => acceptableReport(r.expected, x)).length;
  if (ok === r.reports.length) return r.uncertain && r.reports.length > 1 ? "uncertain" : "ok";
  return ok > 0 ? "uncertain" : "misread";
}
