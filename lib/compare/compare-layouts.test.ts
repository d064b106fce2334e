import { describe, expect, it } from "vitest";
import { shippedCatalog } from "@/lib/catalog/shipped";
import type { LayoutDocument } from "@/lib/layout/schema";
import fc from "fast-check";
import { bestOf, compareLayouts, notRankedReason } from "@/lib/compare/compare-layouts";
import { largeLayout, largeSchedule } from "@/lib/sheet/testing/sample-layouts";

const { catalog } = shippedCatalog();

// B: the door and the window each on an input of their own, single end-of-line.
const separate: LayoutDocument = {
  ...largeLayout,
  inputs: [
    { boardKey: "panel", input: 1, detectorIds: ["l-door"], scheme: "single-eol", placement: "at-detector" },
    { boardKey: "panel", input: 2, detectorIds: ["l-win"], scheme: "single-eol", placement: "at-detector" },
    largeLayout.inputs[1],
  ],
};
// C: as A, with an 8-input expansion board added.
const withBoard: LayoutDocument = { ...largeLayout, boards: [...largeLayout.boards, { key: "x8", kind: "expansion", catalogId: "board-large-8", busAddress: 2 }] };

describe("comparing layouts", () => {
  const c = compareLayouts(
    [
      { id: 1, name: "A shared", layout: largeLayout },
      { id: 2, name: "B separate", layout: separate },
      { id: 3, name: "C extra board", layout: withBoard },
    ],
    largeSchedule,
    catalog,
  );
  const [a, b, x] = c.columns;

  it("counts inputs used and spare: the shared input saves one", () => {
    // panel 32 inputs + double end-of-line board 8 = 40; A uses 2 (one shared), B 3; C adds 8 more inputs
    expect([a.inputs, b.inputs, x.inputs]).toEqual([
      { used: 2, total: 40, spare: 38 },
      { used: 3, total: 40, spare: 37 },
      { used: 2, total: 48, spare: 46 },
    ]);
    expect([a.zones, b.zones]).toEqual([3, 3]);
    expect(c.best.spare).toEqual([2]);
  });

  it("prices each layout; the extra board costs exactly its list price", () => {
    // board-large-8 lists at 80 (catalog/family-large.yaml)
    expect(x.cost - a.cost).toBe(80);
    expect(a.cost).toBe(b.cost);
    expect(c.best.cost).toEqual([0, 1]);
    expect(c.summary).toContain("C extra board costs 80.00 more than A shared (" + (a.cost + 80).toFixed(2) + " against " + a.cost.toFixed(2) + ").");
  });

  it("compares supervision coverage: single end-of-line loops report a cut as an alarm", () => {
    // input-5k6 single end-of-line bands: a cut reads in the high band, "active" (catalog/input-types.yaml), so those inputs are not covered
    expect(a.coverage).toEqual({ used: 2, covered: 2, share: 1 });
    expect(b.coverage.covered).toBe(1);
    expect(c.best.coverage).toEqual([0, 2]);
  });

  it("says in plain words what each shared input trades", () => {
    expect(a.shared).toHaveLength(1);
    expect(a.shared[0]).toMatchObject({ boardKey: "panel", input: 1, detectors: ["Side door", "Side window"], inputsSaved: 1, lost: [] });
    expect(a.shared[0].text).toBe(
      "Control panel, input 1 carries Side door and Side window: saves 1 input, and shorts and cuts are still reported; but one cable fault takes out both detectors, and the panel cannot say which of them the fault is on.",
    );
    expect(b.shared).toEqual([]);
  });

  it("gives current and battery per supply and the findings counts", () => {
    const panel = a.supplies.find((s) => s.key === "panel")!;
    // dual-technology motion 18 mA at rest (catalog/detectors.yaml) on the panel's auxiliary output
    expect(panel.restMa - catalog.panels.find((p) => p.id === "panel-large-32")!.ownStandbyMa - catalog.expansionBoards.find((e) => e.id === "board-large-deol-8")!.standbyMa).toBeCloseTo(18, 9);
    expect(panel.batteryAh).toBe(7);
    expect(a.findings.error).toBe(0);
    expect(Object.keys(a.findings)).toEqual(["error", "warning", "note"]);
  });
});

describe("a layout with detectors not placed or with errors is never best", () => {
  it("is left out of every measure and says why", () => {
    // D: A with the door taken off its input (one detector unplaced): it would win on spare inputs otherwise
    const unplacedDoc: LayoutDocument = { ...largeLayout, inputs: largeLayout.inputs.slice(1) };
    const r = compareLayouts(
      [
        { id: 1, name: "A shared", layout: largeLayout },
        { id: 4, name: "D door missing", layout: unplacedDoc },
      ],
      largeSchedule,
      catalog,
    );
    const [ranked, missing] = r.columns;
    expect(missing.unplaced).toBeGreaterThan(0);
    expect(missing.inputs.spare).toBeGreaterThan(ranked.inputs.spare);
    expect(missing.notRanked).toMatch(/^not ranked: \d+ detectors? (is|are) not placed/);
    expect(ranked.notRanked).toBeNull();
    for (const list of Object.values(r.best)) expect(list).not.toContain(1);
    expect(r.best.spare).toEqual([0]);
    expect(r.summary.some((s) => s.startsWith("D door missing is not ranked:"))).toBe(true);
  });

  it("holds for any set of columns (bestOf)", () => {
    const column = fc.record({
      cost: fc.integer({ min: 0, max: 5000 }),
      coverage: fc.record({ used: fc.constant(1), covered: fc.constant(1), share: fc.option(fc.double({ min: 0, max: 1, noNaN: true }), { nil: null }) }),
      findings: fc.record({ error: fc.integer({ min: 0, max: 3 }), warning: fc.constant(0), note: fc.constant(0) }),
      inputs: fc.record({ used: fc.constant(1), total: fc.constant(8), spare: fc.integer({ min: 0, max: 8 }) }),
      unplaced: fc.integer({ min: 0, max: 3 }),
    });
    fc.assert(
      fc.property(fc.array(column, { minLength: 1, maxLength: 6 }), (cols) => {
        const withReason = cols.map((c) => ({ ...c, notRanked: notRankedReason(c) }));
        const best = bestOf(withReason);
        for (const list of Object.values(best))
          for (const i of list) {
            expect(withReason[i].unplaced).toBe(0);
            expect(withReason[i].findings.error).toBe(0);
          }
        // a complete layout is still ranked: the lowest cost among complete layouts is best on cost
        const complete = withReason.filter((c) => c.notRanked === null);
        if (complete.length) expect(best.cost.map((i) => withReason[i].cost)[0]).toBe(Math.min(...complete.map((c) => c.cost)));
        else expect(best.cost).toEqual([]);
      }),
    );
  });

  it("words the reason in the singular and plural", () => {
    expect(notRankedReason({ unplaced: 1, findings: { error: 0 } })).toBe("not ranked: 1 detector is not placed");
    expect(notRankedReason({ unplaced: 8, findings: { error: 2 } })).toBe("not ranked: 8 detectors are not placed and 2 errors");
    expect(notRankedReason({ unplaced: 0, findings: { error: 1 } })).toBe("not ranked: 1 error");
    expect(notRankedReason({ unplaced: 0, findings: { error: 0 } })).toBeNull();
  });
});
