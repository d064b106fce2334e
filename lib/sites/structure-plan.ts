import type { FloorNode } from "./site-schema";

// What saving a new structure over the old one means for the device schedule: which rooms and areas go, which
// detectors still name them (a refusal), and which detectors follow a renamed or moved room. Pure.

export interface StructureNow {
  id: number;
  name: string;
  areas: { id: number; name: string; rooms: { id: number; name: string }[] }[];
}
export interface PlacedDetector {
  id: number;
  area: string;
  room: string;
}
export interface StructurePlan {
  /** Ids in the request that are not this site's floors, areas or rooms, or are used twice. */
  badIds: { path: string; message: string }[];
  /** Removed places still named by detectors. */
  inUse: { area: string; room: string | null; detectors: number }[];
  /** Detectors whose area or room name changes with a rename or a move. */
  moves: { id: number; area: string; room: string }[];
  removed: { floors: number[]; areas: number[]; rooms: number[] };
}

export const placeKey = (s: string) => s.trim().toLowerCase();

export function planStructure(now: StructureNow[], next: FloorNode[], detectors: PlacedDetector[]): StructurePlan {
  const badIds: StructurePlan["badIds"] = [];
  const floorIds = new Set(now.map((f) => f.id));
  const areaById = new Map(now.flatMap((f) => f.areas).map((a) => [a.id, a]));
  const roomOwner = new Map(now.flatMap((f) => f.areas.flatMap((a) => a.rooms.map((r) => [r.id, { area: a, room: r }] as const))));
  const seen = { floor: new Set<number>(), area: new Set<number>(), room: new Set<number>() };
  // where each kept area and room ends up, by id
  const newArea = new Map<number, string>();
  const newRoom = new Map<number, { area: string; room: string }>();
  const use = (kind: "floor" | "area" | "room", id: number | undefined, path: string, known: boolean) => {
    if (id === undefined) return false;
    if (!known) badIds.push({ path, message: `${kind} ${id} is not part of this site` });
    else if (seen[kind].has(id)) badIds.push({ path, message: `${kind} ${id} appears twice` });
    else {
      seen[kind].add(id);
      return true;
    }
    return false;
  };
  next.forEach((f, i) => {
    use("floor", f.id, `floors.${i}.id`, f.id !== undefined && floorIds.has(f.id));
    f.areas.forEach((a, j) => {
      if (use("area", a.id, `floors.${i}.areas.${j}.id`, a.id !== undefined && areaById.has(a.id))) newArea.set(a.id!, a.name);
      a.rooms.forEach((r, k) => {
        if (use("room", r.id, `floors.${i}.areas.${j}.rooms.${k}.id`, r.id !== undefined && roomOwner.has(r.id))) newRoom.set(r.id!, { area: a.name, room: r.name });
      });
    });
  });

  const removed = {
    floors: [...floorIds].filter((id) => !seen.floor.has(id)),
    areas: [...areaById.keys()].filter((id) => !seen.area.has(id)),
    rooms: [...roomOwner.keys()].filter((id) => !seen.room.has(id)),
  };
  const inUseCount = new Map<string, { area: string; room: string | null; detectors: number }>();
  const moves: StructurePlan["moves"] = [];
  const areasByName = new Map([...areaById.values()].map((a) => [placeKey(a.name), a]));
  for (const d of detectors) {
    const area = areasByName.get(placeKey(d.area));
    if (!area) continue; // a name the structure never had: left as it is
    const room = d.room.trim() === "" ? undefined : area.rooms.find((r) => placeKey(r.name) === placeKey(d.room));
    const areaGone = !newArea.has(area.id);
    const roomGone = !!room && !newRoom.has(room.id);
    if (areaGone || roomGone) {
      // a room moved out of a removed area is not lost: the detector follows it
      if (room && newRoom.has(room.id)) {
        const to = newRoom.get(room.id)!;
        moves.push({ id: d.id, area: to.area, room: to.room });
        continue;
      }
      const k = `${area.id}/${roomGone ? room!.id : ""}`;
      const entry = inUseCount.get(k) ?? { area: area.name, room: roomGone ? room!.name : null, detectors: 0 };
      entry.detectors += 1;
      inUseCount.set(k, entry);
      continue;
    }
    const to = room ? newRoom.get(room.id)! : { area: newArea.get(area.id)!, room: d.room };
    // letter case alone is no change: names match whatever their case
    if (placeKey(to.area) !== placeKey(d.area) || placeKey(to.room) !== placeKey(d.room)) moves.push({ id: d.id, area: to.area, room: to.room });
  }
  return { badIds, inUse: [...inUseCount.values()], moves, removed };
}

/** The refusal sentence for places still in use. */
export function inUseMessage(inUse: StructurePlan["inUse"]): string {
  const parts = inUse.map((u) => `${u.room ? `room ${u.room} in ${u.area}` : `area ${u.area}`} is used by ${u.detectors} detector${u.detectors === 1 ? "" : "s"}`);
  return `Cannot remove: ${parts.join("; ")}. Move those detectors to another room in the device schedule first. Nothing was changed.`;
}
