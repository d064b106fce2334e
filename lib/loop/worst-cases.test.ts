// Worst cases an engineer checks: the longest run whatever the run entered, every state combination of a
// shared input, and findings that name the fault that matters.
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { analyzeLoop } from "./analyze-loop";
import { conductorOhmsPerM } from "./cable";
import { acceptableFor, maskOf } from "./loop-bands";
import { loopArb } from "./test-support/loop-arbitraries";
import { testInputType, testLifeSafetyInputType } from "./test-support/input-types";
import type { LoopSpec } from "./types";
import { det, loop } from "./test-support/loop-fixtures";

const withLength = (l: LoopSpec, lengthM: number): LoopSpec => ({ ...l, cable: { ...l.cable, lengthM } });
/** Indices of rows in one acceptable band on a zero-length cable: the rows the longest run is about. */
const inBandAtZero = (l: LoopSpec) =>
  analyzeLoop(withLength(l, 0), testInputType)
    .rows.map((r, i) => (!r.uncertain && (maskOf(r.reports) & ~acceptableFor(r.expected)) === 0 ? i : -1))
    .filter((i) => i >= 0);

describe("longest run", () => {
  it("does not depend on the run entered", () => {
    fc.assert(
      fc.property(loopArb, fc.double({ min: 0, max: 5000, noNaN: true }), (l, other) => {
        const a = analyzeLoop(l, testInputType).maxCableM;
        const b = analyzeLoop(withLength(l, other), testInputType).maxCableM;
        if (a === null) expect(b).toBeNull();
        else expect(b! / a).toBeCloseTo(1, 6);
      }),
      { numRuns: 200 },
    );
  });

  it("never exceeds a run whose readings have already left their band, and every reading holds up to it", () => {
    fc.assert(
      fc.property(loopArb, (l) => {
        const max = analyzeLoop(l, testInputType).maxCableM;
        const rows = inBandAtZero(l);
        const zero = analyzeLoop(withLength(l, 0), testInputType).rows;
        const here = analyzeLoop(l, testInputType).rows;
        const left = rows.some((i) => here[i].reports.join() !== zero[i].reports.join());
        if (left) expect(max!).toBeLessThanOrEqual(l.cable.lengthM * (1 + 1e-9));
        if (max === null) return;
        const below = analyzeLoop(withLength(l, max * (1 - 1e-6)), testInputType).rows;
        for (const i of rows) expect(below[i].reports).toEqual(zero[i].reports);
        const above = analyzeLoop(withLength(l, max * (1 + 1e-6)), testInputType).rows;
        expect(rows.some((i) => above[i].reports.join() !== zero[i].reports.join())).toBe(true);
      }),
      { numRuns: 150 },
    );
  });

  it("a run already too long reports the shorter limit and an error, worked by hand", () => {
    const rHot = conductorOhmsPerM({ awg: 22 }, 40);
    // rest = 2·r·L + 5.6 kΩ·1.05 + 0.05 Ω contact; it leaves "normal" at 8.4 kΩ
    const limit = (8400 - 5880 - 0.05) / (2 * rHot);
    for (const lengthM of [30, 2 * limit, 5 * limit]) {
      const a = analyzeLoop(loop({ cable: { gauge: { awg: 22 }, lengthM, tempMinC: 0, tempMaxC: 40 } }), testInputType);
      expect(a.maxCableM).toBeCloseTo(limit, 3);
      expect(a.findings.some((f) => f.code === "cable-over-limit")).toBe(lengthM > limit);
    }
  });
});

describe("shared inputs: every state combination", () => {
  const shared = (over: Partial<LoopSpec> = {}) => loop({ scheme: "shared", eolOhms: 5600, sharedOhms: [2200, 4700], detectors: [det("Hall", { tamper: true }), det("Office", { tamper: true })], ...over });

  it("equal resistors: both active reads as one active, and one detector reads as the other, each an error naming both", () => {
    // by hand: rest 5.6 kΩ; either alone 5.6 + 2.2 = 7.8 kΩ (band 6.9–9 kΩ: detector A active);
    // both 5.6 + 2.2 + 2.2 = 10 kΩ (band 9–11.5 kΩ: detector B active)
    const a = analyzeLoop(shared({ sharedOhms: [2200, 2200] }), testInputType);
    const both = a.decode!.find((d) => d.states.join() === "active,active")!;
    expect(both.report).toBe("active-b");
    expect(both.unique).toBe(false);
    const msgs = a.findings.filter((f) => f.code === "shared-state-misread" && f.severity === "error").map((f) => f.message);
    expect(msgs.some((m) => m.startsWith("both active reads as Office active"))).toBe(true);
    expect(msgs.some((m) => m.startsWith("Office active reads as Hall active"))).toBe(true);
  });

  it("any combination landing in another's band gets a finding naming both; none when each reads as itself", () => {
    const ohms = fc.constantFrom(1000, 1500, 2200, 2700, 3300, 3900, 4700, 5600);
    fc.assert(
      fc.property(ohms, ohms, fc.boolean(), (ra, rb, tamper) => {
        const a = analyzeLoop(shared({ sharedOhms: [ra, rb], detectors: [det("Hall", { tamper }), det("Office", { tamper })] }), testInputType);
        const none = a.rows.filter((r) => r.fault === "none");
        const expectedPairs = new Set<string>();
        for (const r of none) for (const o of none) if (o.expected !== r.expected && r.reports.includes(o.expected)) expectedPairs.add(`${r.states.join()}>${o.expected}`);
        const found = a.findings.filter((f) => f.code === "shared-state-misread");
        expect(found.length).toBe(expectedPairs.size);
        expect(none.length).toBe(tamper ? 9 : 4); // every combination: 3 × 3 with tampers
      }),
      { numRuns: 64 },
    );
  });
});

describe("findings that name the fault that matters", () => {
  it("a defeat quotes the short at the detector end with the detector active", () => {
    const a = analyzeLoop(loop({ placement: "at-panel" }), testInputType);
    const f = a.findings.find((x) => x.code === "short-reads-normal")!;
    expect(f.message).toMatch(/^Defeat: a short across the pair at the detector end \(Front door active\) reads .* \(normal\)$/);
  });

  it("the can't-tell-apart note names every kind of pair, the alarm and the cut among them", () => {
    const a = analyzeLoop(loop({ detectors: [det("Front door", { tamper: true })] }), testInputType);
    const f = a.findings.find((x) => x.code === "readings-indistinguishable")!;
    // single end-of-line NC: an alarm, a tamper and a cut all read above the normal band (common practice, no published source)
    expect(f.message).toMatch(/an alarm and a tamper/);
    expect(f.message).toMatch(/an alarm and a cut conductor/);
  });

  it("on a life-safety loop an alarm read as a fault is an error, with the caution", () => {
    // a normally open detector on single end-of-line: closing shorts the resistor, which this input reads as trouble
    const a = analyzeLoop(loop({ detectors: [det("Smoke", { lifeSafety: true, contact: "NO" })] }), testLifeSafetyInputType);
    const f = a.findings.find((x) => x.code === "active-misread")!;
    expect(f.severity).toBe("error");
    expect(f.why).toMatch(/authority having jurisdiction/);
    const plain = analyzeLoop(loop({ detectors: [det("Door", { contact: "NO" })] }), testInputType);
    expect(plain.findings.find((x) => x.code === "active-misread")?.severity).toBe("warning");
  });
});
