// Standby battery capacity: rest current for the standby period, then alarm current for the alarm period,
// in ampere-hours, times the safety factor.

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
