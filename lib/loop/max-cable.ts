// The longest one-way run: the length at which the first reading that is in its band on a zero-length cable
// leaves it. It does not depend on the run entered, so a run already past it gets the true, shorter figure.
// Every reading is non-decreasing in conductor resistance (series–parallel network of positive resistors),
// so each row has one crossing length; the slope is at most (conductors × Ω/m), which gives a lower bound
// that is exact for series-only paths. Otherwise: bracket by doubling, then Illinois regula falsi.
import { copperTempFactor } from "./cable";
import { evalReading, type LoopModel } from "./loop-model";

export const CABLE_SEARCH_CAP_M = 1e7;

export interface CableRow {
  code: readonly number[];
  fault: number;
  /** Highest reading on a zero-length cable (parts at the top of their tolerance). */
  maxAtZeroOhms: number;
  /** Upper edge of the band it must stay in. */
  edgeOhms: number;
}

/** Null when no reading ever leaves its band. */
export function maxCableRun(m: LoopModel, rows: readonly CableRow[], partHi: number): number | null {
  const r = m.rPerM20 * copperTempFactor(m.tMax);
  if (!(r > 0)) return null;
  const eol = m.eol * partHi;
  const alarm = m.alarm * partHi;
  const sa = m.sa * partHi;
  const sb = m.sb * partHi;
  let limit = Infinity;
  for (const row of rows) {
    const edge = row.edgeOhms;
    if (!(row.maxAtZeroOhms < edge) || edge === Infinity) continue;
    if (limit < Infinity && evalReading(m, row.code, row.fault, r * limit, eol, alarm, sa, sb) < edge) continue; // crosses later than the current limit, if at all
    if (limit === Infinity && evalReading(m, row.code, row.fault, r * CABLE_SEARCH_CAP_M, eol, alarm, sa, sb) < edge) continue; // never crosses
    let a = (edge - row.maxAtZeroOhms) / (m.conductors * r);
    let fa = evalReading(m, row.code, row.fault, r * a, eol, alarm, sa, sb);
    if (fa >= edge * (1 - 1e-12)) {
      if (a < limit) limit = a;
      continue;
    }
    let b = Math.min(2 * a + 1, CABLE_SEARCH_CAP_M);
    let fb = evalReading(m, row.code, row.fault, r * b, eol, alarm, sa, sb);
    while (fb < edge && b < CABLE_SEARCH_CAP_M) {
      a = b;
      fa = fb;
      b = Math.min(2 * b, CABLE_SEARCH_CAP_M);
      fb = evalReading(m, row.code, row.fault, r * b, eol, alarm, sa, sb);
    }
    // Illinois: regula falsi on g = f − edge, halving the stale end's weight.
    let ga = fa - edge;
    let gb = fb - edge;
    let side = 0;
    for (let k = 0; k < 60 && b - a > 1e-9 * b; k++) {
      const c = (a * gb - b * ga) / (gb - ga);
      const gc = evalReading(m, row.code, row.fault, r * c, eol, alarm, sa, sb) - edge;
      if (gc >= 0) {
        b = c;
        gb = gc;
        if (side === -1) ga /= 2;
        side = -1;
      } else {
        a = c;
        ga = gc;
        if (side === 1) gb /= 2;
        side = 1;
      }
    }
    if (b < limit) limit = b;
  }
  return limit === Infinity ? null : limit;
}
