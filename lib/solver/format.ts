// Figures in messages: a few significant digits, never a long float tail.

export function fmt(n: number, digits = 3): string {
  if (!Number.isFinite(n)) return String(n);
  if (Number.isInteger(n)) return String(n);
  const a = Math.abs(n);
  const d = a >= 100 ? 1 : a >= 10 ? Math.max(1, digits - 2) : digits - 1;
  return String(Number(n.toFixed(d)));
}

export function listNames(names: string[], max = 3): string {
  if (names.length <= max) return names.join(", ");
  return `${names.slice(0, max).join(", ")} and ${names.length - max} more`;
}

/** Like fmt, but rounded up: for "at least" figures (13.64 → "13.7"). A hair of float noise is not rounded up. */
export function fmtUp(n: number, digits = 3): string {
  if (!Number.isFinite(n) || Number.isInteger(n)) return fmt(n, digits);
  const a = Math.abs(n);
  const d = a >= 100 ? 1 : a >= 10 ? Math.max(1, digits - 2) : digits - 1;
  const k = 10 ** d;
  return String(Math.ceil(n * k - 1e-9) / k);
}
