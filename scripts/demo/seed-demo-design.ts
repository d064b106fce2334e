import type { Transaction } from "sequelize";
import { AuditEntry, Layout, LayoutRevision, ScheduleDetectorRecord } from "@/models";
import type { Catalog } from "@/lib/catalog/schema";
import type { LayoutDocument } from "@/lib/layout/schema";
import { summarizeSolve } from "@/lib/layout/layout-summary";
import type { Schedule, ScheduleRow, SupervisionPreference } from "@/lib/schedule/schema";
import { solveLayout, suggestHardware } from "@/lib/solver";

// The demo library's device schedule and two layouts, so the editor is explorable at once. Invented, like the rest of the demo.

type Row = [label: string, catalogId: string, area: string, room: string, cableM: number, supervision: SupervisionPreference];

const B = "Basement";
const G = "Ground floor";
const F = "First floor";

const rows: Row[] = [
  ["Archive door", "contact-door-surface", B, "Archive", 38, "double-eol"],
  ["Archive motion", "motion-ceiling", B, "Archive", 42, "double-eol"],
  ["Archive flood probe, north", "water-probe-no", B, "Archive", 45, "single-eol"],
  ["Archive flood sensor, south", "water-sensor-nc", B, "Archive", 51, "single-eol"],
  ["Archive smoke 1", "smoke-4wire-no", B, "Archive", 40, "double-eol"],
  ["Archive smoke 2", "smoke-4wire-no", B, "Archive", 47, "double-eol"],
  ["Plant room door", "contact-door-surface", B, "Plant room", 30, "double-eol"],
  ["Plant room smoke", "smoke-4wire-no", B, "Plant room", 33, "double-eol"],
  ["Plant room flood probe", "water-probe-no", B, "Plant room", 35, "single-eol"],
  ["Stair B door", "contact-door-recessed", B, "Stair B", 26, "shared-ok"],
  ["Stair B motion", "motion-wall", B, "Stair B", 27, "shared-ok"],
  ["Main entrance doors", "contact-door-surface", G, "Entrance lobby", 14, "double-eol"],
  ["Entrance lobby motion", "motion-dual", G, "Entrance lobby", 15, "double-eol"],
  ["Entrance lobby glass-break", "glass-break-acoustic", G, "Entrance lobby", 16, "double-eol"],
  ["Issue desk panic, left", "panic-button-nc", G, "Issue desk", 9, "double-eol"],
  ["Issue desk panic, right", "panic-button-nc", G, "Issue desk", 10, "double-eol"],
  ["Issue desk motion", "motion-wall", G, "Issue desk", 11, "double-eol"],
  ["Lending hall motion, east", "motion-ceiling", G, "Lending hall", 24, "double-eol"],
  ["Lending hall motion, west", "motion-ceiling", G, "Lending hall", 31, "double-eol"],
  ["Lending hall glass-break, east", "glass-break-acoustic", G, "Lending hall", 25, "double-eol"],
  ["Lending hall glass-break, west", "glass-break-acoustic", G, "Lending hall", 32, "double-eol"],
  ["Lending hall window 1", "contact-window-surface", G, "Lending hall", 22, "shared-ok"],
  ["Lending hall window 2", "contact-window-surface", G, "Lending hall", 23, "shared-ok"],
  ["Lending hall window 3", "contact-window-surface", G, "Lending hall", 29, "shared-ok"],
  ["Lending hall window 4", "contact-window-surface", G, "Lending hall", 30, "shared-ok"],
  ["Lending hall fire exit door", "contact-door-surface", G, "Lending hall", 34, "double-eol"],
  ["Children's corner motion", "motion-wall", G, "Children's corner", 28, "double-eol"],
  ["Children's corner window 1", "contact-window-recessed", G, "Children's corner", 27, "shared-ok"],
  ["Children's corner window 2", "contact-window-recessed", G, "Children's corner", 28, "shared-ok"],
  ["Staff kitchen heat", "heat-fixed-no", G, "Staff kitchen", 19, "double-eol"],
  ["Staff kitchen door", "contact-door-recessed", G, "Staff kitchen", 18, "shared-ok"],
  ["Reading room motion", "motion-ceiling", F, "Reading room", 36, "double-eol"],
  ["Reading room window 1", "contact-window-surface", F, "Reading room", 35, "shared-ok"],
  ["Reading room window 2", "contact-window-surface", F, "Reading room", 37, "shared-ok"],
  ["Reading room glass-break", "glass-break-acoustic", F, "Reading room", 36, "double-eol"],
  ["Study rooms motion", "motion-wall", F, "Study rooms", 41, "double-eol"],
  ["Study room window 1", "contact-window-recessed", F, "Study rooms", 40, "shared-ok"],
  ["Study room window 2", "contact-window-recessed", F, "Study rooms", 43, "shared-ok"],
  ["Office door", "contact-door-recessed", F, "Office", 39, "shared-ok"],
  ["Office motion", "motion-wall", F, "Office", 40, "shared-ok"],
  ["Store door", "contact-door-recessed", F, "Store", 44, "double-eol"],
  // wireless: learnt by a receiver, no loop; the schedule still asks for a cable run, so 1 m stands for none
  ["Store wireless motion", "wireless-motion", F, "Store", 1, "double-eol"],
  ["Study rooms wireless door", "wireless-door", F, "Study rooms", 1, "double-eol"],
];

export const demoScheduleRows: ScheduleRow[] = rows.map(([label, catalogId, area, room, cableM, supervision]) => ({ label, catalogId, area, room, cableM, gauge: { awg: 22 }, supervision }));

/** The demo schedule, and two layouts suggested from it: one detector per input, and with shared inputs; both learn the two wireless detectors on a receiver. */
export async function seedDemoDesign(transaction: Transaction, ids: { organisationId: number; siteId: number; userId: number }, catalog: Catalog): Promise<void> {
  const recs = await ScheduleDetectorRecord.bulkCreate(
    demoScheduleRows.map((r, position) => ({ siteId: ids.siteId, position, label: r.label, catalogId: r.catalogId, area: r.area, room: r.room, cableM: r.cableM, gaugeAwg: 22, gaugeMm2: null, supervision: r.supervision })),
    { transaction },
  );
  const schedule: Schedule = recs.map((r, i) => ({ id: String(r.id), ...demoScheduleRows[i] }));
  // The cheapest hardware overall has no input type that takes two detectors, so the shared example is suggested from the large family.
  const options: { name: string; allowShared: boolean; catalog: Catalog }[] = [
    { name: "One detector per input", allowShared: false, catalog },
    { name: "Large panel with shared inputs", allowShared: true, catalog: { ...catalog, panels: catalog.panels.filter((p) => p.family === "large") } },
  ];
  for (const o of options) {
    const s = suggestHardware(schedule, o.catalog, { allowShared: o.allowShared, busCableM: 120 });
    if (!s.found) throw new Error(`demo data: no suggestion for "${o.name}": ${s.reason}`);
    await storeLayout(transaction, ids, o.name, o.allowShared ? withZonesAndSounders(s.layout, schedule) : { ...s.layout, grade: 2 }, schedule, catalog);
  }
}

const BACK_OF_HOUSE = new Set([B, "Staff kitchen", "Office", "Store"]);

/**
 * The shared-input demo layout with the rest of a panel's programming filled in, so a newcomer sees it at once:
 * two areas set from the keypads, zone types (hold-up buttons, fire detectors, the entrance as entry/exit with its
 * lobby on the entry route, the wireless detectors learnt by a receiver), and two outdoor sounders (one with its own battery), an indoor sounder and a strobe on
 * the panel's outputs.
 */
export function withZonesAndSounders(doc: LayoutDocument, schedule: Schedule): LayoutDocument {
  const placed = new Set([...doc.inputs.flatMap((i) => i.detectorIds), ...(doc.wireless ?? []).flatMap((w) => w.detectorIds)]);
  const keypads = doc.boards.filter((b) => b.kind === "keypad").map((b) => b.key);
  const zones = schedule
    .filter((d) => placed.has(d.id))
    .map((d) => {
      const areaKey = BACK_OF_HOUSE.has(d.area) || BACK_OF_HOUSE.has(d.room) ? "back" : "public";
      if (d.catalogId.startsWith("panic")) return { detectorId: d.id, type: "hold-up" as const, areaKey };
      if (d.catalogId.startsWith("smoke") || d.catalogId.startsWith("heat")) return { detectorId: d.id, type: "fire" as const, areaKey };
      if (d.catalogId.startsWith("water")) return { detectorId: d.id, type: "technical" as const, areaKey };
      if (d.label === "Main entrance doors") return { detectorId: d.id, type: "entry-exit" as const, areaKey, entryS: 30, exitS: 45, keypadLabel: "Main entrance" };
      if (d.label === "Entrance lobby motion") return { detectorId: d.id, type: "instant" as const, areaKey, entryRoute: true };
      return { detectorId: d.id, type: "instant" as const, areaKey, ...(d.room === "Reading room" ? { partSet: true } : {}) };
    });
  const cable = (m: number) => ({ cableM: m, gauge: { awg: 22 } });
  return {
    ...doc,
    grade: 2,
    areas: [
      { key: "public", name: "Public floors", keypadKeys: keypads.slice(0, 1) },
      { key: "back", name: "Basement and staff rooms", keypadKeys: keypads.slice(1) },
    ],
    zones,
    outputDevices: [
      { id: "sounder-front", kind: "sounder", catalogId: "sounder-outdoor-battery", label: "Front wall sounder", ...cable(15) },
      { id: "sounder-rear", kind: "sounder", catalogId: "sounder-outdoor", label: "Rear wall sounder", ...cable(25) },
      { id: "sounder-hall", kind: "sounder", catalogId: "sounder-indoor", label: "Lending hall sounder", ...cable(20) },
      { id: "strobe-front", kind: "strobe", catalogId: "strobe-amber", label: "Front wall strobe", ...cable(15) },
    ],
    outputs: [
      { boardKey: "panel", output: 1, deviceIds: ["sounder-front", "sounder-rear"] },
      { boardKey: "panel", output: 2, deviceIds: ["sounder-hall"] },
      { boardKey: "panel", output: 3, deviceIds: ["strobe-front"] },
    ],
  };
}

async function storeLayout(transaction: Transaction, ids: { organisationId: number; siteId: number; userId: number }, name: string, document: LayoutDocument, schedule: Schedule, catalog: Catalog) {
  const summary = summarizeSolve(document, solveLayout(document, schedule, catalog));
  const layout = await Layout.create({ siteId: ids.siteId, name, currentRevision: 1, version: 1, createdBy: ids.userId }, { transaction });
  await LayoutRevision.create({ layoutId: layout.id, revision: 1, document, summary, note: "Suggested hardware (demo data)", createdBy: ids.userId }, { transaction });
  await AuditEntry.create({ organisationId: ids.organisationId, userId: ids.userId, action: "layout.create", entityType: "layout", entityId: String(layout.id), detail: { siteId: ids.siteId, name, from: "demo" } }, { transaction });
}
