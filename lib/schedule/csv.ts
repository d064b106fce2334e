import type { Catalog } from "@/lib/catalog/schema";
import { isLifeSafety } from "@/lib/catalog/life-safety";
import { readCsv, writeCsv } from "@/lib/csv/csv";
import { formatGauge, parseGauge, scheduleRowSchema, supervisionPreferenceSchema, type ScheduleRow } from "@/lib/schedule/schema";

// Device schedule as CSV (through lib/csv): a header row, then one detector per record.

export const scheduleCsvColumns = ["label", "type", "area", "room", "cable_m", "gauge", "supervision"] as const;
export type ScheduleCsvColumn = (typeof scheduleCsvColumns)[number];
const required: readonly ScheduleCsvColumn[] = ["label", "type", "cable_m", "gauge"];
/** A blank supervision cell means single end-of-line. */
export const defaultSupervision = "single-eol" as const;

export interface CsvRowError {
  /** 1-based record number; the header is row 1. */
  row: number;
  /** Column name, or null for an error about the whole record or file. */
  column: ScheduleCsvColumn | null;
  message: string;
}

export interface ScheduleCsvParse {
  rows: ScheduleRow[];
  /** The 1-based record number of each row in `rows`. */
  rowNumbers: number[];
  errors: CsvRowError[];
}

function parseNumber(s: string): number | null {
  const t = s.trim();
  if (!/^[+]?(\d+([.,]\d*)?|[.,]\d+)([eE][+-]?\d+)?$/.test(t)) return null;
  return Number(t.replace(",", "."));
}

/**
 * Parse a schedule. Every problem is reported with its row and column; rows with errors are left out of `rows`.
 * Nothing is accepted here: the caller decides what to do when `errors` is not empty.
 */
export function parseScheduleCsv(text: string, catalog: Pick<Catalog, "detectors"> & Partial<Pick<Catalog, "wirelessDetectors">>): ScheduleCsvParse {
  const out: ScheduleCsvParse = { rows: [], rowNumbers: [], errors: [] };
  const { records, error } = readCsv(text);
  if (error) {
    out.errors.push({ row: error.record, column: null, message: `record ${error.record}: ${error.message}` });
    return out;
  }
  const header = records[0];
  if (!header) {
    out.errors.push({ row: 1, column: null, message: "the file is empty: a header row is needed" });
    return out;
  }
  const index = new Map<ScheduleCsvColumn, number>();
  header.forEach((h, i) => {
    const name = h.trim().toLowerCase().replace(/[\s-]+/g, "_") as ScheduleCsvColumn;
    if (!scheduleCsvColumns.includes(name)) return;
    if (index.has(name)) out.errors.push({ row: 1, column: name, message: `column ${name} appears twice` });
    else index.set(name, i);
  });
  for (const c of required) if (!index.has(c)) out.errors.push({ row: 1, column: c, message: `the header has no ${c} column` });
  if (out.errors.length) return out;

  const detectorById = new Map([...catalog.detectors, ...(catalog.wirelessDetectors ?? [])].map((d) => [d.id, d]));
  records.slice(1).forEach((rec, k) => {
    const row = k + 2;
    if (rec.every((f) => f.trim() === "")) return; // blank line
    // text cells are trimmed by the row schema as well, so quoted and bare cells read alike
    const cell = (c: ScheduleCsvColumn) => {
      const j = index.get(c);
      return j === undefined ? "" : (rec[j] ?? "").trim();
    };
    const errs: CsvRowError[] = [];
    if (rec.length > header.length) errs.push({ row, column: null, message: `${rec.length} fields, the header has ${header.length}` });
    const type = cell("type").trim();
    if (type === "") errs.push({ row, column: "type", message: "no detector type" });
    else if (!detectorById.has(type)) errs.push({ row, column: "type", message: `${type} is not a detector in the catalog` });
    const cableText = cell("cable_m");
    const cableM = parseNumber(cableText);
    if (cableM === null) errs.push({ row, column: "cable_m", message: cableText.trim() === "" ? "no cable length" : `"${cableText}" is not a number of metres` });
    const gaugeText = cell("gauge");
    const gauge = parseGauge(gaugeText);
    if (!gauge) errs.push({ row, column: "gauge", message: `"${gaugeText}" is not a gauge; write e.g. "22 AWG" or "0.5 mm2"` });
    const supText = cell("supervision").trim().toLowerCase();
    const sup = supText === "" ? { success: true as const, data: defaultSupervision } : supervisionPreferenceSchema.safeParse(supText);
    if (!sup.success)
      errs.push({ row, column: "supervision", message: `"${supText}" is not one of ${supervisionPreferenceSchema.options.join(", ")}` });
    else if (sup.data === "shared-ok" && detectorById.has(type) && isLifeSafety(detectorById.get(type)!))
      errs.push({ row, column: "supervision", message: `${type} is a life-safety detector: it may not share an input with another detector; choose single-eol or double-eol` });
    if (errs.length === 0) {
      const parsed = scheduleRowSchema.safeParse({
        label: cell("label"),
        catalogId: type,
        area: cell("area"),
        room: cell("room"),
        cableM,
        gauge,
        supervision: sup.data,
      });
      if (parsed.success) {
        out.rows.push(parsed.data);
        out.rowNumbers.push(row);
      } else
        for (const issue of parsed.error.issues) {
          const key = String(issue.path[0] ?? "");
          const column: ScheduleCsvColumn | null =
            key === "catalogId" ? "type" : key === "cableM" ? "cable_m" : (scheduleCsvColumns as readonly string[]).includes(key) ? (key as ScheduleCsvColumn) : null;
          errs.push({ row, column, message: issue.message });
        }
    }
    out.errors.push(...errs);
  });
  return out;
}

/** Serialize rows with the header, through the one CSV writer (formula guard included). */
export function serializeScheduleCsv(rows: readonly ScheduleRow[]): string {
  return writeCsv(
    scheduleCsvColumns,
    rows.map((r) => [r.label, r.catalogId, r.area, r.room, r.cableM, formatGauge(r.gauge), r.supervision]),
  );
}
