import type { SupplyFigures } from "@/lib/solver/types";
import type { ContactType, DetectorCategory, Report, WiringScheme } from "@/lib/catalog/schema";
import type { BoardKind } from "@/lib/layout/schema";
import type { DetectorState, Fault, Placement, ResistorUse } from "@/lib/loop/types";
import type { ScheduleCableGauge } from "@/lib/schedule/schema";
import type { ZoneList } from "@/lib/sheet/zone-list";

// The terminal sheet: the installer's per-board wiring sheet, as data. The PDF and the page render this.
// Open readings are `Infinity`, as in the loop engine (use loopJsonReplacer for JSON).

/**
 * The tests made on each loop at commissioning. `-a`/`-b` name the first and second detector of a shared input.
 * `short` is a short across the pair at the far (detector) end, `cut` one conductor lifted there.
 */
export const TEST_KEYS = ["rest", "active", "active-a", "active-b", "active-both", "tamper", "tamper-a", "tamper-b", "short", "cut"] as const;
export type TestKey = (typeof TEST_KEYS)[number];

export interface ExpectedReading {
  test: TestKey;
  /** What the installer does for this test, in plain words. */
  instruction: string;
  /** The loop engine row it comes from. */
  states: DetectorState[];
  fault: Fault;
  /** The meter reading range across the pair at the panel end, ohms (Infinity = open, the meter shows OL). */
  minOhms: number;
  maxOhms: number;
  nominalOhms: number;
  /** e.g. "4.47–5.04 kΩ", or "open (meter shows OL)". */
  rangeText: string;
  /** What the panel makes of it; more than one when the range straddles a band edge. */
  reports: Report[];
  /** What a correctly supervised loop should report. */
  expectedReport: Report;
  uncertain: boolean;
  /** Filled in on site. */
  measured: null;
}

export type ResistorRole = ResistorUse["role"];
export type FittedAt = "at-detector" | "at-panel-terminals" | "loop-back";

export interface SheetResistor {
  role: ResistorRole;
  /** "end-of-line resistor", "alarm resistor", "resistor across Front door's contact". */
  name: string;
  ohms: number;
  /** "4.7 kΩ" */
  valueText: string;
  tolerancePct: number;
  /** IEC 60062 colour bands, empty when the value cannot be colour-coded. */
  bands: string[];
  /** E12 / E24 (IEC 60063), null when not a preferred value. */
  series: "E12" | "E24" | null;
  fittedAt: FittedAt;
  /** Where and how it is fitted, in plain words. */
  where: string;
}

export interface SheetCore {
  core: number;
  carries: "loop" | "loop-back" | "power";
  panelEnd: string;
  farEnd: string;
}

export interface SheetDetector {
  id: string;
  zone: number;
  label: string;
  area: string;
  room: string;
  catalogId: string;
  deviceType: string;
  category: DetectorCategory;
  contact: ContactType;
  tamper: boolean;
  lifeSafety: boolean;
  /** Needs power from a supply: two more cores. */
  powered: boolean;
  poweredFrom: string | null;
  cableM: number;
  gauge: ScheduleCableGauge;
  gaugeText: string;
  /** Every report this zone can give in the tests on the sheet. */
  reports: Report[];
}

export interface SheetInput {
  spare: false;
  boardKey: string;
  input: number;
  /** "3+ / 3−" */
  terminals: string;
  zones: number[];
  detectors: SheetDetector[];
  scheme: WiringScheme;
  schemeText: string;
  placement: Placement;
  placementText: string;
  resistors: SheetResistor[];
  /** Conductors of the loop itself: 2, or 4 with a loop-back resistor. */
  loopConductors: number;
  cores: SheetCore[];
  cable: { gauge: ScheduleCableGauge; gaugeText: string; lengthM: number; conductorOhms: { minOhms: number; maxOhms: number } | null };
  expected: ExpectedReading[];
  /** Why there are no expected readings, when there are none. */
  noReadingsReason: string | null;
  /** The solver's errors and warnings about this input (code and reason kept so the printed sheet can group them per board). */
  findings: { code: string; severity: "error" | "warning"; message: string; why: string }[];
}

export interface SpareInput {
  spare: true;
  boardKey: string;
  input: number;
  terminals: string;
  note: string;
}

export interface SheetBoard {
  boardKey: string;
  name: string;
  kind: BoardKind | "panel";
  catalogId: string;
  deviceName: string;
  busAddress: number | null;
  inputType: { id: string; name: string; tolerancePct: number } | null;
  rows: (SheetInput | SpareInput)[];
  signOff: string[];
}

export interface TerminalSheet {
  panel: { id: string; name: string } | null;
  boards: SheetBoard[];
  zoneCount: number;
  lifeSafety: boolean;
  /** The life-safety caution, on any sheet with smoke, heat or other life-safety devices. */
  caution: string | null;
  /** How the readings are taken. */
  measuringNote: string;
  unplaced: { id: string; label: string }[];
  /** Layout-wide errors (e.g. an unknown panel) that leave the sheet incomplete. */
  problems: string[];
  /** Each supply's figures from the same solve as the screens: loads, where the current goes, the battery to fit. */
  supplies: SupplyFigures[];
  /** Every zone as it is keyed into the panel, wireless detectors included. */
  zoneList: ZoneList;
}
