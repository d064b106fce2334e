// IEC 60062 resistor colour code.

export const DIGIT_COLOURS = ["black", "brown", "red", "orange", "yellow", "green", "blue", "violet", "grey", "white"] as const;
export type BandColour = (typeof DIGIT_COLOURS)[number] | "gold" | "silver";

/** Multiplier band: power of ten → colour (gold ×0.1, silver ×0.01). */
const MULTIPLIER_COLOURS: Record<number, BandColour> = { [-2]: "silver", [-1]: "gold" };
DIGIT_COLOURS.forEach((c, i) => (MULTIPLIER_COLOURS[i] = c));

/** Tolerance band: percent → colour. 20 % has no band. */
export const TOLERANCE_COLOURS: Record<string, BandColour> = {
  "0.05": "grey",
  "0.1": "violet",
  "0.25": "blue",
  "0.5": "green",
  "1": "brown",
  "2": "red",
  "5": "gold",
  "10": "silver",
};

// by tolerance, then value: numeric keys, as a string key built per call showed in the loop engine's profile
const cache = new Map<number, Map<number, string[] | null>>();

/**
 * The colour bands for a resistor: 4 bands (2 digits, multiplier, tolerance) for 5 % and wider,
 * 5 bands (3 digits) for tighter parts or a value that needs a third digit; 20 % drops the tolerance band.
 * Null when the value cannot be coded (more than 3 significant figures, or outside 0.1 Ω–999 GΩ)
 * or the tolerance has no colour.
 */
export function colourBands(ohms: number, tolerancePct: number): string[] | null {
  let byValue = cache.get(tolerancePct);
  if (!byValue) cache.set(tolerancePct, (byValue = new Map()));
  const hit = byValue.get(ohms);
  if (hit !== undefined) return hit;
  const out = computeBands(ohms, tolerancePct);
  byValue.set(ohms, out);
  return out;
}

function computeBands(ohms: number, tolerancePct: number): string[] | null {
  if (!(ohms > 0) || !Number.isFinite(ohms)) return null;
  const tolColour = tolerancePct === 20 ? null : TOLERANCE_COLOURS[String(tolerancePct)];
  if (tolColour === undefined) return null;
  const preferDigits = tolerancePct >= 5 ? 2 : 3;
  for (let digits = preferDigits; digits <= 3; digits++) {
    const exp = Math.floor(Math.log10(ohms)) - (digits - 1);
    for (const e of [exp, exp + 1, exp - 1]) {
      const m = ohms / 10 ** e;
      const r = Math.round(m);
      if (Math.abs(m - r) > 1e-6 * r || r < 10 ** (digits - 1) || r >= 10 ** digits) continue;
      const mult = MULTIPLIER_COLOURS[e];
      if (!mult) return null;
      const ds = String(r).split("").map((d) => DIGIT_COLOURS[Number(d)]);
      return tolColour ? [...ds, mult, tolColour] : [...ds, mult];
    }
  }
  return null;
}

/** Decode bands back to ohms and tolerance (3, 4 or 5 bands). */
export function bandsToOhms(bands: readonly string[]): { ohms: number; tolerancePct: number } {
  if (bands.length < 3 || bands.length > 5) throw new RangeError("a resistor has 3, 4 or 5 bands");
  const hasTol = bands.length !== 3;
  const digits = bands.slice(0, hasTol ? -2 : -1);
  const multColour = bands[bands.length - (hasTol ? 2 : 1)];
  let m = 0;
  for (const c of digits) {
    const d = DIGIT_COLOURS.indexOf(c as (typeof DIGIT_COLOURS)[number]);
    if (d < 0) throw new RangeError(`not a digit colour: ${c}`);
    m = m * 10 + d;
  }
  const exp = Number(Object.keys(MULTIPLIER_COLOURS).find((k) => MULTIPLIER_COLOURS[Number(k)] === multColour));
  if (Number.isNaN(exp)) throw new RangeError(`not a multiplier colour: ${multColour}`);
  let tolerancePct = 20;
  if (hasTol) {
    const t = Object.keys(TOLERANCE_COLOURS).find((k) => TOLERANCE_COLOURS[k] === bands[bands.length - 1]);
    if (t === undefined) throw new RangeError(`not a tolerance colour: ${bands[bands.length - 1]}`);
    tolerancePct = Number(t);
  }
  // Multiply or divide by an exact power of ten so 47 × 0.1 comes out as 4.7.
  const ohms = exp >= 0 ? m * 10 ** exp : m / 10 ** -exp;
  return { ohms, tolerancePct };
}
