// Series and parallel combination of resistances, ohms. An open is Infinity, a dead short is 0.

/** Two resistances in series. */
export function series2(a: number, b: number): number {
  return a + b;
}

/** Two resistances in parallel; a 0 Ω branch shorts the pair, an open (Infinity) branch drops out. */
export function parallel2(a: number, b: number): number {
  if (a === 0 || b === 0) return 0;
  if (a === Infinity) return b;
  if (b === Infinity) return a;
  return (a * b) / (a + b);
}

export function series(...rs: number[]): number {
  let sum = 0;
  for (const r of rs) sum += r;
  return sum;
}

export function parallel(...rs: number[]): number {
  let acc = Infinity;
  for (const r of rs) acc = parallel2(acc, r);
  return acc;
}
