import { describe, expect, it } from "vitest";
import { matchPlace, unknownPlaces } from "@/lib/sites/places";

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
