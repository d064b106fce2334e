import { describe, expect, it } from "vitest";
import { createSolver } from "@/lib/solver";
import { fixtureCatalog } from "@/lib/solver/testing/fixture-catalog";
import { det, emptyLayout, inp } from "@/lib/solver/testing/fixture-schedule";
import { inputsShortFinding, withCapacityCheck } from "@/lib/solver/inputs-short-rule";

const panel = fixtureCatalog.panels[0];
const n = panel.onboardInputs.count;
const contact = fixtureCatalog.detectors.find((d) => !d.lifeSafety && d.category === "door-contact")!;
const schedule = Array.from({ length: n + 2 }, (_, i) => det(`d${i + 1}`, contact.id));

describe("the inputs-short capacity rule", () => {
  const solver = createSolver(schedule, fixtureCatalog);

  it("is an error while more detectors wait than inputs are free, and counts as one", () => {
    const r = solver.solve(emptyLayout(panel.id));
    const f = inputsShortFinding(r);
    // n + 2 detectors, n free inputs on the panel alone: 2 short
    expect(f).toMatchObject({ code: "inputs-short", severity: "error", message: `${n + 2} detectors are still to place and only ${n} inputs are free: 2 inputs short` });
    const w = withCapacityCheck(r);
    expect(w.findings[0]).toEqual(f);
    expect(w.counts.error).toBe(r.counts.error + 1);
    expect(w.findings).toHaveLength(r.findings.length + 1);
  });

  it("says no input is free once the panel is full, and is gone when the free inputs suffice", () => {
    const full = emptyLayout(panel.id, { inputs: schedule.slice(0, n).map((d, i) => inp("panel", i + 1, [d.id], { scheme: "single-eol" })) });
    expect(inputsShortFinding(solver.solve(full))?.message).toBe("2 detectors are still to place and no input is free: 2 inputs short");
    const fewer = createSolver(schedule.slice(0, n), fixtureCatalog);
    expect(inputsShortFinding(fewer.solve(emptyLayout(panel.id)))).toBeNull();
    const r = fewer.solve(emptyLayout(panel.id));
    expect(withCapacityCheck(r)).toBe(r);
  });
});
