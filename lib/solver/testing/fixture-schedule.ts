import type { Catalog, Panel } from "@/lib/catalog/schema";
import type { ScheduleDetector } from "@/lib/schedule/schema";
import type { LayoutBoard, LayoutDocument, LayoutInput } from "@/lib/layout/schema";
import { fixtureCatalog } from "@/lib/solver/testing/fixture-catalog";

// Small builders for tests.

export function det(id: string, catalogId: string, over: Partial<ScheduleDetector> = {}): ScheduleDetector {
  return { id, label: `Detector ${id}`, catalogId, area: "Ground", room: "Hall", cableM: 20, gauge: { awg: 22 }, supervision: "double-eol", ...over };
}

export function emptyLayout(panelId: string, over: Partial<LayoutDocument> = {}): LayoutDocument {
  return { panelId, boards: [], inputs: [], power: { standbyProfileId: "intruder-grade-2", safetyFactor: 1.2 }, busCableM: 50, ...over };
}

export function board(key: string, kind: LayoutBoard["kind"], catalogId: string, busAddress: number | null, over: Partial<LayoutBoard> = {}): LayoutBoard {
  return { key, kind, catalogId, busAddress, ...over };
}

export function inp(boardKey: string, input: number, detectorIds: string[], over: Partial<LayoutInput> = {}): LayoutInput {
  return { boardKey, input, detectorIds, scheme: detectorIds.length === 2 ? "shared" : "double-eol", placement: "at-detector", ...over };
}

/** The fixture catalog with one panel's figures changed. */
export function catalogWithPanel(id: string, over: Partial<Panel>): Catalog {
  return { ...fixtureCatalog, panels: fixtureCatalog.panels.map((p) => (p.id === id ? { ...p, ...over } : p)) };
}
