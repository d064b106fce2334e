// Loop engine speed on a 1,000-detector layout, and a sample checked against the ngspice referee.
// Prints figures; targets (layout < 10 ms median, ≥ 1000× faster per loop than the referee) are not asserted.
import { Simulation } from "eecircuit-engine";
import { analyzeLoop } from "@/lib/loop/analyze-loop";
import { reportsOf } from "@/lib/loop/loop-bands";
import { buildLoopNetlist, ohmsFromResult, type SpiceCase } from "@/lib/loop/spice-netlist";
import { testInputType } from "@/lib/loop/test-support/input-types";
import type { LoopDetector, LoopSpec } from "@/lib/loop/types";

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

export async function run(): Promise<void> {
  const loops = generateLayoutLoops(1000);
  const detectors = loops.reduce((n, l) => n + l.detectors.length, 0);
  const rows = loops.reduce((n, l) => n + analyzeLoop(l, testInputType).rows.length, 0);
  for (let i = 0; i < 30; i++) for (const l of loops) analyzeLoop(l, testInputType); // warm up
  const times: number[] = [];
  for (let k = 0; k < 60; k++) {
    const t0 = performance.now();
    for (const l of loops) analyzeLoop(l, testInputType);
    times.push(performance.now() - t0);
  }
  const layoutMs = median(times);
  const perLoopUs = (layoutMs * 1000) / loops.length;
  console.log(`layout: ${loops.length} loops, ${detectors} detectors, ${rows} readings`);
  console.log(`engine: median ${layoutMs.toFixed(2)} ms per layout (min ${Math.min(...times).toFixed(2)}, max ${Math.max(...times).toFixed(2)}), ${perLoopUs.toFixed(2)} µs per loop  [target < 10 ms]`);

  // Referee on a sample: one netlist per loop holding every row at the low end, high end and nominal.
  const sample = loops.filter((_, i) => i % Math.ceil(loops.length / 50) === 0).slice(0, 50);
  // The engine on the same sample, in steady state: whole sample per run, median over runs, per loop.
  const sampleTimes: number[] = [];
  for (let k = 0; k < 300; k++) {
    const e0 = performance.now();
    for (const loop of sample) analyzeLoop(loop, testInputType);
    sampleTimes.push((performance.now() - e0) / sample.length);
  }
  const sim = new Simulation();
  const t0 = performance.now();
  await sim.start();
  const startMs = performance.now() - t0;
  let compared = 0;
  let readingMismatch = 0;
  let reportMismatch = 0;
  let worstRel = 0;
  const spiceTimes: number[] = [];
  for (const loop of sample) {
    const a = analyzeLoop(loop, testInputType);
    const tol = loop.tolerancePct / 100;
    const mid = (loop.cable.tempMinC + loop.cable.tempMaxC) / 2;
    const cases: SpiceCase[] = a.rows.flatMap((r) => [
      { states: r.states, fault: r.fault, tempC: loop.cable.tempMinC, partFactor: 1 - tol },
      { states: r.states, fault: r.fault, tempC: loop.cable.tempMaxC, partFactor: 1 + tol },
      { states: r.states, fault: r.fault, tempC: mid, partFactor: 1 },
    ]);
    const s0 = performance.now();
    const { netlist, probes } = buildLoopNetlist(loop, cases, testInputType);
    sim.setNetList(netlist);
    const result = await sim.runSim();
    const spice = probes.map((p) => ohmsFromResult(result, p));
    spiceTimes.push(performance.now() - s0);
    const bands = testInputType.bands[loop.scheme]!;
    a.rows.forEach((r, i) => {
      const [lo, hi] = [spice[3 * i], spice[3 * i + 1]];
      const loS = lo > 1e9 ? Infinity : lo;
      const hiS = hi > 1e9 ? Infinity : hi;
      for (const [e, s] of [
        [r.minOhms, loS],
        [r.maxOhms, hiS],
      ]) {
        if (e === Infinity || s === Infinity) {
          if (e !== s) readingMismatch++;
          continue;
        }
        compared++;
        const rel = Math.abs(e - s) / Math.abs(e || 1);
        worstRel = Math.max(worstRel, rel);
        if (rel > 1e-4) readingMismatch++;
      }
      if (reportsOf(bands, loS, hiS).join() !== r.reports.join()) reportMismatch++;
    });
  }
  const spicePerLoopMs = median(spiceTimes);
  const enginePerLoopUs = median(sampleTimes) * 1000;
  console.log(`referee: ngspice (eecircuit-engine) start ${startMs.toFixed(0)} ms; ${sample.length} loops, median ${spicePerLoopMs.toFixed(2)} ms per loop`);
  console.log(`sample engine: median ${enginePerLoopUs.toFixed(2)} µs per loop; per-loop speed ratio ${((spicePerLoopMs * 1000) / enginePerLoopUs).toFixed(0)}×  [target ≥ 1000×]`);
  console.log(`agreement: ${compared} finite readings compared, worst relative difference ${worstRel.toExponential(2)}, ${readingMismatch} readings beyond 0.01 %, ${reportMismatch} rows whose reports differ`);
}
