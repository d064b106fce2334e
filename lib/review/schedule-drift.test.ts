import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { differenceText, scheduleDrift } from "@/lib/review/schedule-drift";
import type { ScheduleDetector } from "@/lib/schedule/schema";

const detector = (id: string, over: Partial<ScheduleDetector> = {}): ScheduleDetector => ({ id, label: `Door ${id}`, catalogId: "contact-door-surface", area: "Ground", room: "Hall", cableM: 12, gauge: { awg: 22 }, supervision: "single-eol", ...over });

describe("how the live schedule differs from the approved copy", () => {
  it("finds nothing when nothing changed", () => {
    const s = [detector("1"), detector("2")];
    expect(scheduleDrift(s, structuredClone(s))).toEqual({ differences: [], headline: null });
  });
  it("names changed, deleted and added detectors, and counts them", () => {
    const frozen = [detector("1"), detector("2"), detector("3")];
    const live = [detector("1", { cableM: 1999 }), detector("2", { catalogId: "motion-wall", gauge: { mm2: 0.5 } }), detector("4")];
    const d = scheduleDrift(frozen, live, new Set(["1", "3"]));
    expect(d.headline).toBe("The schedule has changed since approval: 4 detectors differ.");
    expect(d.differences.map(differenceText)).toEqual([
      "Door 1: cable run 12 m → 1999 m.",
      "Door 2: detector type contact-door-surface → motion-wall, cable gauge 22 AWG → 0.5 mm2.",
      "Door 3: deleted from the schedule (it is on the approved layout).",
      "Door 4: added to the schedule, not on the approved layout.",
    ]);
    expect(scheduleDrift([detector("1")], [detector("1", { room: "Store" })]).headline).toBe("The schedule has changed since approval: 1 detector differs.");
  });
  it("counts exactly the ids only on one side plus the ids whose rows differ, for any two schedules", () => {
    const row = fc.record({ id: fc.constantFrom("1", "2", "3", "4", "5"), cableM: fc.constantFrom(5, 12, 30), room: fc.constantFrom("Hall", "Store") });
    const schedule = fc.uniqueArray(row, { selector: (r) => r.id, maxLength: 5 }).map((rows) => rows.map((r) => detector(r.id, r)));
    fc.assert(
      fc.property(schedule, schedule, (frozen, live) => {
        const a = new Map(frozen.map((d) => [d.id, d]));
        const b = new Map(live.map((d) => [d.id, d]));
        const ids = new Set([...a.keys(), ...b.keys()]);
        const expected = [...ids].filter((id) => !a.has(id) || !b.has(id) || JSON.stringify(a.get(id)) !== JSON.stringify(b.get(id))).length;
        const d = scheduleDrift(frozen, live);
        expect(d.differences).toHaveLength(expected);
        expect(d.headline === null).toBe(expected === 0);
      }),
      { numRuns: 300 },
    );
  });
});
