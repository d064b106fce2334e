// Standby battery capacity: rest current for the standby period, then alarm current for the alarm period,
// in ampere-hours, times the safety factor; and the standard batteries that hold it.

export interface BatteryInput {
  restMa: number;
  alarmMa: number;
  standbyH: number;
  alarmMin: number;
  safetyFactor: number;
}

/** Ah = (rest mA × standby h + alarm mA × alarm min / 60) / 1000 × safety factor. */
export function batteryAh({ restMa, alarmMa, standbyH, alarmMin, safetyFactor }: BatteryInput): number {
  return ((restMa * standbyH + (alarmMa * alarmMin) / 60) / 1000) * safetyFactor;
}

/** Sealed lead-acid 12 V alarm battery sizes the trade stocks, Ah (common practice, no published source). */
export const STANDARD_BATTERY_AH = [7, 12, 17, 18] as const;

/** At most this many strings in parallel on one charger (common practice, no published source). */
const MAX_PARALLEL = 2;

export interface BatteryPick {
  /** One battery's capacity, Ah. */
  sizeAh: number;
  /** Batteries to fit: strings in parallel × batteries in series per string. */
  count: number;
  /** Strings in parallel (each adds its capacity). */
  parallel: number;
  /** 12 V batteries in series per string: 1 on a 12 V system, 2 on a 24 V one. */
  series: number;
  nominalVolts: 12 | 24;
  /** Capacity of the whole set, Ah. */
  totalAh: number;
}

/** A 13.8 V float charger serves a 12 V battery, 27.6 V a 24 V one (common practice, no published source). */
export const nominalBatteryVolts = (supplyVolts: number): 12 | 24 => (supplyVolts >= 20 ? 24 : 12);

/**
 * The fewest standard batteries that hold `neededAh` within the charger's limit: one string of the smallest size
 * that holds it, else two strings in parallel; null when nothing fits (the load must be split).
 */
export function pickBattery(neededAh: number, maxBatteryAh: number, supplyVolts: number): BatteryPick | null {
  const nominalVolts = nominalBatteryVolts(supplyVolts);
  const series = nominalVolts / 12;
  for (let parallel = 1; parallel <= MAX_PARALLEL; parallel++)
    for (const sizeAh of STANDARD_BATTERY_AH) {
      const totalAh = sizeAh * parallel;
      if (totalAh >= neededAh - 1e-9 && totalAh <= maxBatteryAh + 1e-9) return { sizeAh, count: parallel * series, parallel, series, nominalVolts, totalAh };
    }
  return null;
}

const COUNT_WORDS = ["no", "one", "two", "three", "four"];

/** "one 12 V 17 Ah battery", "two 12 V 12 Ah batteries in parallel (24 Ah)". */
export function batteryPickText(p: BatteryPick): string {
  const n = COUNT_WORDS[p.count] ?? String(p.count);
  const what = `${n} 12 V ${p.sizeAh} Ah batter${p.count === 1 ? "y" : "ies"}`;
  const how = [p.series > 1 ? `${p.series} in series for ${p.nominalVolts} V` : "", p.parallel > 1 ? `${p.parallel === 2 && p.series === 1 ? "in parallel" : `${p.parallel} strings in parallel`} (${p.totalAh} Ah)` : ""].filter(Boolean);
  return how.length ? `${what}, ${how.join(", ")}` : what;
}
