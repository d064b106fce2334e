// Human-readable resistance: 3 significant figures, SI prefix. Kept cheap: findings format many figures.

/** Mantissa to 3 significant figures (2 decimals below 10, 1 below 100, none above), trailing zeros dropped. */
function trim(x: number): string {
  const a = Math.abs(x);
  const r = a >= 100 ? Math.round(x) : a >= 10 ? Math.round(x * 10) / 10 : Math.round(x * 100) / 100;
  return String(r);
}

function split(ohms: number): [string, string] {
  if (ohms === Infinity) return ["∞", "Ω"];
  if (Number.isNaN(ohms)) return ["?", "Ω"];
  const a = Math.abs(ohms);
  // round first so 999.6 Ω becomes 1 kΩ, not "1000 Ω"
  if (a >= 999_500) return [trim(ohms / 1e6), "MΩ"];
  if (a >= 999.5) return [trim(ohms / 1e3), "kΩ"];
  if (a > 0 && a < 0.01) return [ohms.toPrecision(2), "Ω"];
  return [trim(ohms), "Ω"];
}

export function formatOhms(ohms: number): string {
  const [n, u] = split(ohms);
  return `${n} ${u}`;
}

/** An interval: "5.32–5.88 kΩ", or one figure when both ends round the same. */
export function formatOhmsRange(minOhms: number, maxOhms: number): string {
  const [na, ua] = split(minOhms);
  const [nb, ub] = split(maxOhms);
  if (na === nb && ua === ub) return `${na} ${ua}`;
  if (maxOhms === Infinity) return `${na} ${ua} – ∞`;
  return ua === ub ? `${na}–${nb} ${ub}` : `${na} ${ua} – ${nb} ${ub}`;
}
