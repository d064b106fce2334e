// Resistance as people type it: 4700, 4700 Ω, 4.7k, 4.7 kΩ, 4k7 (IEC 60062 letter code, the letter as the
// decimal point), 470R, 0R47, 1M, 1M2, 4,7k. "m" is mega, as on resistors and meter ranges: nobody fits
// milliohms on a loop. The one parser for typed resistances: the loop bench's fields and the meter readings.

const MULT: Record<string, number> = { "": 1, r: 1, "ω": 1, ohm: 1, ohms: 1, k: 1e3, "kω": 1e3, kohm: 1e3, kohms: 1e3, m: 1e6, "mω": 1e6, mohm: 1e6, mohms: 1e6 };

export interface ParseOhmsOptions {
  /** Accept 0 Ω: a meter reads it across a short; a resistor value never is. */
  allowZero?: boolean;
}

/** Ohms, or null when the text is not a resistance (not above 0 Ω unless `allowZero`). */
export function parseOhms(text: string, { allowZero = false }: ParseOhmsOptions = {}): number | null {
  const t = text.trim().toLowerCase().replace(/\s+/g, "").replace(",", ".");
  if (!t) return null;
  const ok = (v: number) => (Number.isFinite(v) && (v > 0 || (allowZero && v === 0)) ? round(v) : null);
  // letter code: digits, a multiplier letter in place of the decimal point, digits (4k7, 0r47, 1m2)
  const code = /^(\d+)([rkm])(\d+)(?:ω|ohms?)?$/.exec(t);
  if (code) return ok(Number(`${code[1]}.${code[3]}`) * MULT[code[2]]);
  const plain = /^(\d+(?:\.\d*)?|\.\d+)(r|ω|ohms?|k|kω|kohms?|m|mω|mohms?)?$/.exec(t);
  if (!plain) return null;
  return ok(Number(plain[1]) * MULT[plain[2] ?? ""]);
}

/** Clears float noise such as 4.7 × 1000 = 4700.000000000001. */
function round(v: number): number {
  return Number(v.toPrecision(12));
}

/** The shortest plain text for a value: 4700 → "4.7k", 560 → "560", 1200000 → "1.2M". */
export function ohmsText(ohms: number): string {
  if (ohms >= 1e6) return `${round(ohms / 1e6)}M`;
  if (ohms >= 1e3) return `${round(ohms / 1e3)}k`;
  return String(round(ohms));
}

/** The IEC 60062 letter code: 4700 → "4k7", 470 → "470R", 1000000 → "1M", 0.47 → "0R47". */
export function letterCode(ohms: number): string {
  const [div, letter] = ohms >= 1e6 ? [1e6, "M"] : ohms >= 1e3 ? [1e3, "k"] : [1, "R"];
  const [whole, frac = ""] = String(round(ohms / div)).split(".");
  return `${whole}${letter}${frac}`;
}
