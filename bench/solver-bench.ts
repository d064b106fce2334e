import { under } from "@/bench/figures";
import { catalogFileSchema, type Catalog } from "@/lib/catalog/schema";
import { assign, findDetector, type LayoutContext } from "@/lib/layout/operations";
import type { LayoutBoard, LayoutDocument, LayoutInput } from "@/lib/layout/schema";
import type { Schedule } from "@/lib/schedule/schema";
import { createSolver, solveLayout } from "@/lib/solver";
import { fixtureCatalogInput } from "@/lib/solver/testing/fixture-catalog";

// Solver speed on a large site: 1,000 detectors on a panel and 60 boards (50 sixteen-input expansion boards,
// 8 keypads, 2 power supplies), some inputs shared. Full solve from empty caches, then one detector moved.

function benchCatalog(): Catalog {
  const c = structuredClone(fixtureCatalogInput);
  c.panels.push({ ...c.panels[1], id: "bench-panel", name: "Bench panel", maxZones: 1100, bus: { maxDevices: 64, addressMin: 1, addressMax: 64, maxCableM: 1200 }, auxOutputMa: 20000, maxBatteryAh: 400 });
  c.expansionBoards.push({ ...c.expansionBoards[1], id: "bench-exp-16", name: "Bench expansion 16", inputs: { count: 16, inputType: "fx-shared" }, ownSupply: { outputMa: 2000, maxBatteryAh: 40 } });
  return catalogFileSchema.parse(c);
}

/** A deterministic pseudo-random sequence (mulberry32), so every run solves the same site. */
function rng(seed: number) {
  return () => {
    seed |= 0;
    seed = (seed + 0x6d2b79f5) | 0;
    let t = Math.imul(seed ^ (seed >>> 15), 1 | seed);
    t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

export function benchSite(): { catalog: Catalog; schedule: Schedule; layout: LayoutDocument } {
  const catalog = benchCatalog();
  const rand = rng(42);
  const kinds = ["fx-door", "fx-door", "fx-pir", "fx-pir", "fx-pir-hungry"];
  const schedule: Schedule = Array.from({ length: 1000 }, (_, i) => ({
    id: `d${i}`,
    label: `Detector ${i}`,
    catalogId: kinds[Math.floor(rand() * kinds.length)],
    area: `Floor ${Math.floor(i / 100)}`,
    room: `Room ${Math.floor(i / 8)}`,
    cableM: 5 + Math.floor(rand() * 115),
    gauge: rand() < 0.8 ? { awg: 22 } : { mm2: 0.5 },
    supervision: rand() < 0.3 ? "shared-ok" : "double-eol",
  }));
  const boards: LayoutBoard[] = [];
  for (let i = 0; i < 50; i++) boards.push({ key: `e${i}`, kind: "expansion", catalogId: "bench-exp-16", busAddress: i + 1 });
  for (let i = 0; i < 8; i++) boards.push({ key: `k${i}`, kind: "keypad", catalogId: "fx-keypad", busAddress: 51 + i });
  for (let i = 0; i < 2; i++) boards.push({ key: `s${i}`, kind: "supply", catalogId: "fx-psu-2a", busAddress: 59 + i });
  // 816 inputs: the panel's 16 and 50 × 16; 184 of them shared so that all 1,000 detectors are placed.
  const slots = [{ boardKey: "panel", count: 16 }, ...boards.filter((b) => b.kind === "expansion").map((b) => ({ boardKey: b.key, count: 16 }))].flatMap((s) =>
    Array.from({ length: s.count }, (_, i) => ({ boardKey: s.boardKey, input: i + 1 })),
  );
  const inputs: LayoutInput[] = [];
  let next = 0;
  let pairsLeft = 1000 - slots.length;
  for (const slot of slots) {
    if (next >= schedule.length) break;
    const pair = pairsLeft > 0 && next + 1 < schedule.length;
    const ids = pair ? [schedule[next].id, schedule[next + 1].id] : [schedule[next].id];
    if (pair) pairsLeft--;
    next += ids.length;
    inputs.push({ ...slot, detectorIds: ids, scheme: pair ? "shared" : "double-eol", placement: "at-detector" });
  }
  const layout: LayoutDocument = { panelId: "bench-panel", boards, inputs, power: { standbyProfileId: "intruder-grade-2", safetyFactor: 1.2 }, busCableM: 800 };
  return { catalog, schedule, layout };
}

/** This thread's CPU time, ms, where the runtime offers it: on a busy machine wall time also counts waiting for a core. */
function cpuMs(): number {
  const p = (globalThis as { process?: { cpuUsage?: () => { user: number; system: number } } }).process;
  const u = p?.cpuUsage?.();
  return u ? (u.user + u.system) / 1000 : NaN;
}

const median = (xs: number[]) => {
  const s = [...xs].sort((a, b) => a - b);
  return s.length % 2 ? s[(s.length - 1) / 2] : (s[s.length / 2 - 1] + s[s.length / 2]) / 2;
};

export interface SolverBenchFigures {
  detectors: number;
  boards: number;
  inputs: number;
  findings: number;
  fullSolveMedianMs: number;
  moveSolveMedianMs: number;
  /** The same, in CPU time (NaN where the runtime cannot tell). */
  fullSolveCpuMedianMs: number;
  moveSolveCpuMedianMs: number;
  runs: { full: number; move: number };
}

export function run(opts: { fullRuns?: number; moveRuns?: number; print?: boolean } = {}): SolverBenchFigures {
  const fullRuns = opts.fullRuns ?? 40;
  const moveRuns = opts.moveRuns ?? 200;
  const { catalog, schedule, layout } = benchSite();
  const ctx: LayoutContext = { schedule, catalog };

  for (let i = 0; i < 5; i++) solveLayout(layout, schedule, catalog); // warm the JIT
  const full: number[] = [];
  const fullCpu: number[] = [];
  let findings = 0;
  for (let i = 0; i < fullRuns; i++) {
    const c0 = cpuMs();
    const t0 = performance.now();
    const r = solveLayout(layout, schedule, catalog); // a fresh solver: empty caches
    full.push(performance.now() - t0);
    fullCpu.push(cpuMs() - c0);
    findings = r.findings.length;
  }

  // Move one detector at a time into the free input of a board, a different detector each time, on a warm solver.
  const solver = createSolver(schedule, catalog);
  let doc = layout;
  solver.solve(doc);
  const moves: number[] = [];
  const movesCpu: number[] = [];
  const freeBoard = { boardKey: "e49", input: 16 };
  doc = { ...doc, inputs: doc.inputs.filter((i) => !(i.boardKey === freeBoard.boardKey && i.input === freeBoard.input)) };
  solver.solve(doc);
  for (let i = 0; i < moveRuns; i++) {
    const id = schedule[(i * 7) % 600].id;
    const from = findDetector(doc, id);
    if (!from || from.input.detectorIds.length !== 1) continue;
    const free = doc.inputs.some((x) => x.boardKey === freeBoard.boardKey && x.input === freeBoard.input) ? { boardKey: from.input.boardKey, input: from.input.input } : freeBoard;
    const e = assign(doc, ctx, id, free);
    if (!e.ok) continue;
    doc = e.layout;
    const c0 = cpuMs();
    const t0 = performance.now();
    solver.solve(doc);
    moves.push(performance.now() - t0);
    movesCpu.push(cpuMs() - c0);
    // put it back through the editor too, so the next move starts from a layout with one free input
    doc = assign(doc, ctx, id, { boardKey: from.input.boardKey, input: from.input.input }).layout;
    solver.solve(doc);
  }

  const figures: SolverBenchFigures = {
    detectors: schedule.length,
    boards: layout.boards.length,
    inputs: layout.inputs.length,
    findings,
    fullSolveMedianMs: median(full),
    moveSolveMedianMs: median(moves),
    fullSolveCpuMedianMs: median(fullCpu),
    moveSolveCpuMedianMs: median(movesCpu),
    runs: { full: full.length, move: moves.length },
  };
  if (opts.print !== false) {
    under("solver, full solve, 1,000 detectors / 60 boards", figures.fullSolveMedianMs, 10, "ms", `median of ${figures.runs.full}, empty caches; CPU ${figures.fullSolveCpuMedianMs.toFixed(2)} ms`);
    under("solver, re-solve after moving one detector", figures.moveSolveMedianMs, 1, "ms", `median of ${figures.runs.move}, warm solver; CPU ${figures.moveSolveCpuMedianMs.toFixed(2)} ms`);
  }
  if (opts.print !== false)
    console.log(
      `solver: ${figures.detectors} detectors, ${figures.boards} boards, ${figures.inputs} used inputs, ${figures.findings} findings\n` +
        `  full solve (empty caches): median ${figures.fullSolveMedianMs.toFixed(2)} ms wall, ${figures.fullSolveCpuMedianMs.toFixed(2)} ms CPU over ${figures.runs.full} runs (target < 10 ms)\n` +
        `  re-solve after moving one detector: median ${figures.moveSolveMedianMs.toFixed(2)} ms wall, ${figures.moveSolveCpuMedianMs.toFixed(2)} ms CPU over ${figures.runs.move} runs (target < 1 ms)`,
    );
  return figures;
}
