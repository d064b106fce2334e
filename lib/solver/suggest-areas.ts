import type { Catalog, Panel, ZoneType } from "@/lib/catalog/schema";
import type { LayoutArea, ZoneProgram } from "@/lib/layout/schema";
import type { Schedule } from "@/lib/schedule/schema";
import { plural } from "@/lib/vocabulary/plural";
import { ZONE_TYPE_WORDS } from "@/lib/vocabulary/words";

// Areas of a suggested layout: one per area named in the device schedule, each zone in its detector's area with the
// type its device needs (fire for a life-safety device, hold-up for a panic button, else instant). With one area
// or none named, the layout keeps the default (every zone an instant zone of a single area) and sets nothing.

export interface AreaPlan {
  areas: LayoutArea[];
  zones: ZoneProgram[];
  /** Zone types the panel must offer. */
  types: Set<ZoneType>;
}

export function areaPlan(schedule: Schedule, catalog: Catalog): AreaPlan | null {
  const names = [...new Set(schedule.map((d) => d.area.trim()).filter(Boolean))].sort((a, b) => a.localeCompare(b));
  if (names.length < 2) return null;
  const key = new Map(names.map((n, i) => [n, `area-${i + 1}`]));
  const areas: LayoutArea[] = names.map((n) => ({ key: key.get(n)!, name: n.slice(0, 80) }));
  const types = new Set<ZoneType>();
  const zones: ZoneProgram[] = schedule.map((d) => {
    const wired = catalog.detectors.find((x) => x.id === d.catalogId);
    const cat = wired ?? catalog.wirelessDetectors.find((x) => x.id === d.catalogId);
    const type: ZoneType = cat?.lifeSafety ? "fire" : cat?.category === "panic" ? "hold-up" : "instant";
    types.add(type);
    // a detector with no area named goes to the first area, as the solver's default does
    return { detectorId: d.id, type, areaKey: key.get(d.area.trim()) ?? areas[0].key };
  });
  return { areas, zones, types };
}

/** Why a panel cannot carry the plan's areas, or null. */
export function areaMisfit(panel: Panel, plan: AreaPlan | null): string | null {
  if (!plan) return null;
  const max = panel.maxAreas ?? 1;
  if (plan.areas.length > max) return `${panel.name}: ${plural(plan.areas.length, "area")} named in the schedule; it sets and unsets at most ${max}`;
  const missing = panel.zoneTypes ? [...plan.types].filter((t) => !panel.zoneTypes!.includes(t)) : [];
  if (missing.length) return `${panel.name}: offers no ${missing.map((t) => ZONE_TYPE_WORDS[t]).join(" or ")} zone, which the schedule's detectors need`;
  return null;
}
