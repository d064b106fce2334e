import type { SummaryRow } from "@/lib/catalog/figures";
import { catalogKinds, type CatalogKind } from "@/lib/catalog/schema";
import type { EntryOrigin } from "@/lib/server/catalogs";

// What the catalog tables show, filter and sort on. Pure: the page builds rows on the server, the
// browser filters and sorts them.

export interface CatalogRow extends SummaryRow {
  origin: EntryOrigin;
  lifeSafety: boolean;
}

export interface Column {
  key: string;
  label: string;
  unit: string;
}

/** The figures worth a column (and a sort) for each kind, by `Figure.key`; `listPrice` is the row's price. */
const columnKeys: Record<CatalogKind, string[]> = {
  inputTypes: ["schemes", "eolOhms", "alarmOhms", "sharedOhms", "tolerancePct", "maxLoopOhms", "lifeSafety"],
  panels: ["family", "onboardInputs.count", "onboardInputs.inputType", "maxZones", "bus.maxDevices", "bus.maxCableM", "auxOutputMa", "sirenOutputMa", "ownStandbyMa", "maxBatteryAh", "listPrice"],
  expansionBoards: ["families", "inputs.count", "inputs.inputType", "standbyMa", "alarmMa", "ownSupply.outputMa", "ownSupply.maxBatteryAh", "listPrice"],
  keypads: ["families", "inputs.count", "inputs.inputType", "standbyMa", "alarmMa", "listPrice"],
  powerSupplies: ["families", "outputMa", "outputVolts", "maxBatteryAh", "standbyMa", "alarmMa", "listPrice"],
  detectors: ["category", "contact", "tamper", "power.standbyMa", "power.alarmMa", "power.minVolts", "lifeSafety", "listPrice"],
  sounders: ["placement", "standbyMa", "alarmMa", "ownBattery.chargingMa", "minVolts", "listPrice"],
  strobes: ["standbyMa", "alarmMa", "minVolts", "listPrice"],
  outputModules: ["families", "outputs", "standbyMa", "alarmMa", "listPrice"],
  wirelessReceivers: ["families", "maxDevices", "standbyMa", "alarmMa", "listPrice"],
  wirelessDetectors: ["category", "tamper", "batteryYears", "lifeSafety", "listPrice"],
};

/** Columns of one kind's table, labelled from the figures themselves; a figure no row has is left out. */
export function columnsFor(kind: CatalogKind, rows: CatalogRow[]): Column[] {
  const own = rows.filter((r) => r.kind === kind);
  return columnKeys[kind].flatMap((key): Column[] => {
    if (key === "listPrice") return own.some((r) => r.listPrice !== null) ? [{ key, label: "List price", unit: "" }] : [];
    const fig = own.flatMap((r) => r.figures).find((x) => x.key === key);
    return fig ? [{ key, label: fig.label, unit: fig.unit }] : [];
  });
}

export function cellValue(row: CatalogRow, key: string): number | string | null {
  if (key === "listPrice") return row.listPrice;
  if (key === "name") return row.name;
  return row.figures.find((x) => x.key === key)?.value ?? null;
}

export interface TableState {
  kind: CatalogKind | "all";
  q: string;
  source: "all" | "upload";
  sort: string;
  dir: "asc" | "desc";
}

export const defaultTableState: TableState = { kind: "all", q: "", source: "all", sort: "name", dir: "asc" };

/** Reads a table state from URL search parameters, ignoring anything unknown. */
export function tableStateFrom(params: Record<string, string | string[] | undefined>): TableState {
  const one = (k: string) => (typeof params[k] === "string" ? (params[k] as string) : undefined);
  const kind = one("kind");
  return {
    kind: kind && (catalogKinds as readonly string[]).includes(kind) ? (kind as CatalogKind) : "all",
    q: (one("q") ?? "").slice(0, 200),
    source: one("source") === "upload" ? "upload" : "all",
    sort: /^[A-Za-z.]{1,60}$/.test(one("sort") ?? "") ? one("sort")! : "name",
    dir: one("dir") === "desc" ? "desc" : "asc",
  };
}

export function tableQuery(s: TableState): string {
  const p = new URLSearchParams();
  if (s.kind !== "all") p.set("kind", s.kind);
  if (s.q) p.set("q", s.q);
  if (s.source !== "all") p.set("source", s.source);
  if (s.sort !== "name" || s.dir !== "asc") {
    p.set("sort", s.sort);
    p.set("dir", s.dir);
  }
  const q = p.toString();
  return q ? `?${q}` : "";
}

/** Every word of the query must appear in the id, name, description, kind or a figure's value. */
export function matches(row: CatalogRow, q: string): boolean {
  const words = q.toLowerCase().split(/\s+/).filter(Boolean);
  if (!words.length) return true;
  const hay = [row.id, row.name, row.description, row.kindLabel, ...row.figures.map((x) => `${x.value}${x.unit ? ` ${x.unit}` : ""}`)].join(" \u0001 ").toLowerCase();
  return words.every((w) => hay.includes(w));
}

/** Numbers compare as numbers, text as text; rows without the value go last whichever way. Ties by name. */
export function compareRows(a: CatalogRow, b: CatalogRow, key: string, dir: "asc" | "desc"): number {
  const x = cellValue(a, key);
  const y = cellValue(b, key);
  const byName = a.name.localeCompare(b.name);
  if (x === null || y === null) return x === y ? byName : x === null ? 1 : -1;
  const c = typeof x === "number" && typeof y === "number" ? x - y : String(x).localeCompare(String(y), undefined, { numeric: true });
  return (dir === "asc" ? c : -c) || byName;
}

/** The rows of one kind's table after filtering and sorting; a sort key the kind lacks sorts by name. */
export function visibleRows(rows: CatalogRow[], kind: CatalogKind, s: TableState): CatalogRow[] {
  const keys = new Set(["name", ...columnsFor(kind, rows).map((c) => c.key)]);
  const key = keys.has(s.sort) ? s.sort : "name";
  const dir = keys.has(s.sort) ? s.dir : "asc";
  return rows
    .filter((r) => r.kind === kind && (s.source === "all" || r.origin !== "shipped") && matches(r, s.q))
    .sort((a, b) => compareRows(a, b, key, dir));
}
