import { placeKey } from "./structure-plan";

// Matching the area and room a schedule row names against the site's structure. Pure: used by the import on
// the server and by the detector form.

export interface KnownArea {
  name: string;
  rooms: { name: string }[];
}
/** An area (with room null) or a room of an area that the site does not have, with the rows naming it. */
export interface UnknownPlace {
  area: string;
  room: string | null;
  rows: number[];
}
export interface PlaceMatch {
  /** The row's names in the site's own spelling, where known. */
  area: string;
  room: string;
  unknown: { area: string; room: string | null } | null;
}

export function matchPlace(areas: readonly KnownArea[], area: string, room: string): PlaceMatch {
  if (area.trim() === "") return { area: "", room, unknown: null };
  const a = areas.find((x) => placeKey(x.name) === placeKey(area));
  if (!a) return { area, room, unknown: { area, room: room.trim() === "" ? null : room } };
  if (room.trim() === "") return { area: a.name, room: "", unknown: null };
  const r = a.rooms.find((x) => placeKey(x.name) === placeKey(room));
  return r ? { area: a.name, room: r.name, unknown: null } : { area: a.name, room, unknown: { area: a.name, room } };
}

/**
 * The unknown places of a set of rows, each once (letter case ignored), in the order first named. An unknown area is
 * listed once with its own entry, then once per unknown room in it.
 */
export function unknownPlaces(areas: readonly KnownArea[], rows: readonly { row: number; area: string; room: string }[]): UnknownPlace[] {
  const out = new Map<string, UnknownPlace>();
  const note = (area: string, room: string | null, row: number) => {
    const k = `${placeKey(area)}\u0000${room === null ? "" : placeKey(room)}`;
    const u = out.get(k) ?? { area, room, rows: [] };
    if (!u.rows.includes(row)) u.rows.push(row);
    out.set(k, u);
  };
  for (const r of rows) {
    const m = matchPlace(areas, r.area, r.room);
    if (!m.unknown) continue;
    if (!areas.some((a) => placeKey(a.name) === placeKey(m.unknown!.area))) note(m.unknown.area, null, r.row);
    if (m.unknown.room !== null) note(m.unknown.area, m.unknown.room, r.row);
  }
  return [...out.values()];
}

export function describePlace(u: { area: string; room: string | null }): string {
  return u.room === null ? `area ${u.area}` : `room ${u.room} in ${u.area}`;
}

export interface PlaceIssue {
  path: "area" | "room";
  message: string;
}

/**
 * A single detector's area and room checked against the site's structure: the names in the site's own spelling,
 * or what is wrong, keyed by the field. No area and no room is allowed (not placed yet); a room needs its area.
 */
export function checkPlace(areas: readonly KnownArea[], area: string, room: string): { ok: true; area: string; room: string } | { ok: false; issue: PlaceIssue } {
  if (area.trim() === "") {
    return room.trim() === "" ? { ok: true, area: "", room: "" } : { ok: false, issue: { path: "room", message: `Room: “${room}” needs its area; pick the area first.` } };
  }
  const m = matchPlace(areas, area, room);
  if (!m.unknown) return { ok: true, area: m.area, room: m.room };
  if (m.unknown.room === null || !areas.some((a) => placeKey(a.name) === placeKey(m.area)))
    return { ok: false, issue: { path: "area", message: `Area: “${area}” is not an area of this site. Pick one of the site's areas, or add it to the site's structure first.` } };
  return { ok: false, issue: { path: "room", message: `Room: “${room}” is not a room of ${m.area}. Pick one of its rooms, or add it to the site's structure first.` } };
}
