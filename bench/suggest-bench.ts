import { shippedCatalog } from "@/lib/catalog/shipped";
import type { Schedule, SupervisionPreference } from "@/lib/schedule/schema";
import { suggestHardware } from "@/lib/solver/suggest";
import { suggestExact, type ExactProfile } from "@/lib/solver/suggest-exact";
import { highsSolver } from "@/lib/solver/highs-loader";

// Hardware suggestion on the shipped catalog: the exact model (HiGHS) beside the older search, on the same
// 20 pseudo-random schedules of 5 to 120 detectors (fixed seed), with prices side by side and the times per size,
// and where the model's time goes. The older search knows no areas, so the model is asked for one area here.

function rng(seed: number) {
  // mulberry32, so every run sees the same schedules
  return () => {
    seed |= 0;
    seed = (seed + 0x6d2b79f5) | 0;
    let t = Math.imul(seed ^ (seed >>> 15), 1 | seed);
    t = (t + Math.imul(t ^ (t >>> 7), 61 | t)) ^ t;
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

const KINDS = ["contact-door-surface", "contact-window-recessed", "motion-wall", "motion-dual", "glass-break-acoustic", "panic-button-no", "water-probe-no", "smoke-4wire-no", "heat-fixed-no"];
const SUPERVISION: SupervisionPreference[] = ["double-eol", "single-eol", "shared-ok", "none"];

function schedule(r: () => number, n: number): Schedule {
  const pick = <T,>(xs: readonly T[]) => xs[Math.floor(r() * xs.length)];
  return Array.from({ length: n }, (_, i) => ({ id: `d${i}`, label: `Detector ${i + 1}`, catalogId: pick(KINDS), area: pick(["Ground", "First", "Store"]), room: pick(["Hall", "Office", "Plant"]), cableM: 5 + Math.floor(r() * 90), gauge: { awg: 22 }, supervision: pick(SUPERVISION) }));
}

const ms = (t: number) => `${t.toFixed(0)} ms`;
const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor((xs.length - 1) / 2)];

export async function run() {
  const catalog = shippedCatalog().catalog;
  let t = performance.now();
  const highs = await highsSolver();
  console.log(`HiGHS (WebAssembly) loaded in ${ms(performance.now() - t)}`);
  const r = rng(17);
  const sizes = Array.from({ length: 20 }, (_, i) => 5 + Math.round((i * 115) / 19));
  const rows: { n: number; shared: boolean; oldCost: string; newCost: string; oldMs: number; newMs: number; newCpuMs: number; proof: string }[] = [];
  const profile: ExactProfile = { tablesMs: 0, modelMs: 0, solveMs: 0, checkMs: 0 };
  for (const [i, n] of sizes.entries()) {
    const s = schedule(r, n);
    const shared = i % 2 === 1;
    t = performance.now();
    const old = suggestHardware(s, catalog, { allowShared: shared });
    const oldMs = performance.now() - t;
    t = performance.now();
    // CPU time of this process as well: on a machine shared with other work, wall time mostly measures the others
    const cpu0 = process.cpuUsage();
    const ex = suggestExact(highs, s, catalog, { allowShared: shared, areas: "none", profile });
    const newMs = performance.now() - t;
    const cpu = process.cpuUsage(cpu0);
    const newCpuMs = (cpu.user + cpu.system) / 1000;
    const proof = ex.proof.method === "search-fallback" ? `fallback: ${ex.proof.fallbackReason}` : ex.proof.optimal ? "proven" : `gap ${(ex.proof.gap * 100).toFixed(1)} %`;
    rows.push({ n, shared, oldCost: old.found ? String(old.cost) : "none", newCost: ex.found ? String(ex.cost) : "none", oldMs, newMs, newCpuMs, proof });
  }
  console.log("| detectors | shared | old cost | new cost | old time | new time | model |");
  console.log("| ---: | --- | ---: | ---: | ---: | ---: | --- |");
  for (const x of rows) console.log(`| ${x.n} | ${x.shared ? "yes" : "no"} | ${x.oldCost} | ${x.newCost} | ${ms(x.oldMs)} | ${ms(x.newMs)} | ${x.proof} |`);
  console.log("\n| detectors | old median | old worst | new median | new worst | new median CPU | new worst CPU |");
  console.log("| --- | ---: | ---: | ---: | ---: | ---: | ---: |");
  for (const [lo, hi] of [
    [5, 30],
    [31, 60],
    [61, 120],
    [5, 120],
  ] as const) {
    const g = rows.filter((x) => x.n >= lo && x.n <= hi);
    console.log(`| ${lo}–${hi} (${g.length}) | ${ms(median(g.map((x) => x.oldMs)))} | ${ms(Math.max(...g.map((x) => x.oldMs)))} | ${ms(median(g.map((x) => x.newMs)))} | ${ms(Math.max(...g.map((x) => x.newMs)))} | ${ms(median(g.map((x) => x.newCpuMs)))} | ${ms(Math.max(...g.map((x) => x.newCpuMs)))} |`);
  }
  const total = rows.reduce((n, x) => n + x.newMs, 0);
  const share = (v: number) => `${ms(v)} (${((v / total) * 100).toFixed(0)} %)`;
  console.log(`\nexact model, all 20 schedules, ${ms(total)}: loop tables ${share(profile.tablesMs)}, writing the models ${share(profile.modelMs)}, HiGHS ${share(profile.solveMs)}, building and checking the layout ${share(profile.checkMs)}`);
  const num = (c: string) => (c === "none" ? NaN : Number(c));
  const dearer = rows.filter((x) => num(x.newCost) > num(x.oldCost) + 0.001).length;
  const cheaper = rows.filter((x) => x.newCost !== "none" && (x.oldCost === "none" || num(x.newCost) < num(x.oldCost) - 0.001)).length;
  console.log(`\nnew dearer than old: ${dearer} of ${rows.length}; new cheaper or found where old found none: ${cheaper}`);
}
