"use client";

import { useState } from "react";
import type { SiteDetail } from "@/lib/server/sites";
import { addRoomSchema } from "@/lib/sites/site-schema";
import { describeError, sendJson } from "@/lib/client/fetcher";
import { Button } from "@/components/ui/button";
import { siteAreasOf, type SiteArea } from "@/components/schedule/schedule-labels";
import { useSiteAreas } from "@/components/schedule/site-areas-context";

const ADD = "\u0000add";
const field = "mt-1 block w-full rounded-md border border-line bg-white px-2 py-1.5 text-sm";

/** A detector's area and room, chosen from the site's lists, with "add a new room" to the chosen area. */
export function PlacePicker({ formId, fallbackAreas, initialArea, initialRoom }: { formId: string; fallbackAreas: SiteArea[]; initialArea: string; initialRoom: string }) {
  const ctx = useSiteAreas();
  const areas = ctx?.areas ?? fallbackAreas;
  const [area, setArea] = useState(initialArea);
  const [room, setRoom] = useState(initialRoom);
  const [adding, setAdding] = useState(false);
  const [newRoom, setNewRoom] = useState("");
  const [error, setError] = useState<string | null>(null);
  const current = areas.find((a) => a.name === area);
  // a name only the schedule uses (from before the structure was edited) stays selectable
  const areaNames = areas.map((a) => a.name);
  const rooms = current?.rooms ?? [];
  const floors = [...new Set(areas.map((a) => a.floor ?? ""))];

  async function add() {
    setError(null);
    const parsed = addRoomSchema.safeParse({ areaId: current?.id, name: newRoom });
    if (!parsed.success || !ctx) return setError(parsed.success ? "This page cannot add rooms." : parsed.error.issues[0].message);
    try {
      const site = await sendJson<SiteDetail>(`/api/sites/${ctx.siteId}/rooms`, "POST", parsed.data);
      ctx.setAreas(siteAreasOf(site));
      setRoom(parsed.data.name);
      setAdding(false);
      setNewRoom("");
    } catch (e) {
      setError(describeError(e));
    }
  }

  return (
    <>
      <label className="text-sm">
        <span className="font-medium">Area</span>
        <select name="area" value={area} onChange={(e) => (setArea(e.target.value), setRoom(""), setAdding(false))} className={field} data-testid={`${formId}-area`}>
          <option value="">(no area)</option>
          {area && !areaNames.includes(area) ? <option value={area}>{area} (not in the site&apos;s structure)</option> : null}
          {floors.map((f) => (
            <optgroup key={f} label={f || "Areas"}>
              {areas
                .filter((a) => (a.floor ?? "") === f)
                .map((a) => (
                  <option key={a.name} value={a.name}>
                    {a.name}
                  </option>
                ))}
            </optgroup>
          ))}
        </select>
      </label>
      <div className="text-sm">
        <label>
          <span className="font-medium">Room</span>
          <select name="room" value={adding ? ADD : room} onChange={(e) => (e.target.value === ADD ? setAdding(true) : (setAdding(false), setRoom(e.target.value)))} className={field} disabled={!area} data-testid={`${formId}-room`}>
            <option value="">(no room)</option>
            {room && !rooms.includes(room) ? <option value={room}>{room} (not in the site&apos;s structure)</option> : null}
            {rooms.map((r) => (
              <option key={r} value={r}>
                {r}
              </option>
            ))}
            {ctx?.canAddRooms && current?.id ? <option value={ADD}>+ Add a new room…</option> : null}
          </select>
        </label>
        {adding ? (
          <span className="mt-1 flex gap-1">
            <input aria-label="New room name" value={newRoom} onChange={(e) => setNewRoom(e.target.value)} maxLength={120} className="block w-full rounded-md border border-line bg-white px-2 py-1 text-sm" />
            <Button type="button" variant="secondary" onClick={() => void add()}>
              Add room
            </Button>
          </span>
        ) : null}
        {error ? <span className="mt-0.5 block text-xs text-fault">{error}</span> : null}
      </div>
    </>
  );
}
