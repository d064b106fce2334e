import type { ScheduleDetector } from "@/lib/schedule/schema";
import type { LayoutDocument } from "@/lib/layout/schema";

// Small builders for tests.

export function det(id: string, catalogId: string, over: Partial<ScheduleDetector> = {}): ScheduleDetector {
  return { id, label: `Detector ${id}`, catalogId, area: "Ground", room: "Hall", cableM: 20, gauge: { awg: 22 }, supervision: "double-eol", ...over };
}

export function emptyLayout(panelId: string, over: Partial<LayoutDocument> = {}): LayoutDocument {
  return { panelId, boards: [], inputs: [], power: { standbyProfileId: "intruder-grade-2", safetyFactor: 1.2 }, busCableM: 50, ...over };
}
