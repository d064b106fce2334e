// Pairs of rows the panel can't tell apart: rows (i < j) that can give the same report while expecting different
// ones, counted as they are found by the two kinds of situation they mix up (for the findings' wording).
export interface PairGroups {
  /** Every pair, i ascending, then j ascending. */
  pairs: Array<[number, number]>;
  /** Pairs per (situation a, situation b), a ≤ b, at index a × n + b. */
  counts: Int32Array;
  /** The first pair of each group, as row indices. */
  firstI: Int32Array;
  firstJ: Int32Array;
}

// Reused by every call: the counts are read before the analysis that made them returns.
const shared: Omit<PairGroups, "pairs"> = { counts: new Int32Array(0), firstI: new Int32Array(0), firstJ: new Int32Array(0) };

/**
 * Every indistinguishable pair given each row's report mask, expected report bit and situation (`sit[row]` in
 * 0..n−1). A row whose interval stays in one band pairs only with the rows touching that band, walked from a list
 * per report; a row straddling bands (rare) is compared with every later row. The counts are overwritten by the
 * next call: read them at once.
 */
export function indistinguishableGroups(masks: readonly number[], exp: ArrayLike<number>, sit: ArrayLike<number>, n: number): PairGroups {
  if (shared.counts.length !== n * n) {
    shared.counts = new Int32Array(n * n);
    shared.firstI = new Int32Array(n * n);
    shared.firstJ = new Int32Array(n * n);
  } else shared.counts.fill(0);
  const { counts, firstI, firstJ } = shared;
  const pairs: Array<[number, number]> = [];
  const nRows = masks.length;
  const byBit: number[][] = [];
  const next: number[] = []; // single-band rows: where the rows after it start in its band's list
  for (let i = 0; i < nRows; i++) {
    const mi = masks[i];
    next.push(0);
    for (let b = 0; 1 << b <= mi; b++)
      if (mi & (1 << b)) {
        const list = (byBit[b] ??= []);
        list.push(i);
        next[i] = list.length;
      }
  }
  for (let i = 0; i < nRows; i++) {
    const mi = masks[i];
    const ei = exp[i];
    if (mi === 0) continue;
    if ((mi & (mi - 1)) === 0) {
      const list = byBit[31 - Math.clz32(mi)];
      for (let k = next[i]; k < list.length; k++) if (ei !== exp[list[k]]) addPair(pairs, counts, firstI, firstJ, sit, n, i, list[k]);
    } else for (let j = i + 1; j < nRows; j++) if ((mi & masks[j]) !== 0 && ei !== exp[j]) addPair(pairs, counts, firstI, firstJ, sit, n, i, j);
  }
  return { pairs, counts, firstI, firstJ };
}

/** Records pair (i, j) and counts it under its two situations (a ≤ b at a × n + b), keeping the first of each. */
function addPair(pairs: Array<[number, number]>, counts: Int32Array, firstI: Int32Array, firstJ: Int32Array, sit: ArrayLike<number>, n: number, i: number, j: number): void {
  pairs.push([i, j]);
  const a = sit[i];
  const b = sit[j];
  const k = a < b ? a * n + b : b * n + a;
  if (counts[k]++ === 0) {
    firstI[k] = i;
    firstJ[k] = j;
  }
}
