import { describe, expect, it } from "vitest";
import { CHART, chartModel, nameLines } from "@/components/compare/chart-model";
import { isBest, loadStyle, ma, pct, plural, shortSummary } from "@/components/compare/compare-format";
import { makeFormat } from "@/lib/format/format";

// The comparison chart: spare inputs and supervision coverage of each layout as bars on one 0–100 % scale.

const plot = CHART.panelWidth - CHART.labelRoom;

describe("the comparison chart", () => {
  const m = chartModel([
    { name: "One detector per input", inputs: { used: 41, total: 44, spare: 3 }, coverage: { used: 41, covered: 38, share: 38 / 41 } },
    { name: "Large panel with shared inputs", inputs: { used: 36, total: 36, spare: 0 }, coverage: { used: 36, covered: 9, share: 0.25 } },
    { name: "Blank", inputs: { used: 0, total: 0, spare: 0 }, coverage: { used: 0, covered: 0, share: null } },
  ]);

  it("scales each bar to its share of the plot width", () => {
    expect(m.rows[0].spare.width).toBeCloseTo((3 / 44) * plot, 9);
    expect(m.rows[0].coverage.width).toBeCloseTo((38 / 41) * plot, 9);
    expect(m.rows[1].spare.width).toBe(0);
    expect(m.rows[1].coverage.width).toBeCloseTo(0.25 * plot, 9);
  });

  it("labels each bar with the counts and the rounded percentage", () => {
    expect(m.rows[0].spare.label).toBe("3 of 44 (7 %)");
    expect(m.rows[0].coverage.label).toBe("38 of 41 (93 %)");
    expect(m.rows[1].coverage.label).toBe("9 of 36 (25 %)");
    expect(m.rows[2].spare.label).toBe("no inputs");
    expect(m.rows[2].coverage.label).toBe("no inputs used");
  });

  it("stacks the rows and sizes the drawing to hold them", () => {
    expect(m.rows.map((r) => r.y)).toEqual([CHART.top, CHART.top + CHART.rowHeight, CHART.top + 2 * CHART.rowHeight]);
    expect(m.height).toBe(CHART.top + 3 * CHART.rowHeight + CHART.bottom);
    expect(m.ticks.map((t) => t.label)).toEqual(["0 %", "25 %", "50 %", "75 %", "100 %"]);
    expect(m.panels[1].x).toBeGreaterThanOrEqual(m.panels[0].x + m.panels[0].width);
  });

  it("keeps a bar inside the scale when figures are odd", () => {
    const odd = chartModel([{ name: "x", inputs: { used: 1, total: 1, spare: 5 }, coverage: { used: 1, covered: 2, share: 2 } }]);
    expect(odd.rows[0].spare.width).toBe(plot);
    expect(odd.rows[0].coverage.width).toBe(plot);
  });

  it("puts a long name on two lines, cutting the rest short", () => {
    expect(nameLines("One detector per input")).toEqual(["One detector per input"]);
    expect(nameLines("Large panel with shared inputs")).toEqual(["Large panel with", "shared inputs"]);
    expect(nameLines("A very long layout name that goes on and on")).toEqual(["A very long layout", "name that goes on and…"]);
    expect(nameLines("Supercalifragilisticexpialidocious")).toEqual(["Supercalifragilistice…"]);
  });
});

describe("the compare page's wording", () => {
  it("shortens the sharing sentences of the summary (they are listed in full per layout)", () => {
    expect(shortSummary("A saves 1 input by sharing: Hall, input 3 carries the door and the window: saves 1 input, …")).toBe("A saves 1 input by sharing; what each shared input trades is listed below.");
    expect(shortSummary("A: 2 of 40 inputs used, 38 spare.")).toBe("A: 2 of 40 inputs used, 38 spare.");
  });

  it("marks a layout best on a measure unless every layout ties on it", () => {
    expect(isBest([0], 0, 3)).toBe(true);
    expect(isBest([0], 1, 3)).toBe(false);
    expect(isBest([0, 1, 2], 1, 3)).toBe(false);
    expect(isBest([], 0, 2)).toBe(false);
  });

  it("writes money, currents, shares and counts", () => {
    expect(makeFormat({ locale: "en-GB", timeZone: "UTC", currency: "GBP", units: "metric" }).money(1234.5)).toBe("£1,234.50");
    expect(ma(12.6)).toBe("13 mA");
    expect(pct(null)).toBe("no inputs used");
    expect(pct(0.925)).toBe("93 %");
    expect(plural(1, "error")).toBe("1 error");
    expect(plural(0, "error")).toBe("0 errors");
    expect(loadStyle(1.1)).toContain("text-fault");
    expect(loadStyle(0.9)).toBe("text-warn");
    expect(loadStyle(0.5)).toBe("text-slate-600");
  });
});
