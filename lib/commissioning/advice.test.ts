import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { adviceOf, adviceText, NEXT_CHECK } from "@/lib/commissioning/advice";
import { diagnoseReading, type DiagnoseLoop } from "@/lib/commissioning/diagnose";

// A single end-of-line loop with a 4.7 kΩ resistor at the detector (values from memory of a common input type;
// the bands here are the test's own, not any product's).
const loop: DiagnoseLoop = {
  scheme: "single-eol",
  placement: "at-detector",
  contact: "NC",
  resistors: [{ role: "eol", ohms: 4700 }],
  expected: [
    { test: "rest", instruction: "detector at rest", minOhms: 4400, maxOhms: 5000, nominalOhms: 4710 },
    { test: "active", instruction: "detector in alarm", minOhms: Infinity, maxOhms: Infinity, nominalOhms: Infinity },
    { test: "short", instruction: "short the far end", minOhms: 0, maxOhms: 50, nominalOhms: 10 },
  ],
};

describe("the advice after a reading", () => {
  it("names the likely cause and the next check of a wrong resistor (common practice, no published source)", () => {
    const a = adviceOf(diagnoseReading(loop, "rest", { kind: "ohms", ohms: 2210 }));
    expect(a.verdict).toBe("fail");
    expect(a.headline).toMatch(/^FAIL: /);
    expect(a.likelyCause).toMatch(/probably the wrong resistor/);
    expect(a.nextCheck).toBe(NEXT_CHECK["wrong-resistor"]);
    expect(adviceText(a)).toContain("Likely cause: ");
  });
  it("says the resistor is not at the end when the short test reads like rest", () => {
    const a = adviceOf(diagnoseReading(loop, "short", { kind: "ohms", ohms: 4710 }));
    expect(a.likelyCause).toMatch(/not at the end of the line/);
    expect(a.nextCheck).toBe(NEXT_CHECK["resistor-not-at-end"]);
  });
  it("has no cause on a pass", () => {
    const a = adviceOf(diagnoseReading(loop, "rest", { kind: "ohms", ohms: 4710 }));
    expect(a).toMatchObject({ verdict: "pass", likelyCause: null });
  });
  it("always gives a next check, and a cause exactly when the reading fails, for any reading", () => {
    fc.assert(
      fc.property(fc.constantFrom("rest", "active", "short"), fc.oneof(fc.constant(Infinity), fc.double({ min: 0, max: 1e6, noNaN: true })), (test, ohms) => {
        const v = diagnoseReading(loop, test, ohms === Infinity ? { kind: "open" } : { kind: "ohms", ohms });
        const a = adviceOf(v);
        expect(a.nextCheck.length).toBeGreaterThan(10);
        expect(a.likelyCause === null).toBe(v.verdict === "pass");
        expect(a.verdict).toBe(v.verdict);
      }),
      { numRuns: 300 },
    );
  });
});
