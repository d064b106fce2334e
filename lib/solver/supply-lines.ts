import { batteryPickText } from "@/lib/solver/battery";
import { fmt, fmtUp } from "@/lib/solver/format";
import type { PowerDraw, SupplyFigures } from "@/lib/solver/types";

// A supply's figures as every screen and paper shows them, from one solver result: one label, one number.

export const mA = (v: number) => `${fmt(v)} mA`;

export const SUPPLY_LABELS = {
  outputRest: "Output load at rest",
  outputAlarm: "Output load in alarm",
  batteryRest: "Battery load at rest",
  batteryAlarm: "Battery load in alarm",
  battery: "Standby battery",
} as const;

export interface SupplyLine {
  key: keyof typeof SUPPLY_LABELS;
  label: string;
  value: string;
}

/** "at least 13.7 Ah: one 12 V 17 Ah battery" (rounded up, the standard pick). */
export function batteryText(s: SupplyFigures): string {
  const need = `at least ${fmtUp(s.batteryNeededAh)} Ah`;
  if (s.batteryNeededAh > s.maxBatteryAh) return `${need}, more than its ${fmt(s.maxBatteryAh)} Ah charger takes`;
  return s.batteryPick ? `${need}: ${batteryPickText(s.batteryPick)}` : `${need}: no standard battery set fits its ${fmt(s.maxBatteryAh)} Ah charger`;
}

export function supplyLines(s: SupplyFigures): SupplyLine[] {
  const line = (key: SupplyLine["key"], value: string): SupplyLine => ({ key, label: SUPPLY_LABELS[key], value });
  return [
    line("outputRest", `${mA(s.loadRestMa)} of ${mA(s.ratingMa)} rated`),
    line("outputAlarm", `${mA(s.loadAlarmMa)} of ${mA(s.ratingMa)} rated`),
    line("batteryRest", mA(s.batteryRestMa)),
    line("batteryAlarm", mA(s.batteryAlarmMa)),
    line("battery", batteryText(s)),
  ];
}

/** "Detectors (12)" when there are many: the breakdown with the detectors summed, and their lines kept for a closer look. */
export function breakdownSummary(s: SupplyFigures): { lines: PowerDraw[]; detectors: PowerDraw[]; detectorRestMa: number; detectorAlarmMa: number } {
  const detectors = s.breakdown.filter((l) => l.kind === "detector");
  return {
    lines: s.breakdown.filter((l) => l.kind !== "detector"),
    detectors,
    detectorRestMa: detectors.reduce((a, l) => a + l.restMa, 0),
    detectorAlarmMa: detectors.reduce((a, l) => a + l.alarmMa, 0),
  };
}

/** "12.14 V (1.66 V dropped)": the voltage left at a powered detector after the drop on its cable, and its limit when below. */
export const voltsText = (v: { volts: number; dropV: number; minVolts: number; ok: boolean }) => `${v.volts.toFixed(2)} V (${v.dropV.toFixed(2)} V dropped)${v.ok ? "" : `, below its ${v.minVolts.toFixed(1)} V`}`;
