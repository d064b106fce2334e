// Loop engine speed on a 1,000-detector layout, with and without conductor-level faults, and the same loops
// against the ngspice referee (eecircuit-engine), per loop on the same rows, with the reports compared.
// Prints figures against the targets (whole layout, input-pair faults, under 3 ms median; at least 5,000×
// faster per loop than ngspice); nothing is asserted.
import { Simulation } from "eecircuit-engine";
import { record, under } from "@/bench/figures";
import { analyzeLoop } from "@/lib/loop/analyze-loop";
import { reportsOf } from "@/lib/loop/loop-bands";
import { LoopAnalysisMemo } from "@/lib/loop/loop-key";
import { buildLoopNetlist, ohmsFromResult, type SpiceCase } from "@/lib/loop/spice-netlist";
import { testInputType } from "@/lib/loop/test-support/input-types";
import type { ConductorReading, LoopAnalysis, LoopDetector, LoopSpec } from "@/lib/loop/types";

function rng(seed: number) {
  let s = seed >>> 0;
  return () => {
    s = (s + 0x6d2b79f5) >>> 0;
    let t = s;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** A layout's worth of loops holding `detectors` detectors: every scheme, placement and contact type, shared inputs. */
export function generateLayoutLoops(detectors = 1000, seed = 1): LoopSpec[] {
  const r = rng(seed);
  const pick = <T>(xs: readonly T[]) => xs[Math.floor(r() * xs.length)];
  const loops: LoopSpec[] = [];
  let count = 0;
  while (count < detectors) {
    const u = r();
    const kind = u < 0.3 ? "seol-nc" : u < 0.4 ? "seol-no" : u < 0.6 ? "deol" : u < 0.75 ? "shared" : u < 0.85 ? "series" : u < 0.9 ? "none" : u < 0.95 ? "at-panel" : "loop-back";
    const n = kind === "shared" ? 2 : kind === "series" ? 3 + Math.floor(r() * 4) : 1;
    const contact = kind === "seol-no" || (kind === "none" && r() < 0.5) ? "NO" : "NC";
    const dets: LoopDetector[] = Array.from({ length: n }, (_, i) => ({ label: `D${count + i + 1}`, contact, tamper: r() < 0.6, lifeSafety: false }));
    const scheme = kind === "shared" ? "shared" : kind === "deol" ? "double-eol" : kind === "none" ? "none" : "single-eol";
    loops.push({
      scheme,
      placement: kind === "at-panel" ? "at-panel" : kind === "loop-back" ? "loop-back" : "at-detector",
      detectors: dets,
      eolOhms: scheme === "none" ? undefined : pick([5600, 5600, 5600, 4700, 2200]),
      alarmOhms: scheme === "double-eol" ? 5600 : undefined,
      sharedOhms: scheme === "shared" ? [2200, 4700] : undefined,
      tolerancePct: pick([1, 5, 5, 5]),
      cable: { gauge: pick([{ awg: 22 }, { awg: 24 }, { mm2: 0.22 }, { mm2: 0.5 }]), lengthM: 5 + r() * 295, tempMinC: 0, tempMaxC: 40 },
      contactOhms: 0.02 + r() * 0.2,
      shortOhms: 0.01 + r() * 0.5,
    });
    count += n;
  }
  return loops;
}

const median = (xs: number[]) => {
  const s = [...xs].sort((a, b) => a - b);
  return s.length % 2 ? s[(s.length - 1) / 2] : (s[s.length / 2 - 1] + s[s.length / 2]) / 2;
};

/**
 * Wall time of `fn` over `runs` runs after `warm` unmeasured ones, ms, and the process's CPU time per run: on a
 * machine shared with other work the wall-time median includes waiting for a core, the CPU time does not.
 */
function timeIt(fn: (k: number) => void, runs: number, warm: number): { median: number; min: number; max: number; cpuMedian: number } {
  for (let k = 0; k < warm; k++) fn(k);
  const t: number[] = [];
  const cpu: number[] = [];
  for (let k = 0; k < runs; k++) {
    const c0 = process.cpuUsage();
    const t0 = performance.now();
    fn(k);
    t.push(performance.now() - t0);
    const c = process.cpuUsage(c0);
    cpu.push((c.user + c.system) / 1000);
  }
  return { median: median(t), min: Math.min(...t), max: Math.max(...t), cpuMedian: median(cpu) };
}

const ms = (x: number) => `${x.toFixed(2)} ms`;
const met = (ok: boolean) => (ok ? "met" : "NOT met");

/** The same loops with every conductor fault enumerated (the engine enumerates "all" up to 8 detectors). */
const withConductorFaults = (l: LoopSpec): LoopSpec => ({ ...l, conductorFaults: l.detectors.length <= 8 ? "all" : undefined });

interface RowCase {
  row: Omit<ConductorReading, never>;
  base: Omit<SpiceCase, "tempC" | "partFactor">;
}

/** Every row of an analysis (input-pair rows, and each conductor fault's rows) with how to build it in SPICE. */
function rowCases(a: LoopAnalysis): RowCase[] {
  const out: RowCase[] = a.rows.map((r) => ({ row: r, base: { states: r.states, fault: r.fault } }));
  for (const f of a.conductors?.faults ?? []) for (const r of f.rows) out.push({ row: r, base: { states: r.states, fault: "none", conductorFault: f.fault } });
  return out;
}

interface Agreement {
  rows: number;
  compared: number;
  readingMismatch: number;
  reportMismatch: number;
  worstRel: number;
  spiceMs: number[];
}

async function referee(sim: Simulation, sample: LoopSpec[]): Promise<Agreement> {
  const g: Agreement = { rows: 0, compared: 0, readingMismatch: 0, reportMismatch: 0, worstRel: 0, spiceMs: [] };
  for (const loop of sample) {
    const a = analyzeLoop(loop, testInputType);
    const tol = loop.tolerancePct / 100;
    const rows = rowCases(a);
    g.rows += rows.length;
    const cases: SpiceCase[] = rows.flatMap(({ base }) => [
      { ...base, tempC: loop.cable.tempMinC, partFactor: 1 - tol },
      { ...base, tempC: loop.cable.tempMaxC, partFactor: 1 + tol },
    ]);
    const s0 = performance.now();
    const { netlist, probes } = buildLoopNetlist(loop, cases, testInputType);
    sim.setNetList(netlist);
    const result = await sim.runSim();
    const spice = probes.map((p) => ohmsFromResult(result, p));
    g.spiceMs.push(performance.now() - s0);
    const bands = testInputType.bands[loop.scheme]!;
    rows.forEach(({ row: r }, i) => {
      // an open reads through the 1e12 Ω stand-ins only
      const loS = spice[2 * i] > 1e9 ? Infinity : spice[2 * i];
      const hiS = spice[2 * i + 1] > 1e9 ? Infinity : spice[2 * i + 1];
      for (const [e, s] of [
        [r.minOhms, loS],
        [r.maxOhms, hiS],
      ]) {
        if (e === Infinity || s === Infinity) {
          if (e !== s) g.readingMismatch++;
          continue;
        }
        g.compared++;
        const rel = Math.abs(e - s) / Math.abs(e || 1);
        g.worstRel = Math.max(g.worstRel, rel);
        if (rel > 1e-4) g.readingMismatch++;
      }
      if (reportsOf(bands, loS, hiS).join() !== r.reports.join()) g.reportMismatch++;
    });
  }
  return g;
}

export async function run(): Promise<void> {
  const loops = generateLayoutLoops(1000);
  const faulty = loops.map(withConductorFaults);
  const detectors = loops.reduce((n, l) => n + l.detectors.length, 0);
  const rows = loops.reduce((n, l) => n + analyzeLoop(l, testInputType).rows.length, 0);
  const cRows = faulty.reduce((n, l) => n + (analyzeLoop(l, testInputType).conductors?.faults.reduce((m, f) => m + f.rows.length, 0) ?? 0), 0);
  console.log(`layout: ${loops.length} loops, ${detectors} detectors; ${rows} input-pair rows, ${cRows} more with every conductor fault`);

  // Cold: every loop analysed from scratch. Warm: the editor's re-solve after one edit, through the canonical-key
  // memo (one loop changed per pass, so one analysis and ${loops.length - 1} look-ups).
  const cold = timeIt(() => {
    for (const l of loops) analyzeLoop(l, testInputType);
  }, 200, 20);
  const memo = new LoopAnalysisMemo();
  const warm = timeIt(
    (k) => {
      const edited = k % loops.length;
      for (let i = 0; i < loops.length; i++) memo.analyze(i === edited ? { ...loops[i], cable: { ...loops[i].cable, lengthM: loops[i].cable.lengthM + 1 + k } } : loops[i], testInputType);
      memo.endGeneration();
    },
    200,
    20,
  );
  const coldC = timeIt(() => {
    for (const l of faulty) analyzeLoop(l, testInputType);
  }, 7, 2);
  console.log(`engine, input-pair faults, cold (every loop analysed): median ${ms(cold.median)} per layout (min ${ms(cold.min)}, max ${ms(cold.max)}; CPU time median ${ms(cold.cpuMedian)})  [target < 3 ms median: ${met(cold.median < 3)}]`);
  console.log(`engine, input-pair faults, re-solve after one edit (canonical-key memo): median ${ms(warm.median)} per layout (min ${ms(warm.min)}, max ${ms(warm.max)}; CPU time median ${ms(warm.cpuMedian)})  [target < 3 ms median: ${met(warm.median < 3)}]`);
  under("loop engine, whole 1,000-detector layout, input-pair faults", cold.median, 3, "ms", `median of 200, cold; after one edit ${ms(warm.median)}`);
  console.log(`engine, with every conductor fault, cold: median ${ms(coldC.median)} per layout (min ${ms(coldC.min)}, max ${ms(coldC.max)}; CPU time median ${ms(coldC.cpuMedian)})  [no target; printed for comparison]`);

  // Referee on a sample of the same loops: one netlist per loop holding every row at the low and high end.
  const sample = loops.filter((_, i) => i % Math.ceil(loops.length / 40) === 0).slice(0, 40);
  const sampleC = sample.map(withConductorFaults);
  const perLoop = (ls: LoopSpec[], runs: number) =>
    (timeIt(() => {
      for (const l of ls) analyzeLoop(l, testInputType);
    }, runs, 5).median *
      1000) /
    ls.length;
  const engineUs = perLoop(sample, 300);
  const engineCUs = perLoop(sampleC, 15);
  const sim = new Simulation();
  const t0 = performance.now();
  await sim.start();
  console.log(`referee: ngspice (eecircuit-engine) started in ${(performance.now() - t0).toFixed(0)} ms; ${sample.length} loops of the layout`);
  for (const [what, ls, us] of [
    ["input-pair faults", sample, engineUs],
    ["with every conductor fault", sampleC, engineCUs],
  ] as const) {
    const g = await referee(sim, ls);
    const spiceMs = median(g.spiceMs);
    const ratio = (spiceMs * 1000) / us;
    console.log(`${what}: ${g.rows} rows; ngspice median ${ms(spiceMs)} per loop, engine ${us.toFixed(2)} µs per loop: ${ratio.toFixed(0)}× faster  [target ≥ 5000×: ${met(ratio >= 5000)}]`);
    if (what === "input-pair faults")
      record({ name: "loop engine vs ngspice, per loop", value: ratio, unit: "×", target: "≥ 5000 ×", met: ratio >= 5000, how: `${sample.length} loops, medians; worst relative difference ${g.worstRel.toExponential(1)}` });
    console.log(`  agreement: ${g.compared} finite readings compared, worst relative difference ${g.worstRel.toExponential(2)}, ${g.readingMismatch} beyond 0.01 %, ${g.reportMismatch} rows whose reports differ`);
  }
}
