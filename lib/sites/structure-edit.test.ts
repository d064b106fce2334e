import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { addArea, addFloor, addRoomTo, keyAtPath, moveNode, removeNode, renameNode, treeFromSite, treeToRequest } from "@/lib/sites/structure-edit";
import { placeIssues } from "@/lib/sites/form-errors";
import { floorsSchema } from "@/lib/sites/site-schema";

const site = [
  { id: 1, name: "Ground", areas: [{ id: 10, name: "Front", rooms: [{ id: 100, name: "Hall" }, { id: 101, name: "Office" }] }] },
  { id: 2, name: "First", areas: [] },
];

describe("structure editor operations", () => {
  it("adds, renames, moves and removes floors, areas and rooms, keeping ids of what stays", () => {
    let keys = 0;
    const key = () => `new${++keys}`;
    let t = treeFromSite(site);
    t = addArea(t, "f2", "Landing", key);
    t = addRoomTo(t, "new1", "Store", key);
    t = addFloor(t, "Roof", key);
    t = moveNode(t, "r101", -1);
    t = renameNode(t, "a10", "Front of house");
    t = removeNode(t, "r100");
    t = moveNode(t, "new3", -1);
    expect(treeToRequest(t)).toEqual([
      { id: 1, name: "Ground", areas: [{ id: 10, name: "Front of house", rooms: [{ id: 101, name: "Office" }] }] },
      { name: "Roof", areas: [] },
      { id: 2, name: "First", areas: [{ name: "Landing", rooms: [{ name: "Store" }] }] },
    ]);
  });

  it("moving past either end changes nothing", () => {
    const t = treeFromSite(site);
    expect(moveNode(t, "f1", -1)).toEqual(t);
    expect(moveNode(t, "r101", 1)).toEqual(t);
  });

  it("any sequence of moves keeps the same nodes", () => {
    fc.assert(
      fc.property(fc.array(fc.tuple(fc.constantFrom("f1", "f2", "a10", "r100", "r101"), fc.constantFrom(-1 as const, 1 as const)), { maxLength: 20 }), (moves) => {
        const t = moves.reduce((acc, [k, by]) => moveNode(acc, k, by), treeFromSite(site));
        const ids = (x: ReturnType<typeof treeFromSite>) => x.flatMap((f) => [f.id, ...f.areas.flatMap((a) => [a.id, ...a.rooms.map((r) => r.id)])]).sort();
        expect(ids(t)).toEqual(ids(treeFromSite(site)));
      }),
    );
  });

  it("puts a schema error beside the room it is about", () => {
    const t = addRoomTo(treeFromSite(site), "a10", "hall", () => "dup");
    const r = floorsSchema.safeParse(treeToRequest(t));
    expect(r.success).toBe(false);
    const placed = placeIssues(r.success ? [] : r.error.issues.map((i) => ({ ...i, path: ["floors", ...i.path] })), t);
    expect(placed.nodes).toEqual({ dup: "Front already has a room called hall" });
    expect(keyAtPath(t, "floors.0.areas.0.name")).toBe("a10");
  });
});
