import type { LayoutDocument } from "@/lib/layout/schema";
import type { Schedule } from "@/lib/schedule/schema";

// A layout of any size from the shipped catalog's large family: the panel's 32 on-board inputs, then 8-input
// expansion boards, one detector per input. For the query-count test and the load bench (a 500-detector
// layout is past the panel's zone limit, which the solver reports as a finding; the size is the point).

const detectorTypes = ["contact-door-surface", "motion-wall", "contact-window-surface", "motion-ceiling"];

/** A device-schedule CSV of `n` detectors in the import's columns. */
export function scheduleCsvOf(n: number): string {
  const rows = Array.from({ length: n }, (_, i) => `Detector ${i + 1},${detectorTypes[i % detectorTypes.length]},Floor ${1 + Math.floor(i / 100)},Room ${1 + (i % 20)},${10 + (i % 40)},22 AWG,single-eol`);
  return ["label,type,area,room,cable_m,gauge,supervision", ...rows].join("\n");
}

/** The same `n` detectors as a schedule (ids d1…dn), for a bench that solves without a server. */
export function largeSchedule(n: number): Schedule {
  return Array.from({ length: n }, (_, i) => ({ id: `d${i + 1}`, label: `Detector ${i + 1}`, catalogId: detectorTypes[i % detectorTypes.length], area: `Floor ${1 + Math.floor(i / 100)}`, room: `Room ${1 + (i % 20)}`, cableM: 10 + (i % 40), gauge: { awg: 22 }, supervision: "single-eol" }));
}

/** One detector per input: panel-large-32's own 32, then as many board-large-8 as the rest needs. */
export function largeLayoutDocument(detectorIds: string[], busCableM = 120): LayoutDocument {
  const onPanel = 32;
  const boards = Math.max(0, Math.ceil((detectorIds.length - onPanel) / 8));
  return {
    panelId: "panel-large-32",
    boards: Array.from({ length: boards }, (_, b) => ({ key: `b${b + 1}`, kind: "expansion" as const, catalogId: "board-large-8", busAddress: b + 1 })),
    inputs: detectorIds.map((id, i) =>
      i < onPanel
        ? { boardKey: "panel", input: i + 1, detectorIds: [id], scheme: "single-eol" as const, placement: "at-detector" as const }
        : { boardKey: `b${Math.floor((i - onPanel) / 8) + 1}`, input: ((i - onPanel) % 8) + 1, detectorIds: [id], scheme: "single-eol" as const, placement: "at-detector" as const },
    ),
    power: { standbyProfileId: "intruder-grade-2", safetyFactor: 1.2 },
    busCableM,
  };
}
