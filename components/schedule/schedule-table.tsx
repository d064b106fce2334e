"use client";

import { formatGauge, type ScheduleDetector } from "@/lib/schedule/schema";
import { DetectorForm } from "@/components/schedule/detector-form";
import { LongText } from "@/components/ui/long-text";
import { nextSort, SCHEDULE_COLUMNS, type ScheduleSort } from "@/components/schedule/schedule-rows";
import { supervisionLabels, type DetectorType, type SiteArea } from "@/components/schedule/schedule-labels";
import { useFormat } from "@/components/format/format-provider";
import { lengthCell, lengthUnit } from "@/lib/format/length-input";

export interface ScheduleTableProps {
  rows: ScheduleDetector[];
  /** The whole schedule's size, for the empty-table sentence. */
  total: number;
  types: DetectorType[];
  areas: SiteArea[];
  typeName: Map<string, string>;
  canWrite: boolean;
  sort: ScheduleSort;
  onSort: (sort: ScheduleSort) => void;
  selected: Set<string>;
  onSelect: (selected: Set<string>) => void;
  editing: string | null;
  onEdit: (id: string | null) => void;
  /** Save one detector's edit; the error sentence, or null when saved. */
  onSave: (detector: ScheduleDetector, values: Omit<ScheduleDetector, "id">) => Promise<string | null>;
}

/** The schedule's rows with sortable headings, row selection and in-place editing. */
export function ScheduleTable(props: ScheduleTableProps) {
  const { rows, total, types, areas, typeName, canWrite, sort, onSort, selected, onSelect, editing, onEdit, onSave } = props;
  const fire = new Set(types.filter((t) => t.lifeSafety).map((t) => t.id));
  const visibleIds = rows.map((d) => d.id);
  const allVisibleSelected = visibleIds.length > 0 && visibleIds.every((id) => selected.has(id));
  const toggle = (id: string) => onSelect(selected.has(id) ? new Set([...selected].filter((x) => x !== id)) : new Set([...selected, id]));
  const span = SCHEDULE_COLUMNS.length + 2;
  const { units } = useFormat().settings;

  return (
    <div className="relative overflow-x-auto rounded-lg border border-line bg-white">
      <table className="w-full text-sm" data-testid="schedule-table">
        <caption className="sr-only">Device schedule; select a column heading to sort</caption>
        <thead className="text-left text-slate-600">
          <tr>
            {canWrite ? (
              <th className="w-8 px-2 py-2">
                <input
                  type="checkbox"
                  aria-label="Select every detector shown"
                  checked={allVisibleSelected}
                  onChange={() => onSelect(allVisibleSelected ? new Set([...selected].filter((id) => !visibleIds.includes(id))) : new Set([...selected, ...visibleIds]))}
                />
              </th>
            ) : null}
            {SCHEDULE_COLUMNS.map((c) => (
              <th key={c.key} aria-sort={sort?.key === c.key ? (sort.dir === 1 ? "ascending" : "descending") : "none"} className={`px-2 py-2 ${c.numeric ? "text-right" : ""}`}>
                <button type="button" className="font-medium hover:text-ink" onClick={() => onSort(nextSort(sort, c.key))}>
                  {c.key === "cableM" ? `Cable (${lengthUnit(units)})` : c.label}
                  <span aria-hidden className="ml-1 text-xs">
                    {sort?.key === c.key ? (sort.dir === 1 ? "▲" : "▼") : ""}
                  </span>
                </button>
              </th>
            ))}
            {canWrite ? (
              <th className="px-2 py-2">
                <span className="sr-only">Actions</span>
              </th>
            ) : null}
          </tr>
        </thead>
        <tbody>
          {rows.length === 0 ? (
            <tr>
              <td colSpan={span} className="px-2 py-6 text-center text-slate-600">
                {total === 0 ? "The schedule is empty. Add detectors one by one or import a CSV file." : "No detector matches the filter."}
              </td>
            </tr>
          ) : null}
          {rows.map((d) =>
            editing === d.id ? (
              <tr key={d.id} className="border-t border-line bg-slate-50">
                <td colSpan={span} className="p-3">
                  <DetectorForm types={types} areas={areas} initial={d} submitLabel="Save changes" onCancel={() => onEdit(null)} onSubmit={(v) => onSave(d, v)} />
                </td>
              </tr>
            ) : (
              <tr key={d.id} className={`border-t border-line ${selected.has(d.id) ? "bg-signal-soft" : ""}`} data-testid={`schedule-row-${d.id}`}>
                {canWrite ? (
                  <td className="px-2 py-1.5">
                    <input type="checkbox" aria-label={`Select ${d.label}`} checked={selected.has(d.id)} onChange={() => toggle(d.id)} />
                  </td>
                ) : null}
                <td className="max-w-[16rem] px-2 py-1.5 font-medium">
                  <LongText text={d.label} />
                </td>
                <td className="px-2 py-1.5">
                  {typeName.get(d.catalogId) ?? <span className="text-fault">{d.catalogId} (not in the catalog)</span>}
                  {fire.has(d.catalogId) ? <span className="ml-1 rounded bg-fault px-1 text-[10px] font-semibold text-white">FIRE</span> : null}
                </td>
                <td className="max-w-[12rem] px-2 py-1.5">
                  <LongText text={d.area} />
                </td>
                <td className="max-w-[12rem] px-2 py-1.5">
                  <LongText text={d.room} />
                </td>
                <td className="px-2 py-1.5 text-right tabular-nums">{lengthCell(d.cableM, units)}</td>
                <td className="px-2 py-1.5">{formatGauge(d.gauge)}</td>
                <td className="px-2 py-1.5">{supervisionLabels[d.supervision]}</td>
                {canWrite ? (
                  <td className="px-2 py-1.5 text-right">
                    <button type="button" className="text-signal underline underline-offset-2" onClick={() => onEdit(d.id)} aria-label={`Edit ${d.label}`}>
                      Edit
                    </button>
                  </td>
                ) : null}
              </tr>
            ),
          )}
        </tbody>
      </table>
    </div>
  );
}
