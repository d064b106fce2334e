import { under } from "@/bench/figures";
import { measuredRunLength, defaultAllowances } from "@/lib/plan/run-length";
import { snapPoint } from "@/lib/plan/snap";
import type { PlanPoint } from "@/lib/plan/geometry";

// Plan geometry on a large floor: 500 routes of 20 vertices each on a 10,000 × 7,000 px drawing. Measures
// re-measuring every route (what a recalibration does) and one snap against all of them (what each pointer move
// does while drawing). A benchmark: nothing is asserted; the target is one frame at 60 Hz.

function rng(seed: number) {
  return () => {
    seed = (seed + 0x6d2b79f5) | 0;
    let t = Math.imul(seed ^ (seed >>> 15), 1 | seed);
    t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];

export function run() {
  const rand = rng(7);
  const routes: PlanPoint[][] = Array.from({ length: 500 }, () => Array.from({ length: 20 }, () => ({ x: rand() * 10_000, y: rand() * 7_000 })));
  const scale = { metresPerPixel: 0.01 };
  const allowances = defaultAllowances(0);
  const measureAll: number[] = [];
  const snaps: number[] = [];
  let sink = 0;
  for (let i = 0; i < 50; i++) {
    const t0 = performance.now();
    for (const r of routes) {
      const m = measuredRunLength([{ points: r, scale }], allowances);
      if (m.ok) sink += m.totalM;
    }
    measureAll.push(performance.now() - t0);
    const t1 = performance.now();
    sink += snapPoint({ x: rand() * 10_000, y: rand() * 7_000 }, routes, 12).point.x;
    snaps.push(performance.now() - t1);
  }
  under("plan, re-measure 500 routes of 20 points", median(measureAll), 16.7, "ms", `median of ${measureAll.length}`);
  under("plan, one snap against 500 routes", median(snaps), 16.7, "ms", `median of ${snaps.length}`);
  console.log(`plan: re-measure 500 routes median ${median(measureAll).toFixed(3)} ms, one snap median ${median(snaps).toFixed(3)} ms (checksum ${sink.toFixed(0)})`);
}
