import type { SupervisionPreference } from "@/lib/schedule/schema";
import { SUPERVISION_WORDS } from "@/lib/vocabulary/words";

export interface DetectorType {
  id: string;
  name: string;
  category: string;
  lifeSafety: boolean;
}

export interface SiteArea {
  /** Set for areas of the site's structure (absent for names only the schedule uses). */
  id?: number;
  floor?: string;
  name: string;
  rooms: string[];
}

/** The site's areas as the schedule picks from them, in floor order. */
export function siteAreasOf(site: { floors: { name: string; areas: { id: number; name: string; rooms: { name: string }[] }[] }[] }): SiteArea[] {
  return site.floors.flatMap((f) => f.areas.map((a) => ({ id: a.id, floor: f.name, name: a.name, rooms: a.rooms.map((r) => r.name) })));
}

export const supervisionLabels: Record<SupervisionPreference, string> = SUPERVISION_WORDS;
