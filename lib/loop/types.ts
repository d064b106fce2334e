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
  /** The cable's cores; default two-core, or four-core-loop-back with a loop-back resistor. */
  cores?: CableCores;
  /** Conductor faults to check: "all" enumerates every single one (loops of up to 8 detectors). */
  conductorFaults?: "all" | ConductorFault[];
  /** NFPA 72 pathway class; "class-a" wires the loop out past every detector and back to the panel. */
  pathway?: Pathway;
}

/** Cores named by colour (the colours of common alarm cable; common practice, no published source). */
export type CoreColour = "yellow" | "blue" | "green" | "white" | "red" | "black";
/**
 * two-core: the input pair (yellow out, blue back). four-core-loop-back: the input pair plus green and white
 * out to the detector and back to the loop-back resistor. four-core-alarm-tamper: the alarm pair (yellow,
 * blue) and the tamper pair (green, white), linked in series at the panel so both sit on one input.
 * six-core-alarm-tamper: the same two pairs plus the detectors' supply pair (red +, black 0 V) from the panel.
 */
export type CableCores = "two-core" | "four-core-loop-back" | "four-core-alarm-tamper" | "six-core-alarm-tamper";
/** A part a stray strand or a wrong link can short on its own terminals. */
export type LoopPart = "contact" | "tamper" | "eol" | "alarm" | "shared-a" | "shared-b";
/** A conductor fault; `atM` is metres from the panel end (0) to the detector end (the cable length). */
export type ConductorFault =
  | { kind: "short"; cores: [CoreColour, CoreColour]; atM: number }
  | { kind: "open"; core: CoreColour; atM: number }
  | { kind: "earth"; core: CoreColour; atM: number }
  | { kind: "part-short"; part: LoopPart; detector?: number };
export type Pathway = "class-b" | "class-a";

/** detected / mistaken / defeat as for the input-pair faults; an earth fault on an input that doesn't watch earth is
 * not-supervised; a short between points already joined changes nothing (no-effect). */
export type ConductorVerdict = "detected" | "mistaken" | "defeat" | "not-supervised" | "no-effect";

export type ConductorReading = Omit<Reading, "fault">;

export interface ConductorFaultResult {
  fault: ConductorFault;
  /** e.g. "a short between the yellow and green cores at the detector end". */
  label: string;
  verdict: ConductorVerdict;
  /** One row per detector-state combination, in the order of the input-pair rows' combinations. */
  rows: ConductorReading[];
}

export interface ConductorAnalysis {
  cores: CableCores;
  colours: CoreColour[];
  faults: ConductorFaultResult[];
}

/** One single open on a Class A loop: what the panel reads, and whether each detector is still reported. */
export interface ClassAOpen {
  core: CoreColour;
  atM: number;
  /** e.g. "the yellow core open between Detector 1 and Detector 2". */
  label: string;
  /** The loop at rest read from the out terminals, as the panel first sees the open. */
  rest: ConductorReading;
  /** The rest reading is open or trouble, so the panel knows to feed the loop from both ends. */
  openReported: boolean;
  devices: { detector: number; side: "out" | "return" | null; reading: ConductorReading; reported: boolean }[];
}

export interface ClassAAnalysis {
  /** Every detector, active alone, is reported after any single open, and each open is reported. */
  everyDeviceReported: boolean;
  opens: ClassAOpen[];
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
  /** Conductor faults, when the loop asks for them. */
  conductors?: ConductorAnalysis;
  /** Class A loops only: every single open and what is still reported. */
  classA?: ClassAAnalysis;
}

/** `target` is where findings point (default `{ kind: "layout" }`). */
export type AnalyzeLoop = (loop: LoopSpec, inputType: InputType, target?: FindingTarget) => LoopAnalysis;
