// Copper conductor resistance from gauge, length and temperature.
import type { CableGauge, CableSpec } from "./types";

/** IEC 60028 annealed copper: 1/58 Ω·mm²/m at 20 °C. */
export const COPPER_RESISTIVITY_20C = 1 / 58;
/** Temperature coefficient of copper resistance at 20 °C, per °C. */
export const COPPER_ALPHA_20C = 0.00393;
export const METRES_PER_FOOT = 0.3048;

/** ASTM B258: d = 0.005 in × 92^((36 − n)/39); 0 AWG is n = 0, 00 is −1, 000 is −2, 0000 is −3. Millimetres. */
export function awgDiameterMm(awg: number): number {
  return 0.127 * 92 ** ((36 - awg) / 39);
}

export function awgAreaMm2(awg: number): number {
  const d = awgDiameterMm(awg);
  return (Math.PI / 4) * d * d;
}

const awgAreas = new Map<number, number>();

export function gaugeAreaMm2(gauge: CableGauge): number {
  if (!("awg" in gauge)) return gauge.mm2;
  let a = awgAreas.get(gauge.awg);
  if (a === undefined) {
    a = awgAreaMm2(gauge.awg);
    if (awgAreas.size < 100) awgAreas.set(gauge.awg, a);
  }
  return a;
}

/** R(T) = R20 × (1 + α (T − 20)). */
export function copperTempFactor(tempC: number): number {
  return 1 + COPPER_ALPHA_20C * (tempC - 20);
}

/** One conductor, ohms per metre. */
export function conductorOhmsPerM(gauge: CableGauge, tempC = 20): number {
  return (COPPER_RESISTIVITY_20C / gaugeAreaMm2(gauge)) * copperTempFactor(tempC);
}

/** One conductor, ohms per 1000 ft (the unit of US wire tables). */
export function conductorOhmsPer1000Ft(gauge: CableGauge, tempC = 20): number {
  return conductorOhmsPerM(gauge, tempC) * 1000 * METRES_PER_FOOT;
}

/** One conductor of the given length, ohms. */
export function conductorOhms(gauge: CableGauge, lengthM: number, tempC = 20): number {
  return conductorOhmsPerM(gauge, tempC) * lengthM;
}

/**
 * The conductors in the loop path over the cable's temperature range: 2 for an ordinary pair
 * (out and back), 4 for a loop-back resistor (out and back twice).
 */
export function cableOhms(cable: CableSpec, conductors = 2): { minOhms: number; maxOhms: number } {
  return {
    minOhms: conductors * conductorOhms(cable.gauge, cable.lengthM, cable.tempMinC),
    maxOhms: conductors * conductorOhms(cable.gauge, cable.lengthM, cable.tempMaxC),
  };
}

/** Longest one-way run whose conductors stay within `limitOhms` at `tempC`. */
export function maxRunForOhms(gauge: CableGauge, limitOhms: number, conductors = 2, tempC = 20): number {
  return limitOhms / (conductors * conductorOhmsPerM(gauge, tempC));
}
