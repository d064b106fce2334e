import { describe, expect, it } from "vitest";
import { createSolver } from "@/lib/solver";
import { fixtureCatalog } from "@/lib/solver/testing/fixture-catalog";
import fc from "fast-check";
import { board, catalogWithPanel, det, emptyLayout, inp } from "@/lib/solver/testing/fixture-schedule";
import { inputsShortFinding, receiversShortFinding, withCapacityCheck, zonesShortFinding } from "@/lib/solver/inputs-short-rule";

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

describe("wireless detectors in the capacity rules", () => {
  const wPir = fixtureCatalog.wirelessDetectors.find((d) => d.category === "motion")!;
  const wireless = (k: number) => Array.from({ length: k }, (_, i) => det(`w${i + 1}`, wPir.id));

  it("counts wireless detectors against zones and receivers, never against inputs", () => {
    // n wired detectors fill the panel's n inputs exactly; three wireless ones wait besides
    const all = [...schedule.slice(0, n), ...wireless(3)];
    const r = createSolver(all, fixtureCatalog).solve(emptyLayout(panel.id));
    expect(inputsShortFinding(r)).toBeNull();
    expect(r.totals.unplacedWirelessIds).toEqual(["w1", "w2", "w3"]);
    // no receiver in the layout: three places short
    expect(receiversShortFinding(r)?.message).toBe("3 wireless detectors are still to place and the layout has no wireless receiver: 3 places short");
    // n + 3 zones wanted; the panel has maxZones, far more (fixture panel)
    expect(zonesShortFinding(r)).toBeNull();
  });

  it("is zones short when wired and wireless detectors together pass the panel's zones", () => {
    const small = catalogWithPanel(panel.id, { maxZones: n + 1 });
    const all = [...schedule.slice(0, n), ...wireless(3)];
    const r = createSolver(all, small).solve(emptyLayout(panel.id));
    expect(zonesShortFinding(r)?.message).toBe(`${n + 3} detectors are still to place (3 wireless) and the panel has only ${n + 1} zones left: 2 zones short`);
    const w = withCapacityCheck(r);
    expect(w.findings.slice(0, 2).map((f) => f.code)).toEqual(["zones-short", "receivers-short"]);
    expect(w.counts.error).toBe(r.counts.error + 2);
  });

  it("names the wired detectors when both kinds wait and inputs run out", () => {
    const all = [...schedule, ...wireless(1)]; // n + 2 wired on n inputs
    const r = createSolver(all, fixtureCatalog).solve(emptyLayout(panel.id));
    expect(inputsShortFinding(r)?.message).toBe(`${n + 2} wired detectors are still to place and only ${n} inputs are free: 2 inputs short`);
  });

  it("counts the room left on the receivers", () => {
    const all = wireless(3);
    const recv = fixtureCatalog.wirelessReceivers[0]; // learns 2 (fixture)
    const doc = emptyLayout(panel.id, { boards: [board("r1", "receiver", recv.id, 1)], wireless: [{ boardKey: "r1", detectorIds: ["w1"] }] });
    const r = createSolver(all, fixtureCatalog).solve(doc);
    expect(r.totals.unplacedWirelessIds).toEqual(["w2", "w3"]);
    expect(receiversShortFinding(r)?.message).toBe("2 wireless detectors are still to place and the wireless receivers have room for only 1: 1 place short");
  });

  it("any mix of wired and wireless waiting: inputs short counts only wired, zones short counts all (property)", () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: n + 4 }), fc.integer({ min: 0, max: 6 }), fc.integer({ min: 1, max: 20 }), (wired, wl, maxZones) => {
        const all = [...Array.from({ length: wired }, (_, i) => det(`d${i + 1}`, contact.id)), ...wireless(wl)];
        const r = createSolver(all, catalogWithPanel(panel.id, { maxZones })).solve(emptyLayout(panel.id));
        expect(inputsShortFinding(r) !== null).toBe(wired > n);
        expect(zonesShortFinding(r) !== null).toBe(wired + wl > maxZones);
        expect(receiversShortFinding(r) !== null).toBe(wl > 0);
      }),
      { numRuns: 60 },
    );
  });
});
