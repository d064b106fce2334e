// IEC 60063 preferred number series. Mantissas are stored ×10 as integers so no value carries float error.

export type ESeriesName = "E12" | "E24";

export const E12_MANTISSAS: readonly number[] = [10, 12, 15, 18, 22, 27, 33, 39, 47, 56, 68, 82];
export const E24_MANTISSAS: readonly number[] = [10, 11, 12, 13, 15, 16, 18, 20, 22, 24, 27, 30, 33, 36, 39, 43, 47, 51, 56, 62, 68, 75, 82, 91];

/** The stock range the trade buys from: 1 Ω up to 10 MΩ. */
export const STOCK_MIN_OHMS = 1;
export const STOCK_MAX_OHMS = 10_000_000;

export function mantissasOf(series: ESeriesName): readonly number[] {
  return series === "E12" ? E12_MANTISSAS : E24_MANTISSAS;
}

function decadeValue(mantissa: number, decade: number): number {
  // mantissa 47, decade 0 → 4.7 Ω; decade 3 → 4.7 kΩ
  return decade >= 1 ? mantissa * 10 ** (decade - 1) : mantissa / 10 ** (1 - decade);
}

const valueCache = new Map<string, readonly number[]>();

/** Every value of the series from `minOhms` to `maxOhms` inclusive, ascending (default 1 Ω – 10 MΩ). */
export function seriesValues(series: ESeriesName, minOhms = STOCK_MIN_OHMS, maxOhms = STOCK_MAX_OHMS): readonly number[] {
  const key = `${series}:${minOhms}:${maxOhms}`;
  const hit = valueCache.get(key);
  if (hit) return hit;
  const out: number[] = [];
  const lo = Math.floor(Math.log10(minOhms)) - 1;
  const hi = Math.ceil(Math.log10(maxOhms)) + 1;
  for (let d = lo; d <= hi; d++)
    for (const m of mantissasOf(series)) {
      const v = decadeValue(m, d);
      if (v >= minOhms * (1 - 1e-12) && v <= maxOhms * (1 + 1e-12)) out.push(v);
    }
  const frozen = Object.freeze(out);
  valueCache.set(key, frozen);
  return frozen;
}

/** Two significant figures ×10 (10..99) and the decade, or null for 0, negative or non-finite. */
function splitMantissa(ohms: number): { m: number; decade: number } | null {
  if (!(ohms > 0) || !Number.isFinite(ohms)) return null;
  let decade = Math.floor(Math.log10(ohms));
  let m = ohms / 10 ** (decade - 1);
  if (m >= 99.9999999) {
    m /= 10;
    decade += 1;
  } else if (m < 9.9999999) {
    m *= 10;
    decade -= 1;
  }
  return { m, decade };
}

/** Whether `ohms` is exactly a value of the series (to 1 part in 10⁹). */
export function isPreferred(ohms: number, series: ESeriesName): boolean {
  const s = splitMantissa(ohms);
  if (!s) return false;
  const r = Math.round(s.m);
  return Math.abs(s.m - r) < 1e-7 * r && mantissasOf(series).includes(r);
}

/** The smallest series the value belongs to: "E12" (also in E24), "E24", or null. */
export function preferredSeriesOf(ohms: number): ESeriesName | null {
  if (isPreferred(ohms, "E12")) return "E12";
  if (isPreferred(ohms, "E24")) return "E24";
  return null;
}

/** The preferred values either side of `ohms` ([ohms] itself when it is one), ascending. */
export function nearestPreferred(ohms: number, series: ESeriesName): number[] {
  const s = splitMantissa(ohms);
  if (!s) return [];
  if (isPreferred(ohms, series)) return [ohms];
  const ms = mantissasOf(series);
  let below = decadeValue(ms[ms.length - 1], s.decade - 1);
  let above = decadeValue(ms[0], s.decade + 1);
  for (const m of ms) {
    if (m < s.m) below = decadeValue(m, s.decade);
    else {
      above = decadeValue(m, s.decade);
      break;
    }
  }
  return [below, above];
}

/** The single closest preferred value (by ratio, as tolerances are relative). */
export function closestPreferred(ohms: number, series: ESeriesName): number | null {
  const n = nearestPreferred(ohms, series);
  if (n.length === 0) return null;
  if (n.length === 1) return n[0];
  return ohms / n[0] <= n[1] / ohms ? n[0] : n[1];
}
