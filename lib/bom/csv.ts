import type { Report } from "@/lib/catalog/schema";
import { REPORT_WORDS } from "@/lib/loop/row-labels";
import type { BillOfMaterials } from "@/lib/bom/bill-of-materials";
import type { SheetInput, TerminalSheet } from "@/lib/sheet/sheet-types";

// CSV exports (RFC 4180): a header record, CRLF between records, fields quoted when they hold a comma, a quote or a line break.

export function csvField(v: string | number | null): string {
  const s = v === null ? "" : String(v);
  return /[",\r\n]/.test(s) ? `"${s.replace(/"/g, '""')}"` : s;
}

export function toCsv(header: readonly string[], rows: readonly (readonly (string | number | null)[])[]): string {
  return [header, ...rows].map((r) => r.map(csvField).join(",")).join("\r\n") + "\r\n";
}

export const ZONE_LIST_COLUMNS = ["zone", "label", "area", "room", "device_type", "board", "input", "report_types"] as const;

const reportList = (rs: readonly Report[]) => rs.map((r) => REPORT_WORDS[r]).join("; ");

/** One record per zone, in zone order. */
export function zoneListCsv(sheet: TerminalSheet): string {
  const rows: (string | number)[][] = [];
  for (const b of sheet.boards)
    for (const r of b.rows) {
      if (r.spare) continue;
      for (const d of (r as SheetInput).detectors) rows.push([d.zone, d.label, d.area, d.room, d.deviceType, b.name, r.input, reportList(d.reports)]);
    }
  rows.sort((a, b) => Number(a[0]) - Number(b[0]));
  return toCsv(ZONE_LIST_COLUMNS, rows);
}

export const BOM_COLUMNS = ["kind", "catalog_id", "description", "quantity", "unit_price", "total", "note"] as const;

/** The bill of materials, with a final total record over the priced lines. */
export function bomCsv(bom: BillOfMaterials): string {
  const rows: (string | number | null)[][] = bom.lines.map((l) => [l.kind, l.catalogId, l.description, l.quantity, l.unitPrice === null ? null : l.unitPrice.toFixed(2), l.total === null ? null : l.total.toFixed(2), l.note]);
  rows.push(["total", null, `priced lines (${bom.unpricedLines} not priced)`, null, null, bom.total.toFixed(2), null]);
  return toCsv(BOM_COLUMNS, rows);
}
