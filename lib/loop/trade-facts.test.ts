// Facts every installer knows from the meter, checked on the engine's intervals.
import { describe, expect, it } from "vitest";
import { analyzeLoop } from "./analyze-loop";
import { reportOf } from "./loop-bands";
import { testAlarmBothSidesInputType, testInputType } from "./test-support/input-types";
import type { LoopSpec, Reading } from "./types";

const door = { label: "Front door", contact: "NC" as const, tamper: false, lifeSafety: false };
const loop = (over: Partial<LoopSpec> = {}): LoopSpec => ({
  scheme: "single-eol",
  placement: "at-detector",
  detectors: [door],
  eolOhms: 5600,
  tolerancePct: 5,
  cable: { gauge: { awg: 22 }, lengthM: 20, tempMinC: 0, tempMaxC: 40 },
  contactOhms: 0.05,
  ...over,
});
const row = (rows: Reading[], states: string[], fault: Reading["fault"]) => rows.find((r) => r.fault === fault && r.states.join() === states.join())!;
const about = (r: Reading, ohms: number, pct: number) => {
  expect(r.minOhms).toBeGreaterThanOrEqual(ohms * (1 - pct / 100));
  expect(r.maxOhms).toBeLessThanOrEqual(ohms * (1 + pct / 100));
};
const nearZero = (r: Reading) => expect(r.maxOhms).toBeLessThan(10);

describe("trade facts", () => {
  it("5.6 kΩ in series at an NC contact: 5.6 kΩ closed, ∞ open, ~0 Ω for a short anywhere along the cable", () => {
    // common practice, no published source
    const a = analyzeLoop(loop(), testInputType);
    about(row(a.rows, ["rest"], "none"), 5600, 5.1);
    expect(row(a.rows, ["active"], "none").minOhms).toBe(Infinity);
    nearZero(row(a.rows, ["rest"], "short-panel"));
    nearZero(row(a.rows, ["rest"], "short-detector"));
    expect(a.faults["short-panel"]).toBe("detected");
    expect(a.faults["short-detector"]).toBe("detected");
  });

  it("5.6 kΩ across an NO contact: 5.6 kΩ at rest, ~0 Ω when it closes, ∞ only when the cable is cut", () => {
    // common practice, no published source
    const a = analyzeLoop(loop({ detectors: [{ ...door, contact: "NO" }] }), testAlarmBothSidesInputType);
    about(row(a.rows, ["rest"], "none"), 5600, 5.1);
    nearZero(row(a.rows, ["active"], "none"));
    for (const r of a.rows) expect(r.maxOhms === Infinity).toBe(r.fault === "cut");
    expect(reportOf(testAlarmBothSidesInputType.bands["single-eol"]!, row(a.rows, ["active"], "none").maxOhms)).toBe("active");
  });

  it("resistor at the panel end: a short along the cable reads the same as normal", () => {
    // common practice, no published source
    const a = analyzeLoop(loop({ placement: "at-panel" }), testInputType);
    const rest = row(a.rows, ["rest"], "none");
    for (const f of ["short-panel", "short-detector"] as const) {
      expect(row(a.rows, ["rest"], f).reports).toEqual(rest.reports);
      expect(a.faults[f]).toBe("defeat");
    }
    expect(rest.reports).toEqual(["normal"]);
    expect(a.findings.some((f) => f.code === "short-reads-normal" && f.severity === "error")).toBe(true);
  });

  it("a loop-back resistor at the panel still reveals the short, over twice the conductor", () => {
    // common practice, no published source
    const direct = analyzeLoop(loop(), testInputType);
    const lb = analyzeLoop(loop({ placement: "loop-back" }), testInputType);
    expect(lb.faults["short-panel"]).toBe("detected");
    expect(lb.faults["short-detector"]).toBe("detected");
    expect(lb.conductorOhms!.maxOhms).toBeCloseTo(2 * direct.conductorOhms!.maxOhms, 9);
    const extra = row(lb.rows, ["rest"], "none").maxOhms - row(direct.rows, ["rest"], "none").maxOhms;
    expect(extra).toBeCloseTo(direct.conductorOhms!.maxOhms, 9);
  });

  it("double end-of-line 5.6 kΩ + 5.6 kΩ: ~0 short, 5.6 kΩ closed, 11.2 kΩ open, ∞ cut; 11 kΩ on a meter is within tolerance", () => {
    // common practice, no published source
    const a = analyzeLoop(loop({ scheme: "double-eol", alarmOhms: 5600 }), testInputType);
    nearZero(row(a.rows, ["rest"], "short-detector"));
    about(row(a.rows, ["rest"], "none"), 5600, 5.1);
    const open = row(a.rows, ["active"], "none");
    about(open, 11_200, 5.1);
    expect(row(a.rows, ["rest"], "cut").minOhms).toBe(Infinity);
    expect(open.reports).toEqual(["active"]);
    const bands = testInputType.bands["double-eol"]!;
    expect(reportOf(bands, 11_000)).toBe("active");
    expect(Math.abs(11_000 / 11_200 - 1) * 100).toBeLessThan(testInputType.tolerancePct);
    expect(a.faults).toEqual({ "short-panel": "detected", "short-detector": "detected", cut: "detected" });
  });

  it("5.6 kΩ parts measure about 5.51–5.55 kΩ, inside the 5 % interval", () => {
    // common practice, no published source
    const a = analyzeLoop(loop({ cable: { gauge: { awg: 22 }, lengthM: 0, tempMinC: 20, tempMaxC: 20 }, contactOhms: 0 }), testInputType);
    const rest = row(a.rows, ["rest"], "none");
    expect(rest.minOhms).toBeLessThanOrEqual(5510);
    expect(rest.maxOhms).toBeGreaterThanOrEqual(5550);
    expect(rest.minOhms).toBeCloseTo(5320, 9);
    expect(rest.maxOhms).toBeCloseTo(5880, 9);
  });

  it("a short through the cable measures about 0.9–1.3 Ω on a typical run", () => {
    // common practice, no published source: e.g. 10 m of 22 AWG, or 15 m of 0.5 mm², 0–40 °C
    for (const cable of [
      { gauge: { awg: 22 }, lengthM: 10, tempMinC: 0, tempMaxC: 40 },
      { gauge: { mm2: 0.5 }, lengthM: 15, tempMinC: 0, tempMaxC: 40 },
    ]) {
      const r = row(analyzeLoop(loop({ cable }), testInputType).rows, ["rest"], "short-detector");
      expect(r.minOhms).toBeGreaterThanOrEqual(0.9);
      expect(r.maxOhms).toBeLessThanOrEqual(1.3);
    }
  });
});
