"use client";

import { useMemo, useState } from "react";
import type { ScheduleDetector } from "@/lib/schedule/schema";
import { Button } from "@/components/ui/button";
import { Card } from "@/components/ui/card";
import { BulkEdit } from "@/components/schedule/bulk-edit";
import { CsvImport } from "@/components/schedule/csv-import";
import { DetectorForm } from "@/components/schedule/detector-form";
import { scheduleRows, type ScheduleSort } from "@/components/schedule/schedule-rows";
import { ScheduleTable } from "@/components/schedule/schedule-table";
import { supervisionLabels, type DetectorType, type SiteArea } from "@/components/schedule/schedule-labels";
import { useScheduleEdits } from "@/components/schedule/use-schedule-edits";
import { plural } from "@/lib/vocabulary/plural";

/** The device schedule: a sortable, filterable table with add, edit, bulk edit, CSV import and export. */
export function ScheduleManager({ siteId, initial, types, areas, canWrite }: { siteId: number; initial: ScheduleDetector[]; types: DetectorType[]; areas: SiteArea[]; canWrite: boolean }) {
  const edits = useScheduleEdits(siteId, initial);
  const { detectors, message } = edits;
  // null: schedule order (as imported or added)
  const [sort, setSort] = useState<ScheduleSort>(null);
  const [filter, setFilter] = useState("");
  const [areaFilter, setAreaFilter] = useState("");
  const [selected, setSelected] = useState<Set<string>>(new Set());
  const [editing, setEditing] = useState<string | null>(null);
  const [panel, setPanel] = useState<"none" | "add" | "import">("none");
  const typeName = useMemo(() => new Map(types.map((t) => [t.id, t.name])), [types]);
  const areaNames = [...new Set([...areas.map((a) => a.name), ...detectors.map((d) => d.area)])].filter(Boolean);
  const rows = useMemo(() => scheduleRows(detectors, { filter, area: areaFilter, sort }, typeName, areas.map((a) => a.name), supervisionLabels), [detectors, filter, areaFilter, sort, typeName, areas]);
  const togglePanel = (p: "add" | "import") => setPanel(panel === p ? "none" : p);

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
          {rows.length} of {plural(detectors.length, "detector")} shown{sort ? "" : ", in schedule order"}
          {sort ? (
            <button type="button" className="ml-2 text-signal underline" onClick={() => setSort(null)}>
              schedule order
            </button>
          ) : null}
        </p>
        <div className="ml-auto flex gap-2">
          {canWrite ? (
            <>
              <Button variant={panel === "add" ? "primary" : "secondary"} onClick={() => togglePanel("add")}>
                Add detector
              </Button>
              <Button variant={panel === "import" ? "primary" : "secondary"} onClick={() => togglePanel("import")}>
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
          <DetectorForm types={types} areas={areas} submitLabel="Add detector" onSubmit={edits.add} />
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
              edits.imported(n);
            }}
          />
        </Card>
      ) : null}

      {canWrite && selected.size > 0 ? (
        <BulkEdit
          count={selected.size}
          areas={areas}
          onClear={() => setSelected(new Set())}
          onApply={(patch) => void edits.patchMany([...selected], patch)}
          onDelete={() => {
            if (!window.confirm(`Delete ${plural(selected.size, "detector")} from the schedule? Layouts that place them will lose them at their next opening.`)) return;
            void edits.deleteMany([...selected], () => setSelected(new Set()));
          }}
        />
      ) : null}

      <ScheduleTable
        rows={rows}
        total={detectors.length}
        types={types}
        areas={areas}
        typeName={typeName}
        canWrite={canWrite}
        sort={sort}
        onSort={setSort}
        selected={selected}
        onSelect={setSelected}
        editing={editing}
        onEdit={setEditing}
        onSave={async (d, v) => {
          const err = await edits.save(d, v);
          if (!err) setEditing(null);
          return err;
        }}
      />
    </div>
  );
}
