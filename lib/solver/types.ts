import type { OutputSwitching, WiringScheme, ZoneType } from "@/lib/catalog/schema";
import type { Finding } from "@/lib/findings";
import type { Fault, LoopAnalysis } from "@/lib/loop/types";
import type { BoardKind, InputRef, LayoutDocument } from "@/lib/layout/schema";
import type { BatteryPick } from "@/lib/solver/battery";

export interface BoardFigures {
  boardKey: string;
  /** "panel" for the control panel. */
  kind: BoardKind | "panel";
  catalogId: string;
  name: string;
  inputsTotal: number;
  inputsUsed: number;
  inputsFree: number;
  /** Detectors on this board's inputs (a shared input counts two). */
  detectors: number;
}

export interface CapacityTotals {
  inputsTotal: number;
  inputsUsed: number;
  inputsFree: number;
  /** Each placed detector is one zone (the two on a shared input are reported apart). */
  zonesUsed: number;
  maxZones: number;
  detectorsPlaced: number;
  unplacedIds: string[];
  /** The wireless ones among them: each waits for a zone and a place on a receiver, not for an input. */
  unplacedWirelessIds: string[];
}

export interface BusFigures {
  devices: number;
  maxDevices: number;
  addressMin: number;
  addressMax: number;
  addresses: { boardKey: string; address: number | null }[];
  duplicateAddresses: number[];
  outOfRange: { boardKey: string; address: number }[];
  cableM: number;
  maxCableM: number;
}

/** One line of where a supply's current goes. */
export interface PowerDraw {
  /** "own": the supply's (or panel's, or board's) own draw; "sounder" once the catalog has sounders. */
  kind: "own" | "board" | "keypad" | "detector" | "sounder";
  /** The board key, the detector id, or the supply key for its own draw. */
  key: string;
  name: string;
  restMa: number;
  alarmMa: number;
}

export interface SupplyFigures {
  /** "panel" for the panel's auxiliary output, else the board key. */
  supplyKey: string;
  name: string;
  kind: "panel" | "supply-board" | "own-supply";
  volts: number;
  /** Battery voltage at the end of the standby period (on battery, mains failed). */
  endVolts: number;
  ratingMa: number;
  /** Current drawn from the output by what it powers. */
  loadRestMa: number;
  loadAlarmMa: number;
  /** The supply's (or board's, or panel's) own consumption, carried by its battery. */
  ownRestMa: number;
  ownAlarmMa: number;
  /** Sounders and strobes on the panel's own outputs (siren and programmable): on its battery, not through the auxiliary output. */
  outputRestMa: number;
  outputAlarmMa: number;
  /** What the battery carries: own draw plus load plus output loads. The battery note and every screen use these two. */
  batteryRestMa: number;
  batteryAlarmMa: number;
  /** Own draw first, then each board and keypad it powers, then each powered detector; sums to batteryRestMa / batteryAlarmMa. */
  breakdown: PowerDraw[];
  batteryNeededAh: number;
  maxBatteryAh: number;
  /** Standard batteries that hold batteryNeededAh within maxBatteryAh; null when none do. */
  batteryPick: BatteryPick | null;
  /** Boards it powers (besides itself). */
  powers: string[];
}

/** The voltage left at a powered device after the drop on its cable: a detector, a sounder or a strobe. */
export interface CableDropFigures {
  supplyKey: string;
  supplyVolts: number;
  currentMa: number;
  /** Round-trip resistance of the power pair at the hot end of the temperature range, ohms. */
  cableOhms: number;
  dropV: number;
  volts: number;
  minVolts: number;
  /** At the supply's charging voltage. */
  ok: boolean;
  /** Worst case: on battery at the end of its standby discharge. */
  okOnBattery: boolean;
}

export interface DetectorVoltage extends CableDropFigures {
  detectorId: string;
  /** Worst case: the supply's battery at the end of its standby discharge, less the same drop. */
  endSupplyVolts: number;
  endVolts: number;
  /** The device's own minimum (the panel's minimum device voltage is a figure for mains). */
  endMinVolts: number;
}

export interface LoopSummary {
  faults: LoopAnalysis["faults"];
  maxCableM: number | null;
  uncertain: boolean;
  errors: number;
  warnings: number;
  /** Class A inputs only: every device still reports after any single open (NFPA 72 Class A). */
  classAEveryDeviceReported?: boolean;
}

export interface InputFigures extends InputRef {
  detectorIds: string[];
  scheme: WiringScheme;
  inputTypeId: string | null;
  pathway: "class-b" | "class-a";
  longestCableM: number;
  loop: LoopSummary | null;
  /** A short and a cut are both reported as themselves. */
  covered: boolean;
}

export interface SharedInputFigures extends InputRef {
  detectorIds: string[];
  /** Faults not reported as themselves on this input. */
  lost: Fault[];
}

export interface SolveResult {
  /** Errors first, then warnings, then notes; rule order within a severity. */
  findings: Finding[];
  counts: { error: number; warning: number; note: number };
  boards: BoardFigures[];
  totals: CapacityTotals;
  bus: BusFigures | null;
  supplies: SupplyFigures[];
  detectors: DetectorVoltage[];
  inputs: InputFigures[];
  shared: { inputs: number; inputsSaved: number; entries: SharedInputFigures[] };
  coverage: { used: number; covered: number; share: number | null };
  battery: { profileId: string; source: string | null; standbyH: number; alarmMin: number; safetyFactor: number } | null;
  zones: ZoneFigures[];
  areas: AreaFigures[];
  outputs: OutputFigures[];
  outputDevices: OutputDeviceVoltage[];
  receivers: ReceiverFigures[];
  /** The layout's security grade and the limits it sets; null when no grade is chosen. */
  grade: GradeFigures | null;
}

/** One zone as the installer keys it in: numbered in board order, input order, then wireless detectors by receiver. */
export interface ZoneFigures {
  number: number;
  detectorId: string;
  /** The name chosen (the programming's keypad label, else the detector's label). */
  label: string;
  /** What the keypad shows: the label cut to the panel's zone label length. */
  keypadLabel: string;
  labelCut: boolean;
  type: ZoneType;
  areaKey: string | null;
  areaName: string | null;
  partSet: boolean;
  entryS: number | null;
  exitS: number | null;
  entryRoute: boolean;
  chime: boolean;
  /** "Control panel, input 3" or "Wireless receiver 1". */
  where: string;
  boardKey: string;
  /** Null for a wireless detector. */
  input: number | null;
  wireless: boolean;
}

export interface AreaFigures {
  key: string;
  name: string;
  zones: number;
  keypadKeys: string[];
}

export interface OutputFigures {
  boardKey: string;
  output: number;
  /** "Control panel, siren output 1" */
  name: string;
  purpose: "siren" | "programmable";
  switching: OutputSwitching;
  ratingMa: number;
  deviceIds: string[];
  restMa: number;
  alarmMa: number;
  ok: boolean;
}

/** The voltage left at a sounder or strobe after the drop on its cable, as for a powered detector. */
export interface OutputDeviceVoltage extends CableDropFigures {
  deviceId: string;
  boardKey: string;
  output: number;
  endVolts: number;
}

export interface ReceiverFigures {
  boardKey: string;
  name: string;
  detectorIds: string[];
  maxDevices: number;
}

export interface GradeFigures {
  grade: 1 | 2 | 3 | 4;
  maxEntryS: number;
  maxExitS: number;
  standbyProfileIds: string[];
  /** What changes at this grade, in words, each with where it comes from. */
  rules: { text: string; source: string }[];
}

export interface Solver {
  solve(layout: LayoutDocument): SolveResult;
  /** The full loop analysis of an input from the last solve. */
  analysisFor(ref: InputRef): LoopAnalysis | null;
  /** Cache use in the last solve, for tests and benchmarks: inputs whose outcome was reused or recomputed, loop analyses found or run, and whether it patched the solve before (else it solved in full). */
  stats(): { inputsReused: number; inputsRecomputed: number; loopHits: number; loopMisses: number; patched: boolean };
}
