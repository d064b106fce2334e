import { defaultEndOfDischargeVolts, type Catalog } from "@/lib/catalog/schema";
import { conductorOhms } from "@/lib/loop";
import { VOLTAGE_DROP_TEMP_C } from "@/lib/solver/power-rules";
import type { PlacedDetector } from "@/lib/solver/resolve";

// The voltage left at a powered detector depends on which supply feeds its board: the panel (its auxiliary output,
// and a board's own supply, which takes the panel's voltage) or a supply board. The same sums as the solver's
// power rules: volts less the drop over the cable out and back, on mains and at the battery's end of discharge.

export interface SupplyLevel {
  volts: number;
  endVolts: number;
  panelMinVolts: number;
}

/** The key of a feed's level: the panel's own, or a supply board's under that panel. */
export const panelLevelKey = (panelId: string) => `p:${panelId}`;
export const supplyLevelKey = (supplyId: string, panelId: string) => `s:${supplyId}:${panelId}`;

export function supplyLevels(catalog: Catalog): Map<string, SupplyLevel> {
  const levels = new Map<string, SupplyLevel>();
  for (const p of catalog.panels) {
    levels.set(panelLevelKey(p.id), { volts: p.supplyVolts, endVolts: p.endOfDischargeVolts ?? defaultEndOfDischargeVolts(p.supplyVolts), panelMinVolts: p.minDeviceVolts });
    for (const s of catalog.powerSupplies)
      if (s.families.includes(p.family)) levels.set(supplyLevelKey(s.id, p.id), { volts: s.outputVolts, endVolts: s.endOfDischargeVolts ?? defaultEndOfDischargeVolts(s.outputVolts), panelMinVolts: p.minDeviceVolts });
  }
  return levels;
}

export function voltageOk(d: PlacedDetector, level: SupplyLevel): boolean {
  const p = d.cat.power;
  if (!p) return true;
  const dropV = (p.alarmMa / 1000) * 2 * conductorOhms(d.sched.gauge, d.sched.cableM, VOLTAGE_DROP_TEMP_C);
  return level.volts - dropV >= Math.max(p.minVolts, level.panelMinVolts) && level.endVolts - dropV >= p.minVolts;
}
