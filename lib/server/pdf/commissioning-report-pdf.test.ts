import { describe, expect, it } from "vitest";
import { shippedCatalog } from "@/lib/catalog/shipped";
import { diagnoseLoopOf, diagnoseReading, type MeasuredReading } from "@/lib/commissioning/diagnose";
import { commissioningProgress, type RecordedReading } from "@/lib/commissioning/progress";
import { buildTerminalSheet } from "@/lib/sheet/build-sheet";
import type { SheetInput } from "@/lib/sheet/sheet-types";
import { midLayout, midSchedule } from "@/lib/sheet/testing/sample-layouts";
import { commissioningReportPdf } from "@/lib/server/pdf/commissioning-report-pdf";
import { readPdf, squash } from "@/tests/support/pdf-text";

// Read back by pdf.js (tests/support/pdf-text.ts), an independent reader of the PDF.

describe("commissioning record PDF", { timeout: 60_000 }, () => {
  it("lists each loop's readings, verdicts and diagnoses, the photos and the caution, on A4 and US Letter", async () => {
    const { catalog } = shippedCatalog();
    const sheet = buildTerminalSheet(midLayout, midSchedule, catalog);
    const door = sheet.boards[0].rows.find((r) => !r.spare && r.input === 1) as SheetInput;
    const record = (test: RecordedReading["test"], reading: MeasuredReading, minute: number): RecordedReading => {
      const v = diagnoseReading(diagnoseLoopOf(door), test, reading);
      return { boardKey: "panel", input: 1, test, reading, verdict: v.verdict, diagnosis: v.diagnoses[0]?.text ?? null, recordedBy: "Test installer", recordedAt: `2026-12-01 10:${minute}` };
    };
    const readings = [record("rest", { kind: "ohms", ohms: 4710 }, 10), record("short", { kind: "ohms", ohms: 4700 }, 11)];
    const report = commissioningProgress(sheet, readings);
    const meta = { siteName: "Test depot", layoutName: "Option A", revision: 2, generatedAt: "2026-12-01", caution: sheet.caution };
    const photos = [{ boardKey: "panel", input: 1, fileName: "door-eol.jpg", sizeBytes: 204800, takenBy: "Test installer", takenAt: "2026-12-01 10:12" }];
    // ISO 216 A4 = 595.28 × 841.89 pt; US Letter = 8.5 × 11 in = 612 × 792 pt
    for (const [size, dims] of [
      ["A4", { width: 595.28, height: 841.89 }],
      ["LETTER", { width: 612, height: 792 }],
    ] as const) {
      const pdf = await readPdf(await commissioningReportPdf(report, meta, photos, size));
      const text = squash(pdf.text);
      expect(text).toContain("Commissioning record — Test depot — Option A, revision 2");
      expect(text).toContain("0 of 5 loops passed; 1 failed");
      expect(text).toContain("Front door — FAILED");
      expect(text).toContain("4.71 kΩ");
      expect(text).toContain(door.expected[0].rangeText);
      expect(text).toContain("the resistor is not at the end of the line");
      expect(text).toContain("door-eol.jpg (200 KiB");
      expect(text).toContain("local fire code and the authority having jurisdiction");
      for (const page of pdf.pages) expect({ width: page.width, height: page.height }).toEqual(dims);
    }
  });
});
