// Human-readable resistance: 3 significant figures, SI prefix.

function trim(x: number): string {
  const s = x >= 100 ? x.toFixed(0) : x >= 10 ? x.toFixed(1) : x.toFixed(2);
  return s.includes(".") ? s.replace(/0+$/, "").replace(/\.$/, "") : s;
}

export function formatOhms(ohms: number): string {
  if (ohms === Infinity) return "∞ Ω";
  if (Number.isNaN(ohms)) return "? Ω";
  const a = Math.abs(ohms);
  if (a >= 1e6) return `${trim(ohms / 1e6)} MΩ`;
  if (a >= 1e3) return `${trim(ohms / 1e3)} kΩ`;
  if (a > 0 && a < 0.01) return `${ohms.toPrecision(2)} Ω`;
  return `${trim(ohms)} Ω`;
}

/** An interval: "5.32–5.91 kΩ", or one figure when both ends round the same. */
export function formatOhmsRange(minOhms: number, maxOhms: number): string {
  const a = formatOhms(minOhms);
  const b = formatOhms(maxOhms);
  if (a === b) return a;
  if (maxOhms === Infinity) return `${a} – ∞`;
  const ua = a.split(" ")[1];
  const ub = b.split(" ")[1];
  return ua === ub ? `${a.split(" ")[0]}–${b}` : `${a} – ${b}`;
}
