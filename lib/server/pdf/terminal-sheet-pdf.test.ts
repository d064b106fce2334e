import { execFileSync } from "node:child_process";
import { mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { beforeAll, describe, expect, it } from "vitest";
import { shippedCatalog } from "@/lib/catalog/shipped";
import { buildTerminalSheet } from "@/lib/sheet/build-sheet";
import type { SheetInput } from "@/lib/sheet/sheet-types";
import { largeLayout, largeSchedule, midLayout, midSchedule } from "@/lib/sheet/testing/sample-layouts";
import { spareRanges, terminalSheetPdf } from "@/lib/server/pdf/terminal-sheet-pdf";

// Text extraction by poppler's pdftotext (Debian poppler-utils), an independent reader of the PDF.
const dir = mkdtempSync(join(tmpdir(), "lw-sheet-"));
function pdfText(buf: Buffer, name: string): string {
  const file = join(dir, `${name}.pdf`);
  writeFileSync(file, buf);
  return execFileSync("/usr/bin/pdftotext", ["-layout", "-enc", "UTF-8", file, "-"], { encoding: "utf8" });
}
function pageSize(buf: Buffer, name: string): string {
  const file = join(dir, `${name}.pdf`);
  writeFileSync(file, buf);
  return /Page size:\s+([\d.]+ x [\d.]+)/.exec(execFileSync("/usr/bin/pdfinfo", [file], { encoding: "utf8" }))![1];
}
const squash = (s: string) => s.replace(/\s+/g, " ");

const { catalog } = shippedCatalog();
const meta = { siteName: "Test depot", layoutName: "Option A", revision: 3, generatedAt: "2026-12-01" };

// Laying out text with the embedded font takes a while on a busy machine: one PDF per case, made once.
describe("terminal sheet PDF", { timeout: 60_000 }, () => {
  const sheet = buildTerminalSheet(midLayout, midSchedule, catalog);
  let a4: Buffer;
  beforeAll(async () => {
    a4 = await terminalSheetPdf(sheet, meta, "A4");
  }, 60_000);
  it("carries every zone's label, the resistor colour bands and every expected range", () => {
    expect(a4.subarray(0, 5).toString()).toBe("%PDF-");
    const text = squash(pdfText(a4, "mid-a4"));
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
    const text = squash(pdfText(a4, "mid-caution"));
    expect(text).toContain("the design must follow the local fire code and the authority having jurisdiction, and be installed and certified by licensed people");
    expect(text).toContain("Loopwright's figures are an aid, not an approval");
    const other = squash(pdfText(await terminalSheetPdf(buildTerminalSheet(largeLayout, largeSchedule, catalog), meta, "A4"), "large"));
    expect(other).not.toContain("local fire code");
    expect(other).toContain("Side door");
  });
  it("makes A4 and US Letter pages", async () => {
    // ISO 216 A4 = 210 × 297 mm = 595.28 × 841.89 pt; US Letter = 8.5 × 11 in = 612 × 792 pt
    expect(pageSize(a4, "size-a4")).toBe("595.28 x 841.89");
    expect(pageSize(await terminalSheetPdf(sheet, meta, "LETTER"), "size-letter")).toBe("612 x 792");
  });
  it("writes consecutive spare inputs as ranges", () => {
    const s = (ns: number[]) => spareRanges(ns.map((input) => ({ spare: true, boardKey: "panel", input, terminals: "", note: "" })));
    expect(s([4, 6, 7, 8, 16, 10])).toBe("4, 6–8, 10, 16");
  });
});
