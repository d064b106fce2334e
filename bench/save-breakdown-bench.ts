import { record } from "@/bench/figures";
import { shippedCatalog } from "@/lib/catalog/shipped";
import { saveLayoutSchema } from "@/lib/layout/layout-request-schema";
import { summarizeSolve } from "@/lib/layout/layout-summary";
import { solveLayout } from "@/lib/solver";
import { solveLayoutKept } from "@/lib/server/solver-cache";
import { largeLayoutDocument, largeSchedule } from "@/tests/api-registry/large-layout";

// Where one 500-detector save spends its CPU before the database sees it: the body's JSON parse, the
// request schema, the server's solve and summary, and the JSON the revision row stores. Same layout as the
// load bench (the shipped catalog's large family, one detector per input). Figures only, no targets: the
// target for the whole save is in the load bench's rows.

const DETECTORS = 500;
const RUNS = 30;

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)];
}

function timeIt<T>(fn: () => T): { ms: number; value: T } {
  const t0 = process.hrtime.bigint();
  const value = fn();
  return { ms: Number(process.hrtime.bigint() - t0) / 1e6, value };
}

export async function run(): Promise<void> {
  const { catalog } = shippedCatalog();
  const schedule = largeSchedule(DETECTORS);
  const body = JSON.stringify({ version: 1, document: largeLayoutDocument(schedule.map((d) => d.id)) });
  const steps: Record<string, number[]> = { "JSON.parse of the body": [], "request schema (zod)": [], "solve (solveLayout)": [], "summary of the solve": [], "JSON.stringify of document and summary": [] };
  for (let i = 0; i < RUNS + 3; i++) {
    const parsed = timeIt(() => JSON.parse(body) as unknown);
    const input = timeIt(() => saveLayoutSchema.parse(parsed.value));
    const solved = timeIt(() => solveLayout(input.value.document, schedule, catalog));
    const summary = timeIt(() => summarizeSolve(input.value.document, solved.value));
    const stored = timeIt(() => JSON.stringify(input.value.document).length + JSON.stringify(summary.value).length);
    if (i < 3) continue; // warm-up
    steps["JSON.parse of the body"].push(parsed.ms);
    steps["request schema (zod)"].push(input.ms);
    steps["solve (solveLayout)"].push(solved.ms);
    steps["summary of the solve"].push(summary.ms);
    steps["JSON.stringify of document and summary"].push(stored.ms);
  }
  // The server keeps each layout's solver between its saves: a save that swaps two detectors re-analyses two inputs.
  const doc = largeLayoutDocument(schedule.map((d) => d.id));
  const swapped = { ...doc, inputs: doc.inputs.map((inp, i) => (i === 0 ? { ...inp, detectorIds: doc.inputs[1].detectorIds } : i === 1 ? { ...inp, detectorIds: doc.inputs[0].detectorIds } : inp)) };
  const kept: number[] = [];
  for (let i = 0; i < RUNS + 3; i++) {
    const t = timeIt(() => solveLayoutKept(1, i % 2 ? swapped : doc, schedule, catalog));
    if (i >= 3) kept.push(t.ms);
  }
  const total = Object.values(steps).reduce((sum, xs) => sum + median(xs), 0);
  console.log(`one ${DETECTORS}-detector save before the database, ${(body.length / 1024).toFixed(0)} KiB body, medians of ${RUNS}:`);
  for (const [step, xs] of Object.entries(steps)) console.log(`  ${step}: ${median(xs).toFixed(2)} ms (${((median(xs) / total) * 100).toFixed(0)} %)`);
  console.log(`  sum: ${total.toFixed(2)} ms`);
  console.log(`the same save with the layout's kept solver (two detectors swapped since its last save): solve median ${median(kept).toFixed(2)} ms`);
  record({ name: "one 500-detector save, CPU before the database", value: Number(total.toFixed(2)), unit: "ms", target: "no target", met: null, how: `sum of step medians of ${RUNS}; solve ${median(steps["solve (solveLayout)"]).toFixed(1)} ms of it, ${median(kept).toFixed(1)} ms with the kept solver` });
}

if (import.meta.url === `file://${process.argv[1]}`) await run();
