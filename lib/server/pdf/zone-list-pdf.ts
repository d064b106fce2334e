import "server-only";
import { createPdf, heading, noticeBox, NOT_APPROVED_MARKING, paragraph, type PageSize } from "@/lib/server/pdf/pdf-kit";
import { approvalLine, type SheetMeta } from "@/lib/server/pdf/terminal-sheet-pdf";
import { zoneListSection } from "@/lib/server/pdf/zone-list-section";
import type { ZoneList } from "@/lib/sheet/zone-list";
import { plural } from "@/lib/vocabulary/plural";

// The zone list as a PDF of its own, for whoever keys the zones into the panel.

export async function zoneListPdf(list: ZoneList, meta: SheetMeta & { panelName: string | null; caution: string | null }, size: PageSize = "A4"): Promise<Buffer> {
  const title = `Zone list — ${meta.siteName} — ${meta.layoutName}, revision ${meta.revision}`;
  const pdf = createPdf({ size, title, ...(meta.approved ? {} : { marking: NOT_APPROVED_MARKING }) });
  heading(pdf, title, 15);
  paragraph(pdf, approvalLine(meta), { bold: true, ...(meta.approved && !meta.approvedSolo ? {} : { color: "#991b1b" }) });
  paragraph(pdf, `Control panel: ${meta.panelName ?? "unknown"} · ${plural(list.rows.length, "zone")} · made ${meta.generatedAt}`);
  if (meta.caution) noticeBox(pdf, meta.caution);
  zoneListSection(pdf, list);
  return pdf.toBuffer();
}
