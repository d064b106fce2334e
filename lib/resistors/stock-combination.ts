// Make an odd resistor value from stock E12/E24 parts: the best 1-, 2- or 3-part series/parallel network.
// Exhaustive over pairs; the third part is found by binary search beside the ideal value, because the
// network's resistance is monotone in that part, so the best stock part is one of the two neighbours.
import { seriesValues, STOCK_MAX_OHMS, STOCK_MIN_OHMS, type ESeriesName } from "./e-series";
import { formatOhms } from "./format-ohms";

export type CombinationTopology =
  | "single" // R1
  | "series" // R1 + R2
  | "parallel" // R1 ∥ R2
  | "series-3" // R1 + R2 + R3
  | "parallel-3" // R1 ∥ R2 ∥ R3
  | "series-pair-in-parallel" // (R1 + R2) ∥ R3
  | "parallel-pair-in-series"; // (R1 ∥ R2) + R3

export interface StockCombination {
  ohms: number;
  /** Signed deviation from the target, percent. */
  errorPct: number;
  parts: number[];
  topology: CombinationTopology;
  /** e.g. "(4.7 kΩ + 820 Ω) ∥ 10 kΩ" */
  expression: string;
}

export interface StockOptions {
  series?: ESeriesName;
  /** Acceptable deviation from the target, percent (default 1). */
  tolerancePct?: number;
  /** 1, 2 or 3 (default 3). */
  maxParts?: 1 | 2 | 3;
  /** Search 3-part networks even when 2 parts already meet the tolerance. */
  exhaustive?: boolean;
  minOhms?: number;
  maxOhms?: number;
}

export interface StockSolution {
  targetOhms: number;
  series: ESeriesName;
  tolerancePct: number;
  /** Fewest parts that meet the tolerance (then smallest error); null if none does. */
  best: StockCombination | null;
  /** The closest network for 1, 2 and 3 parts (null where not searched). */
  byParts: [StockCombination, StockCombination | null, StockCombination | null];
}

function build(target: number, ohms: number, parts: number[], topology: CombinationTopology): StockCombination {
  const f = parts.map(formatOhms);
  const expression =
    topology === "single"
      ? f[0]
      : topology === "series" || topology === "series-3"
        ? f.join(" + ")
        : topology === "parallel" || topology === "parallel-3"
          ? f.join(" ∥ ")
          : topology === "series-pair-in-parallel"
            ? `(${f[0]} + ${f[1]}) ∥ ${f[2]}`
            : `(${f[0]} ∥ ${f[1]}) + ${f[2]}`;
  return { ohms, errorPct: ((ohms - target) / target) * 100, parts, topology, expression };
}

/** Index of the first value ≥ x. */
function lowerBound(v: readonly number[], x: number): number {
  let lo = 0;
  let hi = v.length;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (v[mid] < x) lo = mid + 1;
    else hi = mid;
  }
  return lo;
}

const par = (a: number, b: number) => (a * b) / (a + b);

export function combineFromStock(targetOhms: number, options: StockOptions = {}): StockSolution {
  if (!(targetOhms > 0) || !Number.isFinite(targetOhms)) throw new RangeError("target must be a positive, finite resistance");
  const series = options.series ?? "E24";
  const tol = options.tolerancePct ?? 1;
  const maxParts = options.maxParts ?? 3;
  const v = seriesValues(series, options.minOhms ?? STOCK_MIN_OHMS, options.maxOhms ?? STOCK_MAX_OHMS);
  const n = v.length;
  const t = targetOhms;
  const g = 1 / t;

  // Best per part count, tracked as plain numbers to keep the inner loops allocation-free.
  let bestErr = Infinity;
  let bestOhms = 0;
  let bestTopo: CombinationTopology = "single";
  let b1 = 0;
  let b2 = 0;
  let b3 = 0;
  const consider = (ohms: number, topo: CombinationTopology, p1: number, p2: number, p3: number) => {
    const e = Math.abs(ohms - t);
    if (e < bestErr) {
      bestErr = e;
      bestOhms = ohms;
      bestTopo = topo;
      b1 = p1;
      b2 = p2;
      b3 = p3;
    }
  };
  // Candidates either side of an ideal third value x; `make` turns a stock value into the network's ohms.
  const near = (x: number, topo: CombinationTopology, p1: number, p2: number, make: (r: number) => number) => {
    const k = lowerBound(v, x);
    if (k < n) consider(make(v[k]), topo, p1, p2, v[k]);
    if (k > 0) consider(make(v[k - 1]), topo, p1, p2, v[k - 1]);
  };

  // One part.
  near(t, "single", 0, 0, (r) => r);
  const one = build(t, bestOhms, [b3], "single");
  const ok = (c: StockCombination | null) => c !== null && Math.abs(c.errorPct) <= tol + 1e-12;
  const result = (best: StockCombination | null, two: StockCombination | null, three: StockCombination | null): StockSolution => ({
    targetOhms: t,
    series,
    tolerancePct: tol,
    best,
    byParts: [one, two, three],
  });
  if (maxParts === 1) return result(ok(one) ? one : null, null, null);

  // Two parts.
  bestErr = Infinity;
  for (let i = 0; i < n; i++) {
    const a = v[i];
    if (a < t) near(t - a, "series", a, 0, (r) => a + r);
    if (a > t) near(1 / (g - 1 / a), "parallel", a, 0, (r) => par(a, r));
  }
  const two = bestErr < Infinity ? build(t, bestOhms, [b1, b3], bestTopo) : null;
  if (maxParts === 2 || ((ok(one) || ok(two)) && !options.exhaustive)) return result(ok(one) ? one : ok(two) ? two : null, two, null);

  // Three parts: every pair (i ≤ j), the third by search.
  bestErr = Infinity;
  for (let i = 0; i < n; i++) {
    const a = v[i];
    for (let j = i; j < n; j++) {
      const b = v[j];
      const s = a + b;
      const p = par(a, b);
      if (s < t) near(t - s, "series-3", a, b, (r) => s + r);
      else near(1 / (g - 1 / s), "series-pair-in-parallel", a, b, (r) => par(s, r));
      if (p < t) near(t - p, "parallel-pair-in-series", a, b, (r) => p + r);
      const rest = g - 1 / a - 1 / b;
      if (rest > 0) near(1 / rest, "parallel-3", a, b, (r) => par(p, r));
    }
  }
  const three = bestErr < Infinity ? build(t, bestOhms, [b1, b2, b3], bestTopo) : null;
  const best = ok(one) ? one : ok(two) ? two : ok(three) ? three : null;
  return result(best, two, three);
}
