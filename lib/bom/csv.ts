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

export const BOM_COLUMNS = ["kind", "catalog_id", "description", "quantity", "unit_price", "total", "note", "currency"] as const;

/**
 * The bill of materials, with a final total record over the priced lines. Amounts stay plain numbers that
 * spreadsheets compute with, in the currency's usual decimals (lib/format moneyPlain), and each priced record names the currency.
 */
export function bomCsv(bom: BillOfMaterials, money: { currency: string; plain: (amount: number) => string } = { currency: "EUR", plain: (x) => x.toFixed(2) }): string {
  const rows: CsvCell[][] = bom.lines.map((l) => [l.kind, l.catalogId, l.description, l.quantity, l.unitPrice === null ? null : money.plain(l.unitPrice), l.total === null ? null : money.plain(l.total), l.note, l.unitPrice === null ? null : money.currency]);
  rows.push(["total", null, `priced lines (${bom.unpricedLines} not priced)`, null, null, money.plain(bom.total), null, money.currency]);
  return writeCsv(BOM_COLUMNS, rows);
}
