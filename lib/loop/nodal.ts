// A small resistor network solved by nodal analysis: the reading between two nodes with 1 A driven in.
// Used where the loop is not a series/parallel ladder (a short between two cores part-way along the run,
// a Class A loop fed from both ends). Ideal shorts (0 Ω) merge their nodes; opens (∞) are left out; a node
// not connected to the return terminal carries no current and is dropped, so the matrix is never singular.

export class Circuit {
  readonly a: number[] = [];
  readonly b: number[] = [];
  readonly r: number[] = [];
  /** Node 0 is the input's return terminal, node 1 the terminal driven. */
  nodes = 2;
  node(): number {
    return this.nodes++;
  }
  add(a: number, b: number, ohms: number): void {
    if (ohms === Infinity || a === b) return;
    this.a.push(a);
    this.b.push(b);
    this.r.push(ohms);
  }
}

function find(parent: Int32Array, x: number): number {
  while (parent[x] !== x) {
    parent[x] = parent[parent[x]];
    x = parent[x];
  }
  return x;
}

/** Resistance seen between `from` and `to`, ohms; Infinity when no path joins them. */
export function resistanceBetween(c: Circuit, from = 1, to = 0): number {
  const n = c.nodes;
  const parent = new Int32Array(n);
  for (let i = 0; i < n; i++) parent[i] = i;
  for (let e = 0; e < c.r.length; e++) if (c.r[e] === 0) parent[find(parent, c.a[e])] = find(parent, c.b[e]);
  const s = find(parent, from);
  const g = find(parent, to);
  if (s === g) return 0;

  // Each finite resistor's end nodes after merging the shorts, once (edges inside one merged node drop out).
  const m = c.r.length;
  const ea = new Int32Array(m);
  const eb = new Int32Array(m);
  const deg = new Int32Array(n + 1);
  for (let e = 0; e < m; e++) {
    ea[e] = eb[e] = -1;
    if (c.r[e] === 0) continue;
    const x = find(parent, c.a[e]);
    const y = find(parent, c.b[e]);
    if (x === y) continue;
    ea[e] = x;
    eb[e] = y;
    deg[x + 1]++;
    deg[y + 1]++;
  }
  // Adjacency in one flat array (compressed rows), for the search below.
  for (let i = 0; i < n; i++) deg[i + 1] += deg[i];
  const adj = new Int32Array(deg[n]);
  const fill = deg.slice(0, n);
  for (let e = 0; e < m; e++)
    if (ea[e] >= 0) {
      adj[fill[ea[e]]++] = eb[e];
      adj[fill[eb[e]]++] = ea[e];
    }
  // The nodes reachable from the driven terminal through finite resistors.
  const index = new Int32Array(n).fill(-1);
  const seen = new Uint8Array(n);
  const stack = new Int32Array(n);
  let top = 0;
  stack[top++] = s;
  seen[s] = 1;
  let k = 0;
  while (top > 0) {
    const x = stack[--top];
    if (x !== g) index[x] = k++;
    for (let q = deg[x]; q < deg[x + 1]; q++) {
      const y = adj[q];
      if (!seen[y]) {
        seen[y] = 1;
        stack[top++] = y;
      }
    }
  }
  if (!seen[g]) return Infinity;

  // G v = i, with the return terminal at 0 V.
  const G = new Float64Array(k * k);
  const rhs = new Float64Array(k);
  for (let e = 0; e < m; e++) {
    const x = ea[e];
    if (x < 0 || !seen[x]) continue;
    const y = eb[e];
    const gg = 1 / c.r[e];
    const ix = index[x];
    const iy = index[y];
    if (ix >= 0) G[ix * k + ix] += gg;
    if (iy >= 0) G[iy * k + iy] += gg;
    if (ix >= 0 && iy >= 0) {
      G[ix * k + iy] -= gg;
      G[iy * k + ix] -= gg;
    }
  }
  rhs[index[s]] = 1;
  // Gaussian elimination with partial pivoting.
  for (let col = 0; col < k; col++) {
    let p = col;
    for (let row = col + 1; row < k; row++) if (Math.abs(G[row * k + col]) > Math.abs(G[p * k + col])) p = row;
    if (p !== col) {
      for (let j = 0; j < k; j++) {
        const t = G[col * k + j];
        G[col * k + j] = G[p * k + j];
        G[p * k + j] = t;
      }
      const t = rhs[col];
      rhs[col] = rhs[p];
      rhs[p] = t;
    }
    const d = G[col * k + col];
    for (let row = col + 1; row < k; row++) {
      const f = G[row * k + col] / d;
      if (f === 0) continue;
      for (let j = col; j < k; j++) G[row * k + j] -= f * G[col * k + j];
      rhs[row] -= f * rhs[col];
    }
  }
  const v = new Float64Array(k);
  for (let row = k - 1; row >= 0; row--) {
    let sum = rhs[row];
    for (let j = row + 1; j < k; j++) sum -= G[row * k + j] * v[j];
    v[row] = sum / G[row * k + row];
  }
  return v[index[s]];
}
