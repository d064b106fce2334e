import { beforeAll, describe, expect, it } from "vitest";
import { shippedCatalog } from "@/lib/catalog/shipped";
import { buildTerminalSheet } from "@/lib/sheet/build-sheet";
import type { SheetInput } from "@/lib/sheet/sheet-types";
import { largeLayout, largeSchedule, midLayout, midSchedule } from "@/lib/sheet/testing/sample-layouts";
import { spareRanges, terminalSheetPdf } from "@/lib/server/pdf/terminal-sheet-pdf";
import { readPdf, squash } from "@/tests/support/pdf-text";

// Read back by pdf.js (tests/support/pdf-text.ts), an independent reader of the PDF.
const pdfText = async (buf: Buffer) => (await readPdf(buf)).text;
const pageSizes = async (buf: Buffer) => (await readPdf(buf)).pages.map(({ width, height }) => ({ width, height }));

const { catalog } = shippedCatalog();
const meta = { siteName: "Test depot", layoutName: "Option A", revision: 3, generatedAt: "2026-12-01" };

// Laying out text with the embedded font takes a while on a busy machine: one PDF per case, made once.
describe("terminal sheet PDF", { timeout: 60_000 }, () => {
  const sheet = buildTerminalSheet(midLayout, midSchedule, catalog);
  let a4: Buffer;
  beforeAll(async () => {
    a4 = await terminalSheetPdf(sheet, meta, "A4");
  }, 60_000);
  it("carries every zone's label, the resistor colour bands and every expected range", async () => {
    expect(a4.subarray(0, 5).toString()).toBe("%PDF-");
    const text = squash(await pdfText(a4));
    expect(text).toContain("Terminal sheet — Test depot — Option A, revision 3");
    for (const d of midSchedule) expect(text).toContain(d.label);
    expect(text).toContain("4.7 kΩ ±5 % (yellow violet red gold) E12");
    let ranges = 0;
    for (const b of sheet.boards)
      for (const r of b.rows)
        if (!r.spare)
          for (const e of (r as SheetInput).expected) {
            expect(text).toContain(e.rangeText);
            ranges++;
          }
    expect(ranges).toBeGreaterThan(15);
    expect(text).toContain("open (meter shows OL)");
    expect(text).toContain("Spare inputs: 4, 6–16");
    expect(text).toContain("Tested by (name)");
  });
  it("prints the life-safety caution when the layout has a smoke detector, and not otherwise", async () => {
    const text = squash(await pdfText(a4));
    expect(text).toContain("the design must follow the local fire code and the authority having jurisdiction, and be installed and certified by licensed people");
    expect(text).toContain("Loopwright's figures are an aid, not an approval");
    const other = squash(await pdfText(await terminalSheetPdf(buildTerminalSheet(largeLayout, largeSchedule, catalog), meta, "A4")));
    expect(other).not.toContain("local fire code");
    expect(other).toContain("Side door");
  });
  it("makes A4 and US Letter pages", async () => {
    // ISO 216 A4 = 210 × 297 mm = 595.28 × 841.89 pt; US Letter = 8.5 × 11 in = 612 × 792 pt
    // every page, to the hundredth of a point that the file states
    const a4Pages = await pageSizes(a4);
    expect(a4Pages.length).toBeGreaterThan(1);
    for (const size of a4Pages) expect(size).toEqual({ width: 595.28, height: 841.89 });
    const letterPages = await pageSizes(await terminalSheetPdf(sheet, meta, "LETTER"));
    expect(letterPages.length).toBeGreaterThan(1);
    for (const size of letterPages) expect(size).toEqual({ width: 612, height: 792 });
  });
  it("writes consecutive spare inputs as ranges", () => {
    const s = (ns: number[]) => spareRanges(ns.map((input) => ({ spare: true, boardKey: "panel", input, terminals: "", note: "" })));
    expect(s([4, 6, 7, 8, 16, 10])).toBe("4, 6–8, 10, 16");
  });
});
