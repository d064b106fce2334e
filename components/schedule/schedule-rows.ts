import { parseGauge, type BulkEditPatch, type ScheduleDetector, type SupervisionPreference } from "@/lib/schedule/schema";
import { lengthUnit, metresToTyped, typedToMetres } from "@/lib/format/length-input";
import type { UnitSystem } from "@/lib/organisation/settings-schema";

// Pure helpers of the device schedule table: which rows show in which order, and the bulk edit's patch.

export type SortKey = "label" | "type" | "area" | "room" | "cableM" | "gauge" | "supervision";
export type ScheduleSort = { key: SortKey; dir: 1 | -1 } | null;

export const SCHEDULE_COLUMNS: { key: SortKey; label: string; numeric?: boolean }[] = [
  { key: "label", label: "Label" },
  { key: "type", label: "Type" },
  { key: "area", label: "Area" },
  { key: "room", label: "Room" },
  { key: "cableM", label: "Cable (m)", numeric: true },
  { key: "gauge", label: "Gauge" },
  { key: "supervision", label: "Supervision" },
];

// Gauge sorts by copper area: AWG n is 0.012668 · 92^((36−n)/19.5) mm² (ASTM B258 definition of the AWG series).
export const gaugeMm2 = (d: Pick<ScheduleDetector, "gauge">) => ("mm2" in d.gauge ? d.gauge.mm2 : 0.012668 * Math.pow(92, (36 - d.gauge.awg) / 19.5));

export interface RowQuery {
  /** Free text matched against label, room, area, catalog id and type name. */
  filter: string;
  /** One area's name, or "" for all. */
  area: string;
  /** null: schedule order (as imported or added). */
  sort: ScheduleSort;
}

/** The rows shown: filtered, then sorted (ties and an unsorted table keep schedule order). */
export function scheduleRows(detectors: ScheduleDetector[], query: RowQuery, typeName: Map<string, string>, areaOrder: string[], supervisionWords: Record<SupervisionPreference, string>): ScheduleDetector[] {
  const { sort } = query;
  const q = query.filter.trim().toLowerCase();
  // areas sort in the site's own order (basement, ground, first...), others after them by name
  const areaRank = new Map(areaOrder.map((a, i) => [a, i]));
  const value = (d: ScheduleDetector, k: SortKey): string | number =>
    k === "area" ? (areaRank.get(d.area) ?? areaOrder.length) * 1e6 + (d.area ? 0 : 1) : k === "type" ? (typeName.get(d.catalogId) ?? d.catalogId) : k === "cableM" ? d.cableM : k === "gauge" ? gaugeMm2(d) : k === "supervision" ? supervisionWords[d.supervision] : d[k];
  return detectors
    .filter((d) => (!query.area || d.area === query.area) && (!q || [d.label, d.room, d.area, d.catalogId, typeName.get(d.catalogId) ?? ""].some((s) => s.toLowerCase().includes(q))))
    .map((d, i) => ({ d, i }))
    .sort((a, b) => {
      if (!sort) return a.i - b.i;
      const x = value(a.d, sort.key);
      const y = value(b.d, sort.key);
      const c = typeof x === "number" && typeof y === "number" ? x - y : String(x).localeCompare(String(y), undefined, { numeric: true });
      const tie = sort.key === "area" && c === 0 ? a.d.area.localeCompare(b.d.area) : 0;
      return (c || tie) * sort.dir || a.i - b.i;
    })
    .map((r) => r.d);
}

/** The next sort after a column heading is chosen: ascending first, then flipping. */
export const nextSort = (s: ScheduleSort, key: SortKey): ScheduleSort => ({ key, dir: s?.key === key ? (s.dir === 1 ? -1 : 1) : 1 });

/** The bulk edit's fields as a patch; blank fields stay as they are. */
/** `units`: the organisation's, in which the cable run is typed (stored in metres). */
export function bulkPatch(fields: { area: string; cableM: string; gauge: string; supervision: string }, units: UnitSystem = "metric"): { patch: BulkEditPatch["patch"] } | { error: string } {
  const patch: BulkEditPatch["patch"] = {};
  const area = fields.area.trim();
  const cable = fields.cableM.trim();
  const gauge = fields.gauge.trim();
  if (area) patch.area = area;
  if (cable) {
    const n = Number(cable);
    const m = Number.isFinite(n) ? typedToMetres(n, units) : NaN;
    if (!(m > 0 && m <= 2000)) return { error: `the cable run must be more than 0 ${lengthUnit(units)} and at most ${metresToTyped(2000, units)} ${lengthUnit(units)}` };
    patch.cableM = m;
  }
  if (gauge) {
    const g = parseGauge(gauge);
    if (!g) return { error: 'write a gauge such as "22 AWG" or "0.5 mm2"' };
    patch.gauge = g;
  }
  if (fields.supervision) patch.supervision = fields.supervision as SupervisionPreference;
  if (!Object.keys(patch).length) return { error: "fill in at least one field to change" };
  return { patch };
}
