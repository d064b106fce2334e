import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { checkPlace, matchPlace, unknownPlaces } from "@/lib/sites/places";

const areas = [
  { name: "Ground floor", rooms: [{ name: "Entrance lobby" }, { name: "Office" }] },
  { name: "Basement", rooms: [{ name: "Plant room" }] },
];

describe("places named by schedule rows", () => {
  it("matches names in any letter case and gives the site's own spelling", () => {
    expect(matchPlace(areas, "ground FLOOR", "office")).toEqual({ area: "Ground floor", room: "Office", unknown: null });
    expect(matchPlace(areas, "", "Anything")).toEqual({ area: "", room: "Anything", unknown: null });
  });

  it("lists each unknown area and room once, with every row naming it", () => {
    const rows = [
      { row: 2, area: "Ground floor", room: "Ofice" },
      { row: 3, area: "Roof", room: "Plant deck" },
      { row: 4, area: "ground floor", room: "ofice" },
      { row: 5, area: "Basement", room: "Plant room" },
      { row: 6, area: "Roof", room: "" },
    ];
    expect(unknownPlaces(areas, rows)).toEqual([
      { area: "Ground floor", room: "Ofice", rows: [2, 4] },
      { area: "Roof", room: null, rows: [3, 6] },
      { area: "Roof", room: "Plant deck", rows: [3] },
    ]);
  });
});

describe("one detector's place checked against the structure", () => {
  it("accepts a known area and room in any letter case, in the site's spelling, and no place at all", () => {
    expect(checkPlace(areas, "BASEMENT", "plant ROOM")).toEqual({ ok: true, area: "Basement", room: "Plant room" });
    expect(checkPlace(areas, "Basement", "")).toEqual({ ok: true, area: "Basement", room: "" });
    expect(checkPlace(areas, "", "")).toEqual({ ok: true, area: "", room: "" });
  });

  it("refuses an unknown area, a room of another area, and a room without its area, naming the field", () => {
    expect(checkPlace(areas, "Roof", "")).toMatchObject({ ok: false, issue: { path: "area", message: expect.stringContaining("“Roof” is not an area of this site") } });
    expect(checkPlace(areas, "Roof", "Office")).toMatchObject({ ok: false, issue: { path: "area" } });
    expect(checkPlace(areas, "Basement", "Office")).toMatchObject({ ok: false, issue: { path: "room", message: expect.stringContaining("“Office” is not a room of Basement") } });
    expect(checkPlace(areas, "", "Office")).toMatchObject({ ok: false, issue: { path: "room", message: expect.stringContaining("needs its area") } });
  });

  it("accepts exactly the places the structure holds, for any names", () => {
    // names of the structure (areas and rooms mixed up) in any letter case and padding, and other names
    const known = fc.tuple(fc.constantFrom("Ground floor", "Basement", "Office", "Plant room", "Entrance lobby"), fc.boolean(), fc.boolean()).map(([n, upper, pad]) => `${pad ? " " : ""}${upper ? n.toUpperCase() : n}`);
    const name = fc.oneof(known, fc.string({ minLength: 1, maxLength: 8 }).filter((s) => s.trim() !== ""));
    fc.assert(
      fc.property(name, name, (area, room) => {
        const inStructure = areas.some((a) => a.name.toLowerCase() === area.trim().toLowerCase() && a.rooms.some((r) => r.name.toLowerCase() === room.trim().toLowerCase()));
        expect(checkPlace(areas, area, room).ok).toBe(inStructure);
      }),
    );
  });
});
