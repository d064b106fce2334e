import { describe, expect, it } from "vitest";
import type { ScheduleDetector } from "@/lib/schedule/schema";
import { bulkPatch, gaugeMm2, nextSort, scheduleRows } from "@/components/schedule/schedule-rows";

// The device schedule table: filtering, sorting (the site's area order, gauges by copper area), the bulk patch.

const words = { "double-eol": "double", "single-eol": "single", "shared-ok": "shared", none: "none" } as const;
const d = (id: string, over: Partial<ScheduleDetector>): ScheduleDetector => ({ id, label: id, catalogId: "door", area: "", room: "", cableM: 10, gauge: { awg: 22 }, supervision: "double-eol", ...over });
const schedule = [
  d("Door 2", { area: "Ground", room: "Hall", cableM: 30, gauge: { mm2: 0.5 } }),
  d("Door 10", { area: "Basement", room: "Plant", cableM: 5, gauge: { awg: 24 } }),
  d("Motion 1", { catalogId: "pir", area: "Attic", room: "Loft", cableM: 12, gauge: { awg: 18 } }),
  d("Spare", { catalogId: "gone", area: "", cableM: 1 }),
];
const types = new Map([
  ["door", "Door contact"],
  ["pir", "Motion sensor"],
]);
const areas = ["Basement", "Ground"];
const labels = (rows: ScheduleDetector[]) => rows.map((r) => r.label);
const rows = (query: Partial<Parameters<typeof scheduleRows>[1]>) => labels(scheduleRows(schedule, { filter: "", area: "", sort: null, ...query }, types, areas, words));

describe("schedule rows", () => {
  it("keeps schedule order when unsorted", () => {
    expect(rows({})).toEqual(["Door 2", "Door 10", "Motion 1", "Spare"]);
  });

  it("filters by text in label, room, area, catalog id or type name, and by area", () => {
    expect(rows({ filter: "motion" })).toEqual(["Motion 1"]);
    expect(rows({ filter: " PLANT " })).toEqual(["Door 10"]);
    expect(rows({ filter: "door contact" })).toEqual(["Door 2", "Door 10"]);
    expect(rows({ area: "Ground" })).toEqual(["Door 2"]);
  });

  it("sorts labels with numbers in numeric order, both ways", () => {
    expect(rows({ sort: { key: "label", dir: 1 } })).toEqual(["Door 2", "Door 10", "Motion 1", "Spare"]);
    expect(rows({ sort: { key: "label", dir: -1 } })).toEqual(["Spare", "Motion 1", "Door 10", "Door 2"]);
  });

  it("sorts areas in the site's order, others after them by name, no area last", () => {
    expect(rows({ sort: { key: "area", dir: 1 } })).toEqual(["Door 10", "Door 2", "Motion 1", "Spare"]);
  });

  it("sorts gauges by copper area", () => {
    // ASTM B258: 24 AWG ≈ 0.205 mm², 22 AWG ≈ 0.326 mm², 18 AWG ≈ 0.823 mm²
    expect(gaugeMm2({ gauge: { awg: 22 } })).toBeCloseTo(0.326, 3);
    expect(rows({ sort: { key: "gauge", dir: 1 } })).toEqual(["Door 10", "Spare", "Door 2", "Motion 1"]);
    expect(rows({ sort: { key: "cableM", dir: -1 } })).toEqual(["Door 2", "Motion 1", "Door 10", "Spare"]);
  });

  it("flips the direction when the same heading is chosen again", () => {
    expect(nextSort(null, "room")).toEqual({ key: "room", dir: 1 });
    expect(nextSort({ key: "room", dir: 1 }, "room")).toEqual({ key: "room", dir: -1 });
    expect(nextSort({ key: "room", dir: -1 }, "label")).toEqual({ key: "label", dir: 1 });
  });
});

describe("bulk patch", () => {
  const blank = { area: "", cableM: "", gauge: "", supervision: "" };
  it("sets only the fields filled in", () => {
    expect(bulkPatch({ ...blank, area: " Ground ", gauge: "0.5 mm2" })).toEqual({ patch: { area: "Ground", gauge: { mm2: 0.5 } } });
    expect(bulkPatch({ ...blank, cableM: "25", supervision: "none" })).toEqual({ patch: { cableM: 25, supervision: "none" } });
  });

  it("refuses an empty patch, a cable run out of range and an unreadable gauge", () => {
    expect(bulkPatch(blank)).toEqual({ error: "fill in at least one field to change" });
    expect(bulkPatch({ ...blank, cableM: "0" })).toEqual({ error: "the cable run must be more than 0 m and at most 2000 m" });
    expect(bulkPatch({ ...blank, cableM: "2001" })).toMatchObject({ error: expect.stringMatching(/^the cable run/) });
    expect(bulkPatch({ ...blank, gauge: "thick" })).toMatchObject({ error: expect.stringMatching(/^write a gauge/) });
  });

  it("takes the cable run in feet for an organisation on imperial units, and sends metres", () => {
    // NIST Handbook 44, Appendix C: 1 ft = 0.3048 m exactly
    expect(bulkPatch({ ...blank, cableM: "100" }, "imperial")).toEqual({ patch: { cableM: 30.48 } });
    // 2000 m / 0.3048 = 6561.68 ft (arithmetic): the limit is stated in feet
    expect(bulkPatch({ ...blank, cableM: "6600" }, "imperial")).toEqual({ error: "the cable run must be more than 0 ft and at most 6561.68 ft" });
  });
});
