import "server-only";
import type { CommissioningProgressReport, LoopStatus } from "@/lib/commissioning/progress";
import { readingText } from "@/lib/commissioning/diagnose";
import { createPdf, heading, noticeBox, paragraph, table, type PageSize } from "@/lib/server/pdf/pdf-kit";
import { plural } from "@/lib/vocabulary/plural";

// The commissioning record as a PDF: every loop's tests with the expected range, the latest reading, its verdict
// and diagnosis, the photos taken, and a sign-off.

export interface ReportMeta {
  siteName: string;
  layoutName: string;
  revision: number;
  generatedAt: string;
  /** The life-safety caution, when the layout has life-safety devices. */
  caution: string | null;
}

export interface ReportPhoto {
  boardKey: string;
  input: number | null;
  fileName: string;
  sizeBytes: number;
  takenBy: string | null;
  takenAt: string;
}

const STATUS_WORDS: Record<LoopStatus, string> = {
  untested: "not tested",
  incomplete: "partly tested",
  failed: "FAILED",
  passed: "passed",
  "cannot-test": "cannot be tested (no expected readings)",
};

export async function commissioningReportPdf(report: CommissioningProgressReport, meta: ReportMeta, photos: readonly ReportPhoto[] = [], size: PageSize = "A4"): Promise<Buffer> {
  const title = `Commissioning record — ${meta.siteName} — ${meta.layoutName}, revision ${meta.revision}`;
  const pdf = createPdf({ size, title });
  heading(pdf, title, 15);
  const t = report.totals;
  paragraph(pdf, `Made ${meta.generatedAt}. ${t.passed} of ${plural(t.loops, "loop")} passed; ${t.failed} failed, ${t.incomplete} partly tested, ${t.untested} not tested${t.cannotTest ? `, ${t.cannotTest} cannot be tested` : ""}.`);
  if (meta.caution) noticeBox(pdf, meta.caution);
  for (const loop of report.loops) {
    const zones = loop.zones.length === 1 ? `zone ${loop.zones[0]}` : `zones ${loop.zones.join(" and ")}`;
    heading(pdf, `${loop.boardName}, input ${loop.input} · ${zones} · ${loop.labels.join(" and ")} — ${STATUS_WORDS[loop.status]}`, 10);
    if (!loop.tests.length) continue;
    table(
      pdf,
      [
        { header: "Test", share: 2.6 },
        { header: "Expected", share: 1.5 },
        { header: "Measured", share: 1.1 },
        { header: "Result", share: 0.8 },
        { header: "Diagnosis", share: 3 },
        { header: "By, when", share: 1.6 },
      ],
      loop.tests.map((x) => [
        x.expected.instruction,
        x.expected.rangeText,
        x.latest ? readingText(x.latest.reading) : "",
        x.latest ? (x.latest.verdict === "pass" ? "pass" : "FAIL") : "not tested",
        x.latest?.advice?.likelyCause ?? x.latest?.diagnosis ?? "",
        x.latest ? `${x.latest.recordedBy ?? "unknown"}, ${x.latest.recordedAt}` : "",
      ]),
    );
    // The same words the installer's phone showed after the reading.
    for (const x of loop.tests)
      if (x.latest?.verdict === "fail" && x.latest.advice) paragraph(pdf, `${x.expected.instruction}: ${x.latest.advice.headline}. Likely cause: ${x.latest.advice.likelyCause ?? ""} Next check: ${x.latest.advice.nextCheck}`, { size: 8, color: "#991b1b" });
    const mine = photos.filter((p) => p.boardKey === loop.boardKey && p.input === loop.input);
    if (mine.length) paragraph(pdf, `Photos: ${mine.map((p) => `${p.fileName} (${Math.round(p.sizeBytes / 1024)} KiB, ${p.takenBy ?? "unknown"}, ${p.takenAt})`).join("; ")}`, { size: 8 });
  }
  const loose = photos.filter((p) => p.input === null);
  if (loose.length) {
    heading(pdf, "Other photos", 10);
    for (const p of loose) paragraph(pdf, `${p.fileName} (${Math.round(p.sizeBytes / 1024)} KiB, ${p.takenBy ?? "unknown"}, ${p.takenAt})`, { size: 8 });
  }
  heading(pdf, "Sign-off", 10);
  for (const line of ["Commissioned by (name): ____________________", "Licence or registration number, where required: ____________________", "Signature: ____________________", "Date: ____________"]) paragraph(pdf, line, { size: 10 });
  return pdf.toBuffer();
}
