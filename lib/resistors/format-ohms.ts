// Human-readable resistance: 3 significant figures, SI prefix. Findings format many figures, so this
// builds strings from integers (fast in V8) rather than through toFixed or regular expressions.

const UNITS = ["Ω", "kΩ", "MΩ"] as const;

/** Mantissa to 3 significant figures (2 decimals below 10, 1 below 100, none above), trailing zeros dropped. */
function mantissa(x: number): string {
  const neg = x < 0;
  const a = neg ? -x : x;
  let s: string;
  if (a >= 100) s = String(Math.round(a));
  else if (a >= 10) {
    const k = Math.round(a * 10);
    const d = k % 10;
    s = d === 0 ? String((k - d) / 10) : `${(k - d) / 10}.${d}`;
  } else {
    const k = Math.round(a * 100);
    const d = k % 100;
    const i = (k - d) / 100;
    s = d === 0 ? String(i) : d % 10 === 0 ? `${i}.${d / 10}` : `${i}.${d < 10 ? "0" : ""}${d}`;
  }
  return neg ? `-${s}` : s;
}

/** 0 Ω, 1 kΩ, 2 MΩ; rounding first so 999.6 Ω is 1 kΩ, not "1000 Ω". */
function unitOf(ohms: number): number {
  const a = Math.abs(ohms);
  return a >= 999_500 ? 2 : a >= 999.5 ? 1 : 0;
}

function numberPart(ohms: number, unit: number): string {
  if (ohms === Infinity) return "∞";
  if (Number.isNaN(ohms)) return "?";
  const a = Math.abs(ohms);
  if (unit === 0 && a > 0 && a < 0.01) return ohms.toPrecision(2);
  return mantissa(unit === 0 ? ohms : unit === 1 ? ohms / 1e3 : ohms / 1e6);
}

export function formatOhms(ohms: number): string {
  const u = ohms === Infinity || Number.isNaN(ohms) ? 0 : unitOf(ohms);
  return `${numberPart(ohms, u)} ${UNITS[u]}`;
}

/** An interval: "5.32–5.88 kΩ", or one figure when both ends round the same. */
export function formatOhmsRange(minOhms: number, maxOhms: number): string {
  if (minOhms === Infinity) return "∞ Ω";
  const ua = unitOf(minOhms);
  const na = numberPart(minOhms, ua);
  if (maxOhms === Infinity) return `${na} ${UNITS[ua]} – ∞`;
  const ub = unitOf(maxOhms);
  const nb = numberPart(maxOhms, ub);
  if (ua === ub) return na === nb ? `${na} ${UNITS[ua]}` : `${na}–${nb} ${UNITS[ub]}`;
  return `${na} ${UNITS[ua]} – ${nb} ${UNITS[ub]}`;
}
