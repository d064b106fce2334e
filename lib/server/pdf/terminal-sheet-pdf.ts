import "server-only";
import { REPORT_WORDS } from "@/lib/loop/row-labels";
import type { SheetBoard, SheetInput, SpareInput, TerminalSheet } from "@/lib/sheet/sheet-types";
import { powerSection } from "@/lib/server/pdf/power-section";
import { zoneListSection } from "@/lib/server/pdf/zone-list-section";
import { createPdf, heading, noticeBox, NOT_APPROVED_MARKING, paragraph, table, type PageSize, type Pdf } from "@/lib/server/pdf/pdf-kit";
import { plural } from "@/lib/vocabulary/plural";

// The terminal sheet as a PDF for the installer: one section per board, every input with its wiring and the
// meter reading expected in each test, an empty measured column and a sign-off.

export interface SheetMeta {
  siteName: string;
  layoutName: string;
  revision: number;
  /** Shown as given, e.g. an ISO date. */
  generatedAt: string;
  /** The revision is approved (or commissioned); anything else is marked "not approved" on every page. */
  approved?: boolean;
  /** The approval was given by the person who sent or made the revision (the organisation allows it). */
  approvedSolo?: boolean;
}

/** The approval line of a sheet, the same on the page and in the PDF. */
export function approvalLine(meta: SheetMeta): string {
  if (!meta.approved) return `Revision ${meta.revision} is not approved: for review only, not for wiring.`;
  return `Approved revision ${meta.revision}${meta.approvedSolo ? " — approved without a second review" : ""}.`;
}

const contactWords = (c: "NC" | "NO") => (c === "NC" ? "normally closed (NC)" : "normally open (NO)");

/** Consecutive spare inputs as ranges: "4, 6–16". */
export function spareRanges(rows: readonly SpareInput[]): string {
  const ns = rows.map((r) => r.input).sort((a, b) => a - b);
  const parts: string[] = [];
  for (let i = 0; i < ns.length; ) {
    let j = i;
    while (j + 1 < ns.length && ns[j + 1] === ns[j] + 1) j++;
    parts.push(i === j ? `${ns[i]}` : `${ns[i]}–${ns[j]}`);
    i = j + 1;
  }
  return parts.join(", ");
}

function inputSection(pdf: Pdf, r: SheetInput): void {
  const zones = r.zones.length === 1 ? `zone ${r.zones[0]}` : `zones ${r.zones.join(" and ")}`;
  heading(pdf, `Input ${r.input} · terminals ${r.terminals} · ${zones} · ${r.schemeText}, ${r.placementText}`, 10);
  for (const d of r.detectors)
    paragraph(
      pdf,
      `Zone ${d.zone}: ${d.label} — ${[d.area, d.room].filter(Boolean).join(", ") || "no area given"} — ${d.deviceType}, ${contactWords(d.contact)}${d.tamper ? ", tamper contact" : ""}${d.powered ? `, powered${d.poweredFrom ? ` from ${d.poweredFrom}` : ""}` : ""}${d.lifeSafety ? ", LIFE-SAFETY DEVICE" : ""} — cable ${d.cableM} m of ${d.gaugeText}`,
    );
  for (const res of r.resistors)
    paragraph(pdf, `${res.name[0].toUpperCase()}${res.name.slice(1)}: ${res.valueText} ±${res.tolerancePct} %${res.bands.length ? ` (${res.bands.join(" ")})` : ""}${res.series ? ` ${res.series}` : ""} — ${res.where}`);
  if (r.cores.length) table(pdf, [{ header: "Core", share: 0.8 }, { header: "Panel end", share: 4 }, { header: "Far end", share: 4 }], r.cores.map((c) => [String(c.core), c.panelEnd, c.farEnd]));
  paragraph(pdf, `Loop: ${r.loopConductors} conductors, ${r.cable.lengthM} m of ${r.cable.gaugeText} one way.`, { size: 8, color: "#444444" });
  for (const f of r.findings) paragraph(pdf, `${f.severity === "error" ? "Error" : "Warning"}: ${f.message}`, { size: 8, color: f.severity === "error" ? "#991b1b" : "#92400e" });
  if (!r.expected.length) {
    paragraph(pdf, `No expected readings: ${r.noReadingsReason ?? "the loop cannot be analysed"}`, { bold: true });
    return;
  }
  table(
    pdf,
    [
      { header: "Test", share: 3.4 },
      { header: "Expected reading", share: 1.7 },
      { header: "Panel shows", share: 1.4 },
      { header: "Measured", share: 1.2 },
      { header: "OK", share: 0.5 },
    ],
    r.expected.map((e) => [e.instruction, `${e.rangeText}${e.uncertain ? " (straddles a band edge)" : ""}`, e.reports.map((x) => REPORT_WORDS[x]).join(" or "), "", ""]),
  );
}

function boardSection(pdf: Pdf, b: SheetBoard, caution: string | null): void {
  pdf.doc.addPage();
  heading(pdf, `${b.name} — ${b.deviceName}${b.busAddress !== null ? ` · bus address ${b.busAddress}` : ""}`);
  if (b.inputType) paragraph(pdf, `Inputs: ${b.inputType.name}, parts ±${b.inputType.tolerancePct} %.`);
  const used = b.rows.filter((r): r is SheetInput => !r.spare);
  if (caution && used.some((r) => r.detectors.some((d) => d.lifeSafety))) noticeBox(pdf, caution);
  const spare = b.rows.filter((r): r is SpareInput => r.spare);
  if (!used.length) paragraph(pdf, "No input of this board is used.");
  for (const r of used) inputSection(pdf, r);
  if (spare.length) {
    heading(pdf, `Spare inputs: ${spareRanges(spare)}`, 10);
    paragraph(pdf, spare[0].note);
  }
  heading(pdf, "Sign-off", 10);
  for (const line of b.signOff) paragraph(pdf, line, { size: 10 });
}

export async function terminalSheetPdf(sheet: TerminalSheet, meta: SheetMeta, size: PageSize = "A4"): Promise<Buffer> {
  const title = `Terminal sheet — ${meta.siteName} — ${meta.layoutName}, revision ${meta.revision}`;
  const pdf = createPdf({ size, title, ...(meta.approved ? {} : { marking: NOT_APPROVED_MARKING }) });
  heading(pdf, title, 15);
  paragraph(pdf, approvalLine(meta), { bold: true, ...(meta.approved && !meta.approvedSolo ? {} : { color: "#991b1b" }) });
  paragraph(pdf, `Control panel: ${sheet.panel?.name ?? "unknown"} · ${plural(sheet.zoneCount, "zone")} · made ${meta.generatedAt}`);
  if (sheet.caution) noticeBox(pdf, sheet.caution);
  paragraph(pdf, sheet.measuringNote, { size: 8, color: "#444444" });
  for (const p of sheet.problems) paragraph(pdf, `Error: ${p}`, { color: "#991b1b" });
  if (sheet.unplaced.length) paragraph(pdf, `Not on any input: ${sheet.unplaced.map((u) => u.label).join(", ")}.`, { color: "#92400e" });
  table(
    pdf,
    [
      { header: "Zone", share: 0.7 },
      { header: "Label", share: 3 },
      { header: "Area, room", share: 2.6 },
      { header: "Board, input", share: 2.4 },
      { header: "Device type", share: 2.6 },
    ],
    sheet.boards.flatMap((b) => b.rows.filter((r): r is SheetInput => !r.spare).flatMap((r) => r.detectors.map((d) => [String(d.zone), d.label, [d.area, d.room].filter(Boolean).join(", "), `${b.name}, input ${r.input}`, d.deviceType]))),
  );
  powerSection(pdf, sheet.supplies);
  zoneListSection(pdf, sheet.zoneList);
  for (const b of sheet.boards) boardSection(pdf, b, sheet.caution);
  return pdf.toBuffer();
}
