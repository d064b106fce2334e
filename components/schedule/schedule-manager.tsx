"use client";

import { useMemo, useState } from "react";
import { formatGauge, parseGauge, supervisionPreferenceSchema, type BulkEditPatch, type ScheduleDetector, type SupervisionPreference } from "@/lib/schedule/schema";
import { describeError, sendJson } from "@/lib/client/fetcher";
import { useSchedule } from "@/lib/client/use-schedule";
import { Button } from "@/components/ui/button";
import { Card } from "@/components/ui/card";
import { CsvImport } from "@/components/schedule/csv-import";
import { DetectorForm } from "@/components/schedule/detector-form";
import { supervisionLabels, type DetectorType, type SiteArea } from "@/components/schedule/schedule-labels";

type SortKey = "label" | "type" | "area" | "room" | "cableM" | "gauge" | "supervision";
const columns: { key: SortKey; label: string; numeric?: boolean }[] = [
  { key: "label", label: "Label" },
  { key: "type", label: "Type" },
  { key: "area", label: "Area" },
  { key: "room", label: "Room" },
  { key: "cableM", label: "Cable (m)", numeric: true },
  { key: "gauge", label: "Gauge" },
  { key: "supervision", label: "Supervision" },
];

// Gauge sorts by copper area: AWG n is 0.012668 · 92^((36−n)/19.5) mm² (ASTM B258 definition of the AWG series).
const gaugeMm2 = (d: ScheduleDetector) => ("mm2" in d.gauge ? d.gauge.mm2 : 0.012668 * Math.pow(92, (36 - d.gauge.awg) / 19.5));

function BulkEdit({ count, areas, onApply, onDelete, onClear }: { count: number; areas: SiteArea[]; onApply: (patch: BulkEditPatch["patch"]) => void; onDelete: () => void; onClear: () => void }) {
  const [error, setError] = useState<string | null>(null);
  return (
    <form
      aria-label="Bulk edit"
      data-testid="bulk-edit"
      className="flex flex-wrap items-end gap-3 rounded-lg border border-signal bg-signal-soft p-3 text-sm"
      onSubmit={(e) => {
        e.preventDefault();
        const f = new FormData(e.currentTarget);
        const patch: BulkEditPatch["patch"] = {};
        const area = String(f.get("area") ?? "").trim();
        const cable = String(f.get("cableM") ?? "").trim();
        const gauge = String(f.get("gauge") ?? "").trim();
        const supervision = String(f.get("supervision") ?? "");
        if (area) patch.area = area;
        if (cable) {
          const n = Number(cable);
          if (!(n > 0 && n <= 2000)) return setError("the cable run must be more than 0 m and at most 2000 m");
          patch.cableM = n;
        }
        if (gauge) {
          const g = parseGauge(gauge);
          if (!g) return setError('write a gauge such as "22 AWG" or "0.5 mm2"');
          patch.gauge = g;
        }
        if (supervision) patch.supervision = supervision as SupervisionPreference;
        if (!Object.keys(patch).length) return setError("fill in at least one field to change");
        setError(null);
        onApply(patch);
      }}
    >
      <p className="w-full font-medium">
        {count} selected: set for all of them (blank fields stay as they are)
      </p>
      <label>
        Area
        <input name="area" list="bulk-areas" className="mt-1 block w-36 rounded border border-line bg-white px-2 py-1" />
        <datalist id="bulk-areas">
          {areas.map((a) => (
            <option key={a.name} value={a.name} />
          ))}
        </datalist>
      </label>
      <label>
        Cable run (m)
        <input name="cableM" type="number" step="any" min={0} className="mt-1 block w-24 rounded border border-line bg-white px-2 py-1" />
      </label>
      <label>
        Gauge
        <input name="gauge" placeholder="22 AWG" className="mt-1 block w-24 rounded border border-line bg-white px-2 py-1" />
      </label>
      <label>
        Supervision
        <select name="supervision" className="mt-1 block rounded border border-line bg-white px-2 py-1" defaultValue="">
          <option value="">(unchanged)</option>
          {supervisionPreferenceSchema.options.map((s) => (
            <option key={s} value={s}>
              {supervisionLabels[s]}
            </option>
          ))}
        </select>
      </label>
      <Button type="submit">Apply to {count}</Button>
      <Button type="button" variant="danger" onClick={onDelete}>
        Delete {count}
      </Button>
      <Button type="button" variant="secondary" onClick={onClear}>
        Clear selection
      </Button>
      {error ? (
        <p role="alert" className="w-full text-fault">
          {error}
        </p>
      ) : null}
    </form>
  );
}

/** The device schedule: a sortable, filterable table with add, edit, bulk edit, CSV import and export. */
export function ScheduleManager({ siteId, initial, types, areas, canWrite }: { siteId: number; initial: ScheduleDetector[]; types: DetectorType[]; areas: SiteArea[]; canWrite: boolean }) {
  const { detectors, mutate } = useSchedule(siteId, initial);
  // null: schedule order (as imported or added)
  const [sort, setSort] = useState<{ key: SortKey; dir: 1 | -1 } | null>(null);
  const [filter, setFilter] = useState("");
  const [areaFilter, setAreaFilter] = useState("");
  const [selected, setSelected] = useState<Set<string>>(new Set());
  const [editing, setEditing] = useState<string | null>(null);
  const [message, setMessage] = useState<{ kind: "ok" | "error"; text: string } | null>(null);
  const [panel, setPanel] = useState<"none" | "add" | "import">("none");
  const typeName = useMemo(() => new Map(types.map((t) => [t.id, t.name])), [types]);
  const fire = new Set(types.filter((t) => t.lifeSafety).map((t) => t.id));
  const areaNames = [...new Set([...areas.map((a) => a.name), ...detectors.map((d) => d.area)])].filter(Boolean);

  const rows = useMemo(() => {
    const q = filter.trim().toLowerCase();
    // areas sort in the site's own order (basement, ground, first...), others after them by name
    const areaRank = new Map(areas.map((a, i) => [a.name, i]));
    const value = (d: ScheduleDetector, k: SortKey): string | number =>
      k === "area" ? (areaRank.get(d.area) ?? areas.length) * 1e6 + (d.area ? 0 : 1) : k === "type" ? (typeName.get(d.catalogId) ?? d.catalogId) : k === "cableM" ? d.cableM : k === "gauge" ? gaugeMm2(d) : k === "supervision" ? supervisionLabels[d.supervision] : d[k];
    return detectors
      .filter((d) => (!areaFilter || d.area === areaFilter) && (!q || [d.label, d.room, d.area, d.catalogId, typeName.get(d.catalogId) ?? ""].some((s) => s.toLowerCase().includes(q))))
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
  }, [detectors, filter, areaFilter, sort, typeName, areas]);

  const visibleIds = rows.map((d) => d.id);
  const allVisibleSelected = visibleIds.length > 0 && visibleIds.every((id) => selected.has(id));
  const toggle = (id: string) => setSelected((s) => (s.has(id) ? new Set([...s].filter((x) => x !== id)) : new Set([...s, id])));

  async function run(fn: () => Promise<string>) {
    try {
      const text = await fn();
      setMessage({ kind: "ok", text });
      await mutate();
      return null;
    } catch (e) {
      const text = describeError(e);
      setMessage({ kind: "error", text });
      return text;
    }
  }

  return (
    <div className="flex flex-col gap-4">
      <div className="flex flex-wrap items-end gap-3">
        <label className="text-sm">
          <span className="font-medium">Filter</span>
          <input type="search" value={filter} onChange={(e) => setFilter(e.target.value)} placeholder="label, room or type" className="mt-1 block w-56 rounded-md border border-line bg-white px-2 py-1.5" />
        </label>
        <label className="text-sm">
          <span className="font-medium">Area</span>
          <select value={areaFilter} onChange={(e) => setAreaFilter(e.target.value)} className="mt-1 block rounded-md border border-line bg-white px-2 py-1.5">
            <option value="">All areas</option>
            {areaNames.map((a) => (
              <option key={a} value={a}>
                {a}
              </option>
            ))}
          </select>
        </label>
        <p className="text-sm text-slate-600" aria-live="polite">
          {rows.length} of {detectors.length} detectors shown{sort ? "" : ", in schedule order"}
          {sort ? (
            <button type="button" className="ml-2 text-signal underline" onClick={() => setSort(null)}>
              schedule order
            </button>
          ) : null}
        </p>
        <div className="ml-auto flex gap-2">
          {canWrite ? (
            <>
              <Button variant={panel === "add" ? "primary" : "secondary"} onClick={() => setPanel(panel === "add" ? "none" : "add")}>
                Add detector
              </Button>
              <Button variant={panel === "import" ? "primary" : "secondary"} onClick={() => setPanel(panel === "import" ? "none" : "import")}>
                Import CSV
              </Button>
            </>
          ) : null}
          <a href={`/api/sites/${siteId}/schedule/export.csv`} download className="inline-flex items-center rounded-md border border-line bg-white px-3 py-2 text-sm font-medium hover:bg-slate-50">
            Export CSV
          </a>
        </div>
      </div>

      {message ? (
        <p role={message.kind === "error" ? "alert" : "status"} className={`text-sm ${message.kind === "error" ? "text-fault" : "text-signal"}`} data-testid="schedule-message">
          {message.text}
        </p>
      ) : null}

      {panel === "add" && canWrite ? (
        <Card>
          <h2 className="mb-2 font-semibold">Add a detector</h2>
          <DetectorForm
            types={types}
            areas={areas}
            submitLabel="Add detector"
            onSubmit={(v) => run(async () => (await sendJson<ScheduleDetector>(`/api/sites/${siteId}/schedule`, "POST", v), `${v.label} added.`))}
          />
        </Card>
      ) : null}
      {panel === "import" && canWrite ? (
        <Card>
          <h2 className="mb-2 font-semibold">Import a device schedule</h2>
          <CsvImport
            siteId={siteId}
            types={types}
            onImported={(n) => {
              setPanel("none");
              setMessage({ kind: "ok", text: `${n} detector${n === 1 ? "" : "s"} imported.` });
              void mutate();
            }}
          />
        </Card>
      ) : null}

      {canWrite && selected.size > 0 ? (
        <BulkEdit
          count={selected.size}
          areas={areas}
          onClear={() => setSelected(new Set())}
          onApply={(patch) => void run(async () => (await sendJson(`/api/sites/${siteId}/schedule`, "PATCH", { ids: [...selected], patch }), `${selected.size} detectors changed.`))}
          onDelete={() => {
            if (!window.confirm(`Delete ${selected.size} detectors from the schedule? Layouts that place them will lose them at their next opening.`)) return;
            void run(async () => {
              const r = await sendJson<{ deleted: number }>(`/api/sites/${siteId}/schedule`, "DELETE", { ids: [...selected] });
              setSelected(new Set());
              return `${r.deleted} detectors deleted.`;
            });
          }}
        />
      ) : null}

      <div className="overflow-x-auto rounded-lg border border-line bg-white">
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
                    onChange={() => setSelected(allVisibleSelected ? new Set([...selected].filter((id) => !visibleIds.includes(id))) : new Set([...selected, ...visibleIds]))}
                  />
                </th>
              ) : null}
              {columns.map((c) => (
                <th key={c.key} aria-sort={sort?.key === c.key ? (sort.dir === 1 ? "ascending" : "descending") : "none"} className={`px-2 py-2 ${c.numeric ? "text-right" : ""}`}>
                  <button type="button" className="font-medium hover:text-ink" onClick={() => setSort((s) => ({ key: c.key, dir: s?.key === c.key ? (s.dir === 1 ? -1 : 1) : 1 }))}>
                    {c.label}
                    <span aria-hidden className="ml-1 text-xs">
                      {sort?.key === c.key ? (sort.dir === 1 ? "▲" : "▼") : ""}
                    </span>
                  </button>
                </th>
              ))}
              {canWrite ? <th className="px-2 py-2">
                <span className="sr-only">Actions</span>
              </th> : null}
            </tr>
          </thead>
          <tbody>
            {rows.length === 0 ? (
              <tr>
                <td colSpan={columns.length + 2} className="px-2 py-6 text-center text-slate-600">
                  {detectors.length === 0 ? "The schedule is empty. Add detectors one by one or import a CSV file." : "No detector matches the filter."}
                </td>
              </tr>
            ) : null}
            {rows.map((d) =>
              editing === d.id ? (
                <tr key={d.id} className="border-t border-line bg-slate-50">
                  <td colSpan={columns.length + 2} className="p-3">
                    <DetectorForm
                      types={types}
                      areas={areas}
                      initial={d}
                      submitLabel="Save changes"
                      onCancel={() => setEditing(null)}
                      onSubmit={async (v) => {
                        const err = await run(async () => (await sendJson(`/api/sites/${siteId}/schedule/${d.id}`, "PATCH", v), `${v.label} saved.`));
                        if (!err) setEditing(null);
                        return err;
                      }}
                    />
                  </td>
                </tr>
              ) : (
                <tr key={d.id} className={`border-t border-line ${selected.has(d.id) ? "bg-signal-soft" : ""}`} data-testid={`schedule-row-${d.id}`}>
                  {canWrite ? (
                    <td className="px-2 py-1.5">
                      <input type="checkbox" aria-label={`Select ${d.label}`} checked={selected.has(d.id)} onChange={() => toggle(d.id)} />
                    </td>
                  ) : null}
                  <td className="px-2 py-1.5 font-medium">{d.label}</td>
                  <td className="px-2 py-1.5">
                    {typeName.get(d.catalogId) ?? <span className="text-fault">{d.catalogId} (not in the catalog)</span>}
                    {fire.has(d.catalogId) ? <span className="ml-1 rounded bg-fault px-1 text-[10px] font-semibold text-white">FIRE</span> : null}
                  </td>
                  <td className="px-2 py-1.5">{d.area}</td>
                  <td className="px-2 py-1.5">{d.room}</td>
                  <td className="px-2 py-1.5 text-right tabular-nums">{d.cableM} m</td>
                  <td className="px-2 py-1.5">{formatGauge(d.gauge)}</td>
                  <td className="px-2 py-1.5">{supervisionLabels[d.supervision]}</td>
                  {canWrite ? (
                    <td className="px-2 py-1.5 text-right">
                      <button type="button" className="text-signal hover:underline" onClick={() => setEditing(d.id)} aria-label={`Edit ${d.label}`}>
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
    </div>
  );
}
