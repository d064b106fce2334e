import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { planStructure, type StructureNow } from "@/lib/sites/structure-plan";
import { treeFromSite, treeToRequest } from "@/lib/sites/structure-edit";

const now: StructureNow[] = [
  { id: 1, name: "Ground floor", areas: [{ id: 10, name: "Offices", rooms: [{ id: 100, name: "Reception" }, { id: 101, name: "Kitchen" }] }] },
  { id: 2, name: "First floor", areas: [{ id: 20, name: "Stores", rooms: [{ id: 200, name: "Stock room" }] }] },
];
const detectors = [
  { id: 1, area: "Offices", room: "Reception" },
  { id: 2, area: "offices", room: "KITCHEN" },
  { id: 3, area: "Offices", room: "Kitchen" },
  { id: 4, area: "Stores", room: "" },
  { id: 5, area: "Yard", room: "Gate" },
];

describe("planStructure", () => {
  it("changes nothing when the structure is saved as it is", () => {
    const p = planStructure(now, treeToRequest(treeFromSite(now)), detectors);
    expect(p).toEqual({ badIds: [], inUse: [], moves: [], removed: { floors: [], areas: [], rooms: [] } });
  });

  it("refuses removing a room detectors use, counting them (letter case ignored)", () => {
    const next = treeToRequest(treeFromSite(now));
    next[0].areas[0].rooms = next[0].areas[0].rooms.filter((r) => r.name !== "Kitchen");
    const p = planStructure(now, next, detectors);
    expect(p.inUse).toEqual([{ area: "Offices", room: "Kitchen", detectors: 2 }]);
    expect(p.removed.rooms).toEqual([101]);
  });

  it("refuses removing an area a detector names without a room, and lets an unused room go", () => {
    const next = treeToRequest(treeFromSite(now)).slice(0, 1);
    expect(planStructure(now, next, detectors).inUse).toEqual([{ area: "Stores", room: null, detectors: 1 }]);
    const onlyReceptionUsed = planStructure(now, [{ ...next[0], areas: [{ ...next[0].areas[0], rooms: next[0].areas[0].rooms.slice(0, 1) }] }, treeToRequest(treeFromSite(now))[1]], [detectors[0]]);
    expect(onlyReceptionUsed.inUse).toEqual([]);
    expect(onlyReceptionUsed.removed.rooms).toEqual([101]);
  });

  it("carries detectors along a renamed area, a renamed room and a room moved to another area", () => {
    const next = treeToRequest(treeFromSite(now));
    next[0].areas[0].name = "Front office";
    next[0].areas[0].rooms[0].name = "Lobby";
    const kitchen = next[0].areas[0].rooms.splice(1, 1)[0];
    next[1].areas[0].rooms.push(kitchen);
    const p = planStructure(now, next, detectors);
    expect(p.inUse).toEqual([]);
    expect(p.moves).toEqual([
      { id: 1, area: "Front office", room: "Lobby" },
      { id: 2, area: "Stores", room: "Kitchen" },
      { id: 3, area: "Stores", room: "Kitchen" },
    ]);
  });

  it("refuses ids that are not the site's or appear twice", () => {
    const next = treeToRequest(treeFromSite(now));
    next[1].id = 1;
    next[0].areas[0].rooms[0].id = 999;
    const p = planStructure(now, next, detectors);
    expect(p.badIds.map((b) => b.path)).toEqual(["floors.0.areas.0.rooms.0.id", "floors.1.id"]);
  });

  it("counts exactly the detectors naming a removed room, and moves every other detector of a renamed area to a place that stays", () => {
    const rooms = now.flatMap((f) => f.areas.flatMap((a) => a.rooms.map((r) => ({ area: a.name, ...r }))));
    fc.assert(
      fc.property(
        fc.subarray(rooms.map((r) => r.id)),
        fc.array(fc.record({ area: fc.constantFrom("Offices", "Stores", "Yard"), room: fc.constantFrom("", "Reception", "Kitchen", "Stock room") }), { maxLength: 8 }),
        fc.constantFrom("", " (old)"),
        (keep, placed, suffix) => {
          const ds = placed.map((d, i) => ({ id: i + 1, ...d }));
          const next = treeToRequest(treeFromSite(now)).map((f) => ({ ...f, areas: f.areas.map((a) => ({ ...a, name: `${a.name}${suffix}`, rooms: a.rooms.filter((r) => keep.includes(r.id!)) })) }));
          const p = planStructure(now, next, ds);
          const removedNamed = ds.filter((d) => rooms.some((r) => r.area === d.area && r.name === d.room && !keep.includes(r.id)));
          expect(p.inUse.reduce((n, u) => n + u.detectors, 0)).toBe(removedNamed.length);
          if (removedNamed.length === 0 && suffix) {
            // every detector of a known area follows the rename, keeping its room name; unknown areas are left alone
            expect(p.moves.map((m) => m.id).sort()).toEqual(ds.filter((d) => d.area !== "Yard").map((d) => d.id));
            for (const m of p.moves) expect(m).toEqual({ id: m.id, area: `${ds[m.id - 1].area}${suffix}`, room: ds[m.id - 1].room });
          }
          if (!suffix) expect(p.moves).toEqual([]);
        },
      ),
      { numRuns: 300 },
    );
  });
});
