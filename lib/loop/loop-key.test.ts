import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { analyzeLoop } from "./analyze-loop";
import { LoopAnalysisMemo, loopSpecKey } from "./loop-key";
import { loopJsonReplacer } from "./loop-json";
import { loopArb } from "./test-support/loop-arbitraries";
import { testInputType } from "./test-support/input-types";
import type { LoopSpec } from "./types";

const json = (x: unknown) => JSON.stringify(x, loopJsonReplacer);

/** One field changed at a time: every input of the analysis. */
const mutations: ((l: LoopSpec) => LoopSpec)[] = [
  (l) => ({ ...l, placement: l.placement === "at-detector" ? "at-panel" : "at-detector" }),
  (l) => ({ ...l, eolOhms: (l.eolOhms ?? 5600) * 1.1 }),
  (l) => ({ ...l, alarmOhms: (l.alarmOhms ?? 5600) * 1.1 }),
  (l) => ({ ...l, sharedOhms: [(l.sharedOhms?.[0] ?? 2200) + 100, l.sharedOhms?.[1] ?? 4700] }),
  (l) => ({ ...l, tolerancePct: l.tolerancePct + 1 }),
  (l) => ({ ...l, cable: { ...l.cable, lengthM: l.cable.lengthM + 7 } }),
  (l) => ({ ...l, cable: { ...l.cable, tempMaxC: l.cable.tempMaxC + 5 } }),
  (l) => ({ ...l, cable: { ...l.cable, tempMinC: l.cable.tempMinC - 5 } }),
  (l) => ({ ...l, cable: { ...l.cable, gauge: "awg" in l.cable.gauge ? { mm2: 0.22 } : { awg: 22 } } }),
  (l) => ({ ...l, contactOhms: l.contactOhms + 0.5 }),
  (l) => ({ ...l, shortOhms: (l.shortOhms ?? 0) + 3 }),
  (l) => ({ ...l, detectors: l.detectors.map((d, i) => (i === 0 ? { ...d, label: `${d.label}x` } : d)) }),
  (l) => ({ ...l, detectors: l.detectors.map((d, i) => (i === 0 ? { ...d, tamper: !d.tamper } : d)) }),
  (l) => ({ ...l, detectors: l.detectors.map((d) => ({ ...d, contact: d.contact === "NC" ? "NO" : "NC" })) }),
  (l) => ({ ...l, detectors: l.detectors.map((d, i) => (i === 0 ? { ...d, lifeSafety: !d.lifeSafety } : d)) }),
  (l) => ({ ...l, conductorFaults: [{ kind: "open", core: "blue", atM: l.cable.lengthM / 3 }] }),
  (l) => ({ ...l, pathway: "class-a" }),
];

describe("the canonical loop key", () => {
  it("whenever a change of one field changes the analysis, it changes the key", () => {
    let changed = 0;
    fc.assert(
      fc.property(loopArb, fc.integer({ min: 0, max: mutations.length - 1 }), (loop, k) => {
        const other = mutations[k](loop);
        if (json(analyzeLoop(loop, testInputType)) !== json(analyzeLoop(other, testInputType))) {
          changed++;
          expect(loopSpecKey(other)).not.toBe(loopSpecKey(loop));
        }
      }),
      { numRuns: 400, seed: 28 },
    );
    expect(changed).toBeGreaterThan(200);
  });

  it("the memo gives the analysis a fresh call gives, and analyses a repeated loop once", () => {
    const memo = new LoopAnalysisMemo();
    const loops = fc.sample(loopArb, { numRuns: 30, seed: 7 });
    for (const l of loops) expect(json(memo.analyze(l, testInputType))).toBe(json(analyzeLoop(l, testInputType)));
    memo.endGeneration();
    // a copy of each loop (a new object with the same content) is found, not analysed again
    for (const l of loops) memo.analyze(structuredClone(l), testInputType);
    expect(memo.misses).toBe(0);
    expect(memo.hits).toBe(new Set(loops.map(loopSpecKey)).size);
    // a target changes the findings' target, so it is part of the key
    const t = { kind: "input" as const, boardKey: "panel", input: 3 };
    expect(memo.analyze(loops[0], testInputType, t).findings.every((f) => f.target === t)).toBe(true);
  });

  it("forgets loops no pass used in the last two generations", () => {
    const memo = new LoopAnalysisMemo();
    const [a, b] = fc.sample(loopArb, { numRuns: 2, seed: 3 });
    memo.analyze(a, testInputType);
    memo.endGeneration();
    memo.analyze(b, testInputType);
    memo.endGeneration();
    memo.endGeneration();
    memo.analyze(a, testInputType);
    expect(memo.misses).toBe(1);
  });
});
