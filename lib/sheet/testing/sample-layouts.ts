import type { LayoutDocument } from "@/lib/layout/schema";
import type { Schedule, ScheduleDetector } from "@/lib/schedule/schema";

// Invented sample layouts on the shipped catalog, for the sheet, BOM, comparison and PDF tests.

const det = (id: string, label: string, catalogId: string, over: Partial<ScheduleDetector> = {}): ScheduleDetector => ({
  id,
  label,
  catalogId,
  area: "Ground floor",
  room: "Hall",
  cableM: 25,
  gauge: { awg: 22 },
  supervision: "double-eol",
  ...over,
});

/** Mid-size family: a door, a motion detector on a loop-back resistor, a NO panic button, a smoke detector on a fire board. */
export const midSchedule: Schedule = [
  det("d-door", "Front door", "contact-door-surface", { room: "Lobby" }),
  det("d-pir", "Lobby motion", "motion-wall", { room: "Lobby", cableM: 40, supervision: "single-eol" }),
  det("d-panic", "Desk panic button", "panic-button-no", { area: "Ground floor", room: "Reception", cableM: 15, supervision: "single-eol" }),
  det("d-smoke", "Store smoke", "smoke-4wire-no", { area: "Basement", room: "Store", cableM: 60, gauge: { mm2: 0.5 } }),
  det("d-back", "Back door", "contact-door-recessed", { room: "Kitchen", cableM: 30 }),
];

export const midLayout: LayoutDocument = {
  panelId: "panel-mid-16",
  boards: [{ key: "fire1", kind: "expansion", catalogId: "board-fire-4", busAddress: 1 }],
  inputs: [
    { boardKey: "panel", input: 1, detectorIds: ["d-door"], scheme: "double-eol", placement: "at-detector" },
    { boardKey: "panel", input: 2, detectorIds: ["d-pir"], scheme: "single-eol", placement: "loop-back" },
    { boardKey: "panel", input: 3, detectorIds: ["d-panic"], scheme: "single-eol", placement: "at-detector" },
    { boardKey: "panel", input: 5, detectorIds: ["d-back"], scheme: "single-eol", placement: "at-panel" },
    { boardKey: "fire1", input: 1, detectorIds: ["d-smoke"], scheme: "double-eol", placement: "at-detector" },
  ],
  power: { standbyProfileId: "intruder-grade-2", safetyFactor: 1.25 },
  busCableM: 40,
};

/** Large family: two detectors on one shared input, and a double end-of-line board. */
export const largeSchedule: Schedule = [
  det("l-door", "Side door", "contact-door-surface", { supervision: "shared-ok" }),
  det("l-win", "Side window", "contact-window-recessed", { supervision: "shared-ok", cableM: 35 }),
  det("l-pir", "Hall motion", "motion-dual", { cableM: 50 }),
];

export const largeLayout: LayoutDocument = {
  panelId: "panel-large-32",
  boards: [{ key: "deol", kind: "expansion", catalogId: "board-large-deol-8", busAddress: 1 }],
  inputs: [
    { boardKey: "panel", input: 1, detectorIds: ["l-door", "l-win"], scheme: "shared", placement: "at-detector" },
    { boardKey: "deol", input: 1, detectorIds: ["l-pir"], scheme: "double-eol", placement: "loop-back" },
  ],
  power: { standbyProfileId: "intruder-grade-2", safetyFactor: 1.25 },
  busCableM: 30,
};
