import { describe, expect, it } from "vitest";
import { shippedCatalog } from "@/lib/catalog/shipped";
import type { LayoutDocument } from "@/lib/layout/schema";
import { compareLayouts } from "@/lib/compare/compare-layouts";
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
