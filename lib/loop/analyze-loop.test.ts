import { describe, expect, it } from "vitest";
import { analyzeLoop } from "./analyze-loop";
import { conductorOhmsPerM } from "./cable";
import { readingAt } from "./loop-model";
import { testInputType, testLifeSafetyInputType } from "./test-support/input-types";
import type { LoopSpec } from "./types";
import { det, loop } from "./test-support/loop-fixtures";

const codes = (a: ReturnType<typeof analyzeLoop>) => a.findings.map((f) => f.code);
const target = { kind: "input" as const, boardKey: "panel", input: 3 };

describe("analyzeLoop verdicts", () => {
  it("single EOL NC at the detector: shorts detected, a cut reads as alarm (mistaken, not a tamper)", () => {
    const a = analyzeLoop(loop(), testInputType, target);
    expect(a.valid).toBe(true);
    expect(a.faults).toEqual({ "short-panel": "detected", "short-detector": "detected", cut: "mistaken" });
    expect(codes(a)).toContain("cut-misread");
    expect(a.findings.every((f) => f.target === target && f.why.length > 20)).toBe(true);
    const cut = a.rows.findIndex((r) => r.fault === "cut");
    const active = a.rows.findIndex((r) => r.fault === "none" && r.states[0] === "active");
    expect(a.indistinguishable).toContainEqual([Math.min(cut, active), Math.max(cut, active)]);
  });

  it("findings default to the layout target", () => {
    expect(analyzeLoop(loop(), testInputType).findings[0].target).toEqual({ kind: "layout" });
  });

  it("NO contact with the resistor at the panel: a cut reads normal (defeat)", () => {
    const a = analyzeLoop(loop({ placement: "at-panel", detectors: [det("Hall", { contact: "NO" })] }), testInputType);
    expect(a.faults.cut).toBe("defeat");
    expect(codes(a)).toContain("cut-reads-normal");
  });

  it("no end-of-line resistor, NC: a short reads normal (defeat)", () => {
    const a = analyzeLoop(loop({ scheme: "none" }), testInputType);
    expect(a.faults["short-panel"]).toBe("defeat");
    expect(a.findings.find((f) => f.code === "short-reads-normal")?.severity).toBe("error");
  });

  it("wrong resistor value: what the panel reads at rest", () => {
    const close = analyzeLoop(loop({ eolOhms: 4700 }), testInputType);
    const f = close.findings.find((x) => x.code === "resistor-value-mismatch")!;
    expect(f.severity).toBe("warning"); // 4.7 kΩ still reads normal on these bands
    expect(f.message).toMatch(/4\.7 kΩ.*5\.6 kΩ.*normal/);
    const far = analyzeLoop(loop({ eolOhms: 2200 }), testInputType);
    expect(far.findings.find((x) => x.code === "resistor-value-mismatch")?.severity).toBe("error");
    expect(far.rows[0].reports).toEqual(["short"]);
    expect(codes(far)).toContain("rest-not-normal");
  });

  it("a value outside E12/E24 gets the nearest preferred values; colour codes for every resistor", () => {
    const a = analyzeLoop(loop({ scheme: "double-eol", eolOhms: 5000, alarmOhms: 5600 }), testInputType);
    expect(a.resistors.map((r) => r.role)).toEqual(["eol", "alarm"]);
    expect(a.resistors[0].preferred).toEqual({ series: null, nearest: [4700, 5100] });
    expect(a.resistors[1].bands).toEqual(["green", "blue", "red", "gold"]); // IEC 60062
    const note = a.findings.find((f) => f.code === "resistor-not-preferred")!;
    expect(note.message).toMatch(/4\.7 kΩ or 5\.1 kΩ/);
    const onePct = analyzeLoop(loop({ tolerancePct: 1 }), testInputType);
    expect(onePct.resistors[0].bands).toEqual(["green", "blue", "black", "brown", "brown"]); // IEC 60062, 5-band 1 %
  });

  it("NO contact on double end-of-line reads as alarm at rest", () => {
    const a = analyzeLoop(loop({ scheme: "double-eol", detectors: [det("Hall", { contact: "NO" })] }), testInputType);
    expect(a.rows[0].reports).toEqual(["active"]);
    expect(a.findings.find((f) => f.code === "rest-not-normal")?.why).toMatch(/normally open/);
  });

  it("several contacts in series: bounded states, not 3ⁿ", () => {
    const detectors = Array.from({ length: 6 }, (_, i) => det(`Window ${i + 1}`, { tamper: i % 2 === 0 }));
    const a = analyzeLoop(loop({ detectors }), testInputType);
    expect(a.rows.length).toBe((1 + 6 + 1 + 3) * 4);
    expect(a.rows[0].reports).toEqual(["normal"]);
  });

  it("parts straddling a band edge are uncertain with zero margin", () => {
    // 8.2 kΩ at 10 % spans 7.38–9.02 kΩ across the 8.4 kΩ edge
    const a = analyzeLoop(loop({ eolOhms: 8200, tolerancePct: 10 }), testInputType);
    expect(a.rows[0].uncertain).toBe(true);
    expect(a.rows[0].reports).toEqual(["normal", "active"]);
    expect(a.rows[0].marginOhms).toBe(0);
    expect(codes(a)).toContain("reading-uncertain");
    expect(codes(a)).toContain("tolerance-wider");
  });

  it("longest run: the rest reading reaches the top of the normal band", () => {
    const spec = loop({ detectors: [det("Door", { tamper: true })] });
    const a = analyzeLoop(spec, testInputType);
    const rHot = conductorOhmsPerM({ awg: 22 }, 40);
    // rest = 2·r·L + 5.6 kΩ·1.05 + two closed contacts; it leaves "normal" at 8.4 kΩ
    const expected = (8400 - 5880 - 2 * 0.05) / (2 * rHot);
    expect(a.maxCableM).toBeCloseTo(expected, 3);
    expect(a.maxCableByLoopOhmsM).toBeCloseTo(100 / (2 * rHot), 9);
    const lb = analyzeLoop({ ...spec, placement: "loop-back" }, testInputType);
    expect(lb.maxCableM).toBeCloseTo((8400 - 5880 - 2 * 0.05) / (4 * rHot), 3);
  });

  it("longest run for a parallel (NO) loop found by search lands on the band edge", () => {
    const spec = loop({ detectors: [det("A", { contact: "NO" }), det("B", { contact: "NO" })] });
    const a = analyzeLoop(spec, testInputType);
    expect(a.maxCableM).not.toBeNull();
    const at = readingAt(spec, ["rest", "rest"], "none", { tempC: 40, eolOhms: 5600 * 1.05, lengthM: a.maxCableM! }, testInputType);
    expect(at).toBeCloseTo(8400, 4);
  });

  it("cable beyond the input's loop-resistance limit", () => {
    const a = analyzeLoop(loop({ cable: { gauge: { awg: 24 }, lengthM: 800, tempMinC: 0, tempMaxC: 40 } }), testInputType);
    expect(codes(a)).toContain("loop-ohms-over-limit");
  });

  it("impossible loops are reported, not analysed", () => {
    const a = analyzeLoop(loop({ scheme: "shared", sharedOhms: [2200, 4700] }), testInputType);
    expect(a.valid).toBe(false);
    expect(a.rows).toEqual([]);
    expect(a.findings[0]).toMatchObject({ code: "loop-invalid", severity: "error" });
    expect(a.findings[0].message).toMatch(/exactly two detectors/);
  });
});

describe("shared inputs", () => {
  const shared = (over: Partial<LoopSpec> = {}) => loop({ scheme: "shared", eolOhms: 5600, sharedOhms: [2200, 4700], detectors: [det("Hall"), det("Office", { tamper: true })], ...over });

  it("decode table of the four states, unique for 2.2 kΩ / 4.7 kΩ", () => {
    const a = analyzeLoop(shared(), testInputType);
    expect(a.decode!.map((d) => [d.states.join("+"), d.report, d.unique])).toEqual([
      ["rest+rest", "normal", true],
      ["active+rest", "active-a", true],
      ["rest+active", "active-b", true],
      ["active+active", "active-both", true],
    ]);
    // 5.6 kΩ + 4.7 kΩ = 10.3 kΩ nominal for detector B alone
    expect(a.decode![2].minOhms).toBeLessThan(10_300);
    expect(a.decode![2].maxOhms).toBeGreaterThan(10_300);
    expect(a.sharedLost!.join(" ")).toMatch(/cut cable or either detector's tamper opens the whole input/);
    expect(a.findings.find((f) => f.code === "shared-supervision-lost")?.severity).toBe("warning");
  });

  it("equal resistors can't be decoded", () => {
    const a = analyzeLoop(shared({ sharedOhms: [3300, 3300] }), testInputType);
    expect(a.decode!.filter((d) => !d.unique).length).toBeGreaterThanOrEqual(2);
    expect(a.findings.find((f) => f.code === "shared-decode-ambiguous")?.severity).toBe("error");
  });

  it("a life-safety device on a shared input is an error, with the usual caution", () => {
    const a = analyzeLoop(shared({ detectors: [det("Hall"), det("Smoke", { lifeSafety: true })] }), testInputType);
    const f = a.findings.find((x) => x.code === "life-safety-shared")!;
    expect(f.severity).toBe("error");
    expect(f.why).toMatch(/authority having jurisdiction/);
    expect(f.why).toMatch(/licensed practice/);
  });

  it("a life-safety loop must report every fault as itself", () => {
    const smoke = [det("Smoke", { lifeSafety: true })];
    const ok = analyzeLoop(loop({ scheme: "double-eol", detectors: smoke }), testLifeSafetyInputType);
    expect(codes(ok).filter((c) => c.startsWith("life-safety"))).toEqual([]);
    const bad = analyzeLoop(loop({ scheme: "single-eol", placement: "at-panel", detectors: smoke }), testLifeSafetyInputType);
    expect(codes(bad)).toContain("life-safety-unsupervised");
  });
});
