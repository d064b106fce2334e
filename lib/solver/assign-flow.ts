// Which units (a detector, or a pair on a shared input) can go to which input type, as a transport problem:
// classes of units with the same set of acceptable input types, and a number of free inputs per type.
// Solved as a maximum flow (Edmonds–Karp), so an assignment is found whenever one exists.

/**
 * `counts[c]` units of class c, `accepts[c][t]` whether class c may go to input type t, `slots[t]` inputs of type t.
 * Returns how many units of each class go to each type, or null when not all units fit.
 */
export function assignByFlow(counts: number[], accepts: boolean[][], slots: number[]): number[][] | null {
  const C = counts.length;
  const T = slots.length;
  const total = counts.reduce((a, b) => a + b, 0);
  if (total === 0) return counts.map(() => slots.map(() => 0));
  if (total > slots.reduce((a, b) => a + b, 0)) return null;
  // Nodes: 0 source, 1..C classes, C+1..C+T types, C+T+1 sink.
  const n = C + T + 2;
  const sink = n - 1;
  const cap = Array.from({ length: n }, () => new Array<number>(n).fill(0));
  for (let c = 0; c < C; c++) {
    cap[0][1 + c] = counts[c];
    for (let t = 0; t < T; t++) if (accepts[c][t]) cap[1 + c][1 + C + t] = counts[c];
  }
  for (let t = 0; t < T; t++) cap[1 + C + t][sink] = slots[t];
  const flow = Array.from({ length: n }, () => new Array<number>(n).fill(0));
  let sent = 0;
  for (;;) {
    const prev = new Array<number>(n).fill(-1);
    prev[0] = 0;
    const queue = [0];
    while (queue.length && prev[sink] < 0) {
      const u = queue.shift()!;
      for (let v = 0; v < n; v++)
        if (prev[v] < 0 && cap[u][v] - flow[u][v] > 0) {
          prev[v] = u;
          queue.push(v);
        }
    }
    if (prev[sink] < 0) break;
    let push = Infinity;
    for (let v = sink; v !== 0; v = prev[v]) push = Math.min(push, cap[prev[v]][v] - flow[prev[v]][v]);
    for (let v = sink; v !== 0; v = prev[v]) {
      flow[prev[v]][v] += push;
      flow[v][prev[v]] -= push;
    }
    sent += push;
  }
  if (sent < total) return null;
  return counts.map((_, c) => slots.map((_, t) => Math.max(0, flow[1 + c][1 + C + t])));
}
