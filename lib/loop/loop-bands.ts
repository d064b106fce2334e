// Turning readings into reports through an input type's band table.
import { reportSchema, type Band, type Report } from "@/lib/catalog/schema";

/** One bit per report, for fast set tests. */
export const REPORT_BIT: Record<Report, number> = Object.fromEntries(reportSchema.options.map((r, i) => [r, 1 << i])) as Record<Report, number>;

/** Reports that count as a row being seen for what it is: a short or an open may also read as trouble. */
export function acceptableFor(expected: Report): number {
  if (expected === "short") return REPORT_BIT.short | REPORT_BIT.trouble;
  if (expected === "open") return REPORT_BIT.open | REPORT_BIT.trouble;
  return REPORT_BIT[expected];
}

export function maskOf(reports: readonly Report[]): number {
  let m = 0;
  for (const r of reports) m |= REPORT_BIT[r];
  return m;
}

export interface CompiledBands {
  /** One frozen single-report array per band, shared by every reading that falls in it. */
  single: readonly Report[][];
  /** Report bit of each band. */
  masks: Int32Array;
  /** Upper edge of each band (Infinity for the last). */
  to: Float64Array;
  from: Float64Array;
  reports: Report[];
}

const compiled = new WeakMap<readonly Band[], CompiledBands>();

export function compileBands(bands: readonly Band[]): CompiledBands {
  const hit = compiled.get(bands);
  if (hit) return hit;
  const out: CompiledBands = {
    to: Float64Array.from(bands, (b) => (b.toOhms === null ? Infinity : b.toOhms)),
    from: Float64Array.from(bands, (b) => b.fromOhms),
    reports: bands.map((b) => b.report),
    single: bands.map((b) => Object.freeze([b.report]) as Report[]),
    masks: Int32Array.from(bands, (b) => REPORT_BIT[b.report]),
  };
  compiled.set(bands, out);
  return out;
}

/** Index of the band holding `ohms` (bands run [from, to)); ∞ falls in the last band. */
export function bandIndex(cb: CompiledBands, ohms: number): number {
  const last = cb.to.length - 1;
  for (let i = 0; i < last; i++) if (ohms < cb.to[i]) return i;
  return last;
}

/** What the panel reports for one reading. */
export function reportOf(bands: readonly Band[], ohms: number): Report {
  const cb = compileBands(bands);
  return cb.reports[bandIndex(cb, ohms)];
}

/** Every report an interval touches, lowest band first, without repeats. */
export function reportsOf(bands: readonly Band[], minOhms: number, maxOhms: number): Report[] {
  const cb = compileBands(bands);
  return reportsBetween(cb, bandIndex(cb, minOhms), bandIndex(cb, maxOhms));
}

export function reportsBetween(cb: CompiledBands, lo: number, hi: number): Report[] {
  if (lo === hi) return cb.single[lo];
  const out: Report[] = [];
  for (let i = lo; i <= hi; i++) if (!out.includes(cb.reports[i])) out.push(cb.reports[i]);
  return out;
}

/**
 * Distance from [minOhms, maxOhms] to the nearest edge of the band holding it (0 if it straddles one).
 * 0 Ω at the bottom and ∞ at the top are not edges.
 */
export function marginOf(cb: CompiledBands, lo: number, hi: number, minOhms: number, maxOhms: number): number {
  if (lo !== hi) return 0;
  const below = lo === 0 ? Infinity : minOhms - cb.from[lo];
  const above = cb.to[lo] === Infinity ? Infinity : cb.to[lo] - maxOhms;
  return below < above ? below : above;
}
