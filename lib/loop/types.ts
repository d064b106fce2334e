import type { ContactType, InputType, Report, WiringScheme } from "@/lib/catalog/schema";
import type { Finding, FindingTarget } from "@/lib/findings";

/** Where the end-of-line resistor(s) are physically and electrically fitted. */
export type Placement =
  | "at-detector" // at the far end, as intended
  | "at-panel" // across/in series at the input terminals: the common mistake, supervises nothing
  | "loop-back"; // physically at the panel, electrically at the far end via a four-conductor cable out and back

export type CableGauge = { awg: number } | { mm2: number };

export interface CableSpec {
  gauge: CableGauge;
  /** One-way length from the input to the (last) detector, metres. */
  lengthM: number;
  /** Conductor temperature range, °C; the reading interval covers the whole range. */
  tempMinC: number;
  tempMaxC: number;
}

export interface LoopDetector {
  label: string;
  contact: ContactType;
  /** A separate tamper contact (NC), wired in series with the loop. */
  tamper: boolean;
  lifeSafety: boolean;
}

export interface LoopSpec {
  scheme: WiringScheme;
  placement: Placement;
  /** shared: exactly two detectors; otherwise one or more (NC in series, NO in parallel). */
  detectors: LoopDetector[];
  /** Values actually fitted (may differ from what the input type expects). */
  eolOhms?: number;
  alarmOhms?: number;
  sharedOhms?: [number, number];
  /** Tolerance of the fitted parts, percent. */
  tolerancePct: number;
  cable: CableSpec;
  /** Resistance of one closed contact, ohms. */
  contactOhms: number;
  /** Resistance of an injected short (the fault itself), ohms; default 0. */
  shortOhms?: number;
}

export type DetectorState = "rest" | "active" | "tamper";
export type Fault = "none" | "short-panel" | "short-detector" | "cut";

/** Read-only: rows of one state combination share their `states` array, and `reports` arrays may be shared and frozen. */
export interface Reading {
  /** One entry per detector in `LoopSpec.detectors`. */
  states: DetectorState[];
  fault: Fault;
  minOhms: number;
  /** `Infinity` for an open loop. */
  maxOhms: number;
  /** Every report the interval touches, lowest band first. */
  reports: Report[];
  /** The interval straddles a band edge. */
  uncertain: boolean;
  /** Distance from the interval to the nearest band edge, ohms (0 when uncertain). */
  marginOhms: number;
  /** What a correctly supervised loop should report here. */
  expected: Report;
  /** Parts at their marked values, cable at the middle of its temperature range (always set by analyzeLoop). */
  nominalOhms?: number;
  /** Plain description of the row, e.g. "Front door active, short at the detector end" (always set by analyzeLoop). */
  label?: string;
}

export interface ResistorUse {
  role: "eol" | "alarm" | "shared-a" | "shared-b";
  ohms: number;
  expectedOhms: number | null;
  preferred: { series: "E12" | "E24" | null; nearest: number[] };
  /** IEC 60062 colour bands, e.g. ["yellow","violet","red","gold"]. */
  bands: string[];
}

export interface LoopAnalysis {
  rows: Reading[];
  findings: Finding[];
  resistors: ResistorUse[];
  /** Per fault kind: detected as itself, mistaken for another report, or reading as normal (defeat). */
  faults: Record<Exclude<Fault, "none">, "detected" | "mistaken" | "defeat">;
  /** Pairs of (states, fault) combinations whose readings the panel cannot tell apart. */
  indistinguishable: Array<[number, number]>;
  /** The longest one-way cable run, metres, before any reading leaves its band (null if unlimited). */
  maxCableM: number | null;
  /** Shared inputs only: the decode table of the four state combinations. */
  decode?: { states: DetectorState[]; minOhms: number; maxOhms: number; report: Report; unique: boolean }[];
  /** False when the loop description itself is impossible (see findings); rows are then empty and faults read "defeat". */
  valid?: boolean;
  /** Resistance of the conductors in the loop path over the temperature range (4 conductors for loop-back). */
  conductorOhms?: { minOhms: number; maxOhms: number };
  /** The longest one-way run before the conductors exceed the input type's maxLoopOhms at the hottest temperature. */
  maxCableByLoopOhmsM?: number | null;
  /** Shared inputs only: what is lost compared with one detector per input, in plain words. */
  sharedLost?: string[];
}

/** `target` is where findings point (default `{ kind: "layout" }`). */
export type AnalyzeLoop = (loop: LoopSpec, inputType: InputType, target?: FindingTarget) => LoopAnalysis;
