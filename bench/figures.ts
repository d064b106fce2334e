// The one table `npm run bench` ends with: every bench records its figures here beside their targets, and
// bench/run.ts prints them together (a figure a bench did not run this time is listed as not measured).
// Targets are the project's own goals for this two-core machine; nothing is asserted.

export interface Figure {
  /** What was measured, as a reader of the table would say it. */
  name: string;
  value: number | null;
  unit: "ms" | "s" | "×" | "count";
  /** The target as written in the table, e.g. "< 10 ms". */
  target: string;
  met: boolean | null;
  /** How it was measured (median of n, p95 over a run...). */
  how?: string;
}

const KEY = Symbol.for("loopwright.benchFigures");
const holder = globalThis as typeof globalThis & { [KEY]?: Figure[] };
const figures = () => (holder[KEY] ??= []);

export function record(f: Figure): void {
  figures().push(f);
}

/** Shorthand for a figure that must stay under a limit. */
export function under(name: string, value: number, limit: number, unit: Figure["unit"], how?: string): void {
  record({ name, value, unit, target: `< ${limit} ${unit}`, met: Number.isFinite(value) ? value < limit : null, how });
}

/** Every target of the performance goals, in the order the table lists them; their figures are recorded by the benches. */
export const TARGET_ROWS = [
  "loop engine, whole 1,000-detector layout, input-pair faults",
  "loop engine vs ngspice, per loop",
  "solver, full solve, 1,000 detectors / 60 boards",
  "solver, re-solve after moving one detector",
  "one 500-detector layout read alone",
  "one 500-detector layout read alone (server CPU)",
  "one 500-detector layout save alone",
  "one 500-detector layout save alone (server CPU)",
  "50 clients, 30 s: reads p95",
  "50 clients, 30 s: saves p95",
  "50 clients, 30 s: errors",
  "50 clients, 30 s: lost or doubled saves",
  "layout read during 4 sheet PDFs + 2 suggestions, p95",
  "500-detector terminal sheet PDF, uncached",
  "editor 1,000 detectors: keyboard pick-up to paint",
  "editor 1,000 detectors: keyboard arrow to paint",
  "editor 1,000 detectors: keyboard drop to paint",
  "editor 1,000 detectors: longest task while dragging",
  "editor 1,000 detectors: frames over 16.7 ms while dragging",
  "editor 1,000 detectors: main thread quiet after navigation",
] as const;

function show(v: number | null, unit: Figure["unit"]): string {
  if (v === null || !Number.isFinite(v)) return "—";
  if (unit === "count") return String(v);
  if (unit === "×") return `${Math.round(v)} ×`;
  return `${v < 10 ? v.toFixed(2) : v < 100 ? v.toFixed(1) : Math.round(v)} ${unit}`;
}

export function printTable(): void {
  const got = figures();
  const rows: Figure[] = [...got];
  for (const name of TARGET_ROWS) if (!got.some((f) => f.name === name)) rows.push({ name, value: null, unit: "ms", target: "", met: null, how: "not measured in this run" });
  const order = (f: Figure) => {
    const i = (TARGET_ROWS as readonly string[]).indexOf(f.name);
    return i < 0 ? TARGET_ROWS.length : i;
  };
  rows.sort((x, y) => order(x) - order(y));
  console.log("\n== targets ==");
  console.log("| figure | measured | target | met | how |");
  console.log("| --- | ---: | ---: | --- | --- |");
  for (const f of rows) console.log(`| ${f.name} | ${show(f.value, f.unit)} | ${f.target} | ${f.met === null ? "—" : f.met ? "yes" : "no"} | ${f.how ?? ""} |`);
}
