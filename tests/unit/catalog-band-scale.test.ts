import { describe, expect, it } from "vitest";
import { bandSegments, defaultFrame as f, detailFrame, edgeLabels, formatEdge, ohmsToX, placeLabels, readingMarks, scaleTicks } from "@/components/catalog/band-scale-geometry";
import { shippedCatalog } from "@/lib/catalog/shipped";

// The band scale's geometry (pure; kept beside the catalog's integration tests).
const inputType = (id: string) => shippedCatalog().catalog.inputTypes.find((t) => t.id === id)!;

describe("band scale geometry", () => {
  it("places readings on a log scale from 10 Ω to 100 kΩ with an ∞ segment after it", () => {
    expect(ohmsToX(10)).toBe(f.logLeft);
    expect(ohmsToX(0)).toBe(f.logLeft); // a short reads near 0 Ω, below any log scale's start
    expect(ohmsToX(100_000)).toBe(f.logRight);
    // 1 kΩ is two of the four decades from 10 Ω: halfway (log10)
    expect(ohmsToX(1_000)).toBeCloseTo((f.logLeft + f.logRight) / 2, 9);
    // equal ratios give equal distances on a log scale: 100→200 Ω as far as 2.2→4.4 kΩ
    expect(ohmsToX(200) - ohmsToX(100)).toBeCloseTo(ohmsToX(4_400) - ohmsToX(2_200), 9);
    expect(ohmsToX(250_000)).toBe(f.inf!.left);
    expect(ohmsToX(Infinity)).toBe(f.inf!.right);
    expect(scaleTicks().map((t) => t.text)).toEqual(["10 Ω", "100 Ω", "1 kΩ", "10 kΩ", "100 kΩ"]);
  });

  it("draws contiguous bands ending at the end of the ∞ segment", () => {
    const segs = bandSegments(inputType("input-5k6").bands.shared!);
    for (let i = 1; i < segs.length; i++) expect(segs[i].x0).toBe(segs[i - 1].x1);
    expect(segs[0].x0).toBe(f.logLeft);
    expect(segs.at(-1)).toMatchObject({ report: "open", toOhms: null, x1: f.inf!.right });
  });

  it("labels band edges in Ω and kΩ, stacking close ones so none overlaps in a row", () => {
    expect([0, 800, 2_500, 12_000, 7_400].map(formatEdge)).toEqual(["0 Ω", "800 Ω", "2.5 kΩ", "12 kΩ", "7.4 kΩ"]);
    const labels = edgeLabels(inputType("input-5k6").bands.shared!);
    expect(labels.map((l) => l.text)).toEqual(["0 Ω", "1.2 kΩ", "4.3 kΩ", "7 kΩ", "7.4 kΩ", "9.6 kΩ", "9.9 kΩ", "12.6 kΩ", "12.9 kΩ", "16 kΩ"]);
    // 7 kΩ and 7.4 kΩ are 0.6 % of the width apart: they must not share a row
    expect(labels[3].row).not.toBe(labels[4].row);
    for (const it of shippedCatalog().catalog.inputTypes)
      for (const bands of Object.values(it.bands)) {
        const placed = edgeLabels(bands!);
        for (const a of placed)
          for (const b of placed)
            if (a !== b && a.row === b.row) expect(Math.abs(a.x - b.x), `${it.id} ${a.text} / ${b.text}`).toBeGreaterThan(((a.text.length + b.text.length) * 6.4) / 2);
      }
    expect(placeLabels([{ x: 100, text: "b" }, { x: 10, text: "a" }]).map((l) => l.text)).toEqual(["b", "a"]); // order kept
  });

  it("marks the expected readings, with the contact orientation the table is laid out for", () => {
    // double end-of-line, NC contact: rest = EOL, active = EOL + alarm resistor (common practice, no published source)
    const nc = readingMarks(inputType("input-4k7"), "double-eol");
    expect(nc.contact).toBe("NC");
    expect(nc.marks.map((m) => [m.state, m.nominalOhms])).toEqual([["rest", 4_700], ["active", 9_400]]);
    // the fire zone input is laid out for NO detectors: both resistors at rest, the series one alone in alarm (catalog/input-types.yaml)
    const no = readingMarks(inputType("input-fire-1k-4k7"), "double-eol");
    expect(no.contact).toBe("NO");
    expect(no.marks.map((m) => [m.state, m.nominalOhms])).toEqual([["rest", 5_700], ["active", 1_000]]);
    // spread: 5 % either way plus up to 50 Ω of loop on the upper side
    expect(no.marks[0].minOhms).toBeCloseTo(5_415, 9);
    expect(no.marks[0].maxOhms).toBeCloseTo(6_035, 9);
    expect(no.marks[0].xMin).toBeLessThan(no.marks[0].x);
    expect(no.marks[0].xMax).toBeGreaterThan(no.marks[0].x);
  });

  it("zooms onto crowded expected readings with a detail frame, and not onto a lone one", () => {
    const shared = inputType("input-5k6");
    const { marks } = readingMarks(shared, "shared");
    const d = detailFrame(marks)!;
    // 5.6 kΩ rest at 5 % low, 13.9 kΩ both active at 5 % high plus 100 Ω of loop, each with a factor 1.6 margin
    expect(d.minOhms).toBeCloseTo((5_600 * 0.95) / 1.6, 6);
    expect(d.maxOhms).toBeCloseTo((13_900 * 1.05 + 100) * 1.6, 6);
    expect(d.inf).toBeNull();
    expect(ohmsToX(Infinity, d)).toBe(d.logRight);
    // inside the detail, the 7 kΩ / 7.4 kΩ edges are far apart; outside edges (1.2 kΩ) are left out
    const edges = edgeLabels(shared.bands.shared!, d);
    expect(edges.map((e) => e.text)).not.toContain("1.2 kΩ");
    const at = (t: string) => edges.find((e) => e.text === t)!.x;
    expect(at("7.4 kΩ") - at("7 kΩ")).toBeGreaterThan(15);
    expect(bandSegments(shared.bands.shared!, d)[0]).toMatchObject({ report: "trouble", x0: d.logLeft }); // the short band lies wholly below the frame
    expect(scaleTicks(d).map((t) => t.ohms)).toEqual([5_000, 10_000, 20_000]);
    expect(detailFrame(readingMarks(inputType("input-2k2"), "single-eol").marks)).toBeNull();
  });
});
