// Matching a meter reading taken at commissioning against the analysed rows.
import type { LoopAnalysis } from "./types";

/** Indices of the rows whose interval holds `ohms`, widened by `slackPct` for the meter's own accuracy. */
export function rowsMatchingReading(analysis: LoopAnalysis, ohms: number, slackPct = 0): number[] {
  const out: number[] = [];
  const k = slackPct / 100;
  analysis.rows.forEach((r, i) => {
    if (ohms >= r.minOhms * (1 - k) && ohms <= r.maxOhms * (1 + k)) out.push(i);
  });
  return out;
}
