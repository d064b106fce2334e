import type { FloorNode } from "./site-schema";

// The structure editor's document: floors, areas and rooms, each with a key for React and the id it has in the
// database (none when new). Every operation returns a new tree. Pure.

export interface EditRoom {
  key: string;
  id?: number;
  name: string;
}
export interface EditArea extends EditRoom {
  rooms: EditRoom[];
}
export interface EditFloor extends EditRoom {
  areas: EditArea[];
}
export type EditTree = EditFloor[];
export type NodeKind = "floor" | "area" | "room";

export type MakeKey = () => string;
export const randomKey: MakeKey = () => `k${Math.random().toString(36).slice(2)}${Date.now().toString(36)}`;

export function treeFromSite(floors: { id: number; name: string; areas: { id: number; name: string; rooms: { id: number; name: string }[] }[] }[]): EditTree {
  return floors.map((f) => ({
    key: `f${f.id}`,
    id: f.id,
    name: f.name,
    areas: f.areas.map((a) => ({ key: `a${a.id}`, id: a.id, name: a.name, rooms: a.rooms.map((r) => ({ key: `r${r.id}`, id: r.id, name: r.name })) })),
  }));
}

export function treeToRequest(tree: EditTree): FloorNode[] {
  const id = (n: { id?: number }) => (n.id === undefined ? {} : { id: n.id });
  return tree.map((f) => ({ ...id(f), name: f.name, areas: f.areas.map((a) => ({ ...id(a), name: a.name, rooms: a.rooms.map((r) => ({ ...id(r), name: r.name })) })) }));
}

/** Apply `fn` to the list that holds `key` (the floors, one floor's areas or one area's rooms). */
function inListOf(tree: EditTree, key: string, fn: <T extends EditRoom>(list: T[], index: number) => T[]): EditTree {
  const fi = tree.findIndex((f) => f.key === key);
  if (fi >= 0) return fn(tree, fi);
  return tree.map((f) => {
    const ai = f.areas.findIndex((a) => a.key === key);
    if (ai >= 0) return { ...f, areas: fn(f.areas, ai) };
    return { ...f, areas: f.areas.map((a) => {
      const ri = a.rooms.findIndex((r) => r.key === key);
      return ri >= 0 ? { ...a, rooms: fn(a.rooms, ri) } : a;
    }) };
  });
}

export const renameNode = (tree: EditTree, key: string, name: string): EditTree => inListOf(tree, key, (list, i) => list.map((n, j) => (j === i ? { ...n, name } : n)));

export const removeNode = (tree: EditTree, key: string): EditTree => inListOf(tree, key, (list, i) => list.filter((_, j) => j !== i));

/** Move a node one place up (-1) or down (+1) in its list; at either end nothing changes. */
export const moveNode = (tree: EditTree, key: string, by: -1 | 1): EditTree =>
  inListOf(tree, key, (list, i) => {
    const j = i + by;
    if (j < 0 || j >= list.length) return list;
    const out = [...list];
    [out[i], out[j]] = [out[j], out[i]];
    return out;
  });

export const addFloor = (tree: EditTree, name: string, key: MakeKey = randomKey): EditTree => [...tree, { key: key(), name, areas: [] }];

export const addArea = (tree: EditTree, floorKey: string, name: string, key: MakeKey = randomKey): EditTree =>
  tree.map((f) => (f.key === floorKey ? { ...f, areas: [...f.areas, { key: key(), name, rooms: [] }] } : f));

export const addRoomTo = (tree: EditTree, areaKey: string, name: string, key: MakeKey = randomKey): EditTree =>
  tree.map((f) => ({ ...f, areas: f.areas.map((a) => (a.key === areaKey ? { ...a, rooms: [...a.rooms, { key: key(), name }] } : a)) }));

/** The node an issue path points at ([0, "areas", 1, "name"] or "floors.0.areas.1.name"), for errors beside the field. */
export function keyAtPath(tree: EditTree, path: readonly (string | number | symbol)[] | string): string | null {
  const parts = (typeof path === "string" ? path.split(".") : path.map(String)).filter((p) => p !== "floors");
  const [fi, areas, ai, rooms, ri] = parts;
  const floor = tree[Number(fi)];
  if (!floor) return null;
  if (areas !== "areas") return floor.key;
  const area = floor.areas[Number(ai)];
  if (!area) return floor.key;
  if (rooms !== "rooms") return area.key;
  return area.rooms[Number(ri)]?.key ?? area.key;
}
