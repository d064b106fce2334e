"use client";

import { useState } from "react";
import type { ImportPreview } from "@/lib/server/schedules";
import { scheduleCsvColumns } from "@/lib/schedule/csv";
import { formatGauge, TEXT_LIMITS } from "@/lib/schedule/schema";
import type { SiteDetail } from "@/lib/server/sites";
import { importRequestSchema } from "@/lib/schedule/schedule-request-schema";
import { describeError, fetcher, sendJson } from "@/lib/client/fetcher";
import { useSiteAreas } from "@/components/schedule/site-areas-context";
import { UnknownPlaces } from "@/components/schedule/unknown-places";
import { Button } from "@/components/ui/button";
import { LongText } from "@/components/ui/long-text";
import { siteAreasOf, supervisionLabels, type DetectorType } from "@/components/schedule/schedule-labels";
import { plural } from "@/lib/vocabulary/plural";
import { useFormat } from "@/components/format/format-provider";
import { lengthCell } from "@/lib/format/length-input";

/** Upload a CSV file, see every row and every problem with its row number, and only then store it. */
export function CsvImport({ siteId, types, onImported }: { siteId: number; types: DetectorType[]; onImported: (count: number) => void }) {
  const [file, setFile] = useState<{ name: string; text: string } | null>(null);
  const [preview, setPreview] = useState<ImportPreview | null>(null);
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const [addPlaces, setAddPlaces] = useState(false);
  const places = useSiteAreas();
  const { units } = useFormat().settings;
  const typeName = new Map(types.map((t) => [t.id, t.name]));

  async function choose(f: File | undefined) {
    setPreview(null);
    setAddPlaces(false);
    setError(null);
    if (!f) return setFile(null);
    if (f.size > 1024 * 1024) return setError("The file is larger than 1 MiB.");
    const text = await f.text();
    setFile({ name: f.name, text });
    setBusy(true);
    try {
      setPreview(await sendJson<ImportPreview>(`/api/sites/${siteId}/schedule/import`, "POST", { mode: "preview", csv: text, fileName: f.name }));
    } catch (e) {
      setError(describeError(e));
    } finally {
      setBusy(false);
    }
  }

  async function confirm() {
    if (!file) return;
    setBusy(true);
    try {
      const r = await sendJson<{ imported: number; addedPlaces: unknown[] }>(`/api/sites/${siteId}/schedule/import`, "POST", importRequestSchema.parse({ mode: "confirm", csv: file.text, fileName: file.name, addUnknownPlaces: addPlaces }));
      if (r.addedPlaces.length && places) places.setAreas(siteAreasOf(await fetcher<SiteDetail>(`/api/sites/${siteId}`)));
      setFile(null);
      setPreview(null);
      onImported(r.imported);
    } catch (e) {
      setError(describeError(e));
    } finally {
      setBusy(false);
    }
  }

  const errorsByRow = new Map<number, string[]>();
  for (const e of preview?.errors ?? []) errorsByRow.set(e.row, [...(errorsByRow.get(e.row) ?? []), `${e.column ? `${e.column}: ` : ""}${e.message}`]);

  return (
    <div data-testid="csv-import">
      <p className="text-sm text-slate-600">
        Columns: <code className="text-xs">{scheduleCsvColumns.join(", ")}</code>. <code className="text-xs">type</code> is a detector id from the catalog; gauge as &quot;22 AWG&quot; or &quot;0.5 mm2&quot;; a blank
        supervision means single end-of-line. A label is at most {TEXT_LIMITS.label} characters, an area or a room at most {TEXT_LIMITS.area}; a longer one is refused with its row, never cut. Imported rows are added after the existing ones; nothing is stored until you confirm.
      </p>
      <label className="mt-3 block text-sm">
        <span className="font-medium">CSV file</span>
        <input type="file" accept=".csv,text/csv" className="mt-1 block text-sm" onChange={(e) => void choose(e.target.files?.[0])} />
      </label>
      {busy && !preview ? <p className="mt-2 text-sm text-slate-600">Checking the file…</p> : null}
      {error ? (
        <p role="alert" className="mt-2 text-sm text-fault">
          {error}
        </p>
      ) : null}
      {preview ? (
        <div className="mt-3" data-testid="import-preview">
          <p className="text-sm" role="status">
            {file?.name}: {plural(preview.rows.length, "row")} ready
            {preview.errors.length ? (
              <span className="font-medium text-fault">
                , {plural(preview.errors.length, "problem")} in {plural(errorsByRow.size, "row")} — correct the file and choose it again; nothing will be imported while there are problems.
              </span>
            ) : (
              "."
            )}
          </p>
          {preview.errors.length ? (
            <ul className="mt-2 max-h-48 overflow-y-auto rounded border border-fault bg-fault-soft p-2 text-xs [overflow-wrap:anywhere]" data-testid="import-errors">
              {[...errorsByRow.entries()].map(([row, msgs]) => (
                <li key={row}>
                  <span className="font-semibold">Row {row}</span>
                  {row === 1 ? " (header)" : ""}: {msgs.join("; ")}
                </li>
              ))}
            </ul>
          ) : null}
          {preview.unknownPlaces.length && !preview.errors.length ? <UnknownPlaces places={preview.unknownPlaces} add={addPlaces} onAdd={setAddPlaces} /> : null}
          <div className="mt-2 max-h-72 overflow-auto">
            <table className="w-full text-xs">
              <thead className="sticky top-0 bg-white text-left text-slate-500">
                <tr>
                  <th className="py-1 pr-2">Row</th>
                  <th className="pr-2">Label</th>
                  <th className="pr-2">Type</th>
                  <th className="pr-2">Area</th>
                  <th className="pr-2">Room</th>
                  <th className="pr-2 text-right">Cable</th>
                  <th className="pr-2">Gauge</th>
                  <th>Supervision</th>
                </tr>
              </thead>
              <tbody>
                {preview.rows.map((r) => (
                  <tr key={r.row} className="border-t border-line">
                    <td className="py-1 pr-2 font-mono">{r.row}</td>
                    <td className="max-w-[14rem] pr-2">
                      <LongText text={r.detector.label} />
                    </td>
                    <td className="pr-2">{typeName.get(r.detector.catalogId) ?? r.detector.catalogId}</td>
                    <td className="max-w-[10rem] pr-2">
                      <LongText text={r.detector.area} />
                    </td>
                    <td className="max-w-[10rem] pr-2">
                      <LongText text={r.detector.room} />
                    </td>
                    <td className="pr-2 text-right">{lengthCell(r.detector.cableM, units)}</td>
                    <td className="pr-2">{formatGauge(r.detector.gauge)}</td>
                    <td>{supervisionLabels[r.detector.supervision]}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
          <div className="mt-3 flex gap-2">
            <Button onClick={confirm} disabled={busy || preview.errors.length > 0 || preview.rows.length === 0 || (preview.unknownPlaces.length > 0 && !addPlaces)}>
              {preview.unknownPlaces.length && addPlaces ? `Add ${preview.unknownPlaces.length} and import ` : "Import "}
              {plural(preview.rows.length, "detector")}
            </Button>
            <Button variant="secondary" onClick={() => (setFile(null), setPreview(null))}>
              Cancel
            </Button>
          </div>
        </div>
      ) : null}
    </div>
  );
}
