import type { Report } from "@/lib/catalog/schema";
import { writeCsv, type CsvCell } from "@/lib/csv/csv";
import type { BillOfMaterials } from "@/lib/bom/bill-of-materials";
import type { SheetInput, TerminalSheet } from "@/lib/sheet/sheet-types";
import { REPORT_WORDS } from "@/lib/vocabulary/words";

// The layout's CSV exports, written through lib/csv (quoting and the formula guard live there).

export const ZONE_LIST_COLUMNS = ["zone", "label", "area", "room", "device_type", "board", "input", "report_types"] as const;

const reportList = (rs: readonly Report[]) => rs.map((r) => REPORT_WORDS[r]).join("; ");

/** One record per zone, in zone order. */
export function zoneListCsv(sheet: TerminalSheet): string {
  const rows: [number, ...CsvCell[]][] = [];
  for (const b of sheet.boards)
    for (const r of b.rows) {
      if (r.spare) continue;
      for (const d of (r as SheetInput).detectors) rows.push([d.zone, d.label, d.area, d.room, d.deviceType, b.name, r.input, reportList(d.reports)]);
    }
  rows.sort((a, b) => a[0] - b[0]);
  return writeCsv(ZONE_LIST_COLUMNS, rows);
}

export const BOM_COLUMNS = ["kind", "catalog_id", "description", "quantity", "unit_price", "total", "note"] as const;

/** The bill of materials, with a final total record over the priced lines. */
export function bomCsv(bom: BillOfMaterials): string {
  const rows: CsvCell[][] = bom.lines.map((l) => [l.kind, l.catalogId, l.description, l.quantity, l.unitPrice === null ? null : l.unitPrice.toFixed(2), l.total === null ? null : l.total.toFixed(2), l.note]);
  rows.push(["total", null, `priced lines (${bom.unpricedLines} not priced)`, null, null, bom.total.toFixed(2), null]);
  return writeCsv(BOM_COLUMNS, rows);
}
