import { describe, expect, it } from "vitest";
import { shippedCatalog } from "@/lib/catalog/shipped";
import { conductorOhmsPerM } from "@/lib/loop";
import { buildTerminalSheet } from "@/lib/sheet/build-sheet";
import type { SheetInput } from "@/lib/sheet/sheet-types";
import { midLayout, midSchedule } from "@/lib/sheet/testing/sample-layouts";
import { diagnoseLoopOf, diagnoseReading, holds, restingResistorOhms, TRADE_RULE_SOURCE, usualValuesOf, type MeasuredReading } from "@/lib/commissioning/diagnose";

const { catalog } = shippedCatalog();
const sheet = buildTerminalSheet(midLayout, midSchedule, catalog);
const row = (boardKey: string, input: number) => sheet.boards.flatMap((b) => b.rows).find((r): r is SheetInput => !r.spare && r.boardKey === boardKey && r.input === input)!;
// Panel input 1: Front door, NC with tamper, double end-of-line 4.7 kΩ + 4.7 kΩ at the detector, 25 m of 22 AWG.
const door = diagnoseLoopOf(row("panel", 1));
// Panel input 2: Lobby motion, NC with tamper, single end-of-line 4.7 kΩ as a loop-back resistor, 40 m of 22 AWG.
const pir = diagnoseLoopOf(row("panel", 2));
// Panel input 3: Desk panic button, NO, single end-of-line 4.7 kΩ across the contact.
const panic = diagnoseLoopOf(row("panel", 3));
const ohms = (x: number): MeasuredReading => ({ kind: "ohms", ohms: x });
const open: MeasuredReading = { kind: "open" };
const usualValues = usualValuesOf(catalog);
const codes = (v: ReturnType<typeof diagnoseReading>) => v.diagnoses.map((d) => d.code);

describe("classifying a reading", () => {
  it("passes a reading inside the expected range, with the meter's allowance", () => {
    // 4.7 kΩ + 2 × 25 m × 0.053 Ω/m (22 AWG, ASTM B258: 16.1 Ω per 1000 ft) + two closed contacts ≈ 4.703 kΩ
    const v = diagnoseReading(door, "rest", ohms(4703));
    expect(v).toMatchObject({ verdict: "pass", diagnoses: [] });
    expect(v.summary).toMatch(/^Pass: 4\.7 kΩ, expected 4\.47–4\.94 kΩ/);
    const rest = door.expected.find((e) => e.test === "rest")!;
    expect(holds(rest, ohms(rest.maxOhms * 1.009))).toBe(true); // within 1 % of the top
    expect(holds(rest, ohms(rest.maxOhms * 1.02))).toBe(false);
  });
  it("passes an open cut test and the short test's few ohms", () => {
    expect(diagnoseReading(door, "cut", open).verdict).toBe("pass");
    // short at the far end: only the two conductors remain, 2 × 25 m × 0.053 Ω/m ≈ 2.6 Ω
    expect(diagnoseReading(door, "short", ohms(2.7)).verdict).toBe("pass");
  });
  it("names the other test a failed reading matches", () => {
    // 9.4 kΩ at rest on a 4.7 kΩ + 4.7 kΩ double end-of-line loop is the alarm reading: both resistors in series
    const v = diagnoseReading(door, "rest", ohms(9400));
    expect(v.verdict).toBe("fail");
    expect(v.matches).toEqual(["active"]);
    expect(v.diagnoses[0].text).toMatch(/^It reads like Front door active\. The detector may be in alarm/);
  });
  it("marks every diagnosis as a trade rule", () => {
    for (const v of [diagnoseReading(door, "rest", ohms(9400)), diagnoseReading(door, "rest", open), diagnoseReading(door, "short", ohms(4700))])
      for (const d of v.diagnoses) expect(d.source).toBe(TRADE_RULE_SOURCE);
  });
  it("refuses a test the loop does not have", () => {
    expect(() => diagnoseReading(panic, "tamper", ohms(1))).toThrow(/no "tamper" test/);
  });
});

// Trade rules of thumb, each with a hand-worked example (common practice, no published source).
describe("diagnosis rules", () => {
  it("a short test that reads as normal: the resistor is not at the end of the line", () => {
    // Resistor fitted at the panel terminals: shorting the cable at the far end leaves the 4.7 kΩ alone, ≈ 4.70 kΩ.
    const v = diagnoseReading(door, "short", ohms(4700));
    expect(v.verdict).toBe("fail");
    expect(codes(v)).toEqual(["resistor-not-at-end"]);
    expect(v.diagnoses[0].text).toMatch(/fitted at the panel/);
  });
  it("a cut test on a normally open loop that reads as normal: the resistor is at the panel too", () => {
    // NO contact with its 4.7 kΩ across the input terminals: lifting a core leaves the 4.7 kΩ, ≈ 4.70 kΩ.
    expect(codes(diagnoseReading(panic, "cut", ohms(4700)))).toEqual(["resistor-not-at-end"]);
  });
  it("about double the expected value: a double end-of-line pair in series, or a wrong value (2 × 4.7 kΩ = 9.4 kΩ)", () => {
    // Single end-of-line loop expecting 4.7 kΩ + 4 × 40 m × 0.053 Ω/m ≈ 4.71 kΩ reads 9.41 kΩ.
    const v = diagnoseReading(pir, "rest", ohms(9410));
    expect(codes(v)).toEqual(["double-value"]);
    expect(v.diagnoses[0].text).toContain("2 × 4.7 kΩ = 9.4 kΩ");
  });
  it("a little high: a long run or a poor, corroded connection", () => {
    // 80 Ω over the top of the range (beyond the meter's 1 % allowance of about 50 Ω):
    // 80 Ω / (2 × 0.053 Ω/m) ≈ 755 m more 22 AWG cable each way — more likely a bad joint.
    const rest = door.expected.find((e) => e.test === "rest")!;
    const v = diagnoseReading(door, "rest", ohms(rest.maxOhms + 80));
    expect(codes(v)).toEqual(["slightly-high"]);
    const metres = Math.round(80 / (2 * conductorOhmsPerM({ awg: 22 }, 20)));
    expect(metres).toBeGreaterThan(745);
    expect(metres).toBeLessThan(765);
    expect(v.diagnoses[0].text).toContain(`about ${metres} m more cable each way`);
    expect(v.diagnoses[0].text).toMatch(/corroded/);
    // 8 % over the nominal is still "a little high"
    expect(codes(diagnoseReading(door, "rest", ohms(rest.nominalOhms * 1.08)))).toEqual(["slightly-high"]);
  });
  it("far from every expected value: the wrong resistor, naming the nearest E24 value and another family's usual value", () => {
    // 2.2 kΩ fitted where 4.7 kΩ is needed: 2200 + 2.6 Ω of cable + contacts ≈ 2.203 kΩ. The compact family's inputs use 2.2 kΩ (catalog/input-types.yaml).
    const v = diagnoseReading(door, "rest", ohms(2203), { usualValues });
    expect(codes(v)).toEqual(["wrong-resistor"]);
    expect(v.diagnoses[0].text).toContain("A 2.2 kΩ resistor (nearest E24 value) would read about this, where 4.7 kΩ is needed.");
    expect(v.diagnoses[0].text).toContain("2.2 kΩ is the usual value on the compact family's 2.2 kΩ input");
    // 5.6 kΩ in place of 4.7 kΩ (+19 %) is beyond "a little high": the large family's value (IEC 60063 E12 5.6 kΩ)
    const w = diagnoseReading(door, "rest", ohms(5603), { usualValues });
    expect(codes(w)).toEqual(["wrong-resistor"]);
    expect(w.diagnoses[0].text).toContain("A 5.6 kΩ resistor");
    expect(w.diagnoses[0].text).toContain("large family");
    // 3.9 kΩ (E12) is nobody's usual value here: named, without a family
    const x = diagnoseReading(door, "rest", ohms(3903), { usualValues });
    expect(x.diagnoses[0].text).toContain("A 3.9 kΩ resistor");
    expect(x.diagnoses[0].text).not.toContain("usual value");
  });
  it("open at rest on a normally closed loop: a broken conductor or a contact not closed", () => {
    const v = diagnoseReading(door, "rest", open);
    expect(codes(v)).toEqual(["open-at-rest"]);
    expect(v.diagnoses[0].text).toMatch(/broken or loose conductor, or a contact that is not closed/);
    expect(v.matches).toEqual(["tamper", "cut"]);
  });
  it("open at rest on a normally open loop: the resistor across the contact is missing", () => {
    expect(codes(diagnoseReading(panic, "rest", open))).toEqual(["open-at-rest-across"]);
  });
  it("about 0 Ω at rest: a short in the cable, or the resistor missing", () => {
    // NC loop wired straight through without its 4.7 kΩ: only 2 × 25 m of 22 AWG and two contacts, ≈ 2.8 Ω.
    const v = diagnoseReading(door, "rest", ohms(2.8));
    expect(codes(v)).toEqual(["near-zero-at-rest", "reads-as-other-test"]);
    expect(v.diagnoses[0].text).toMatch(/short in the cable, or the resistor is missing/);
  });
  it("open when a double end-of-line detector is active: the resistor across the contact is missing", () => {
    expect(codes(diagnoseReading(door, "active", open))).toEqual(["resistor-across-contact-missing"]);
  });
  it("the resting resistance is the end-of-line value, or both resistors on a normally open double end-of-line loop", () => {
    expect(restingResistorOhms(door)).toBe(4700);
    // fire zone input: 1 kΩ in series and 4.7 kΩ across the NO contacts rest at 5.7 kΩ (catalog/input-types.yaml)
    expect(restingResistorOhms(diagnoseLoopOf(row("fire1", 1)))).toBe(5700);
  });
});

describe("the fault finder in the diagnosis", () => {
  it("ranks what a failed rest reading means: a 3.3 kΩ resistor in place of 4.7 kΩ on the front door", () => {
    // 3.3 kΩ + 2 × 25 m × 0.053 Ω/m (22 AWG, ASTM B258) + two closed contacts ≈ 3.303 kΩ
    const v = diagnoseReading(door, "rest", ohms(3303));
    expect(v.verdict).toBe("fail");
    expect(v.ranking![0]).toMatchObject({ kind: "wrong-value", label: "A 3.3 kΩ end-of-line resistor fitted instead of 4.7 kΩ" });
  });
  it("puts a short at about 10 m first for 1.06 Ω at rest, and gives no ranking on a pass", () => {
    // d = R / (2 r) = 1.06 / (2 × 0.053) = 10 m on 22 AWG (ASTM B258), the rest of the loop in parallel adds under 0.1 %
    const v = diagnoseReading(door, "rest", ohms(1.06));
    expect(v.ranking![0].kind).toBe("short-at-distance");
    expect(v.ranking![0].distance!.metres).toBeCloseTo(10, 0);
    expect(diagnoseReading(door, "rest", ohms(4703)).ranking).toBeUndefined();
  });
});
