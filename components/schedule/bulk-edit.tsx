"use client";

import { useState } from "react";
import { supervisionPreferenceSchema, type BulkEditPatch } from "@/lib/schedule/schema";
import { Button } from "@/components/ui/button";
import { bulkPatch } from "@/components/schedule/schedule-rows";
import { supervisionLabels, type SiteArea } from "@/components/schedule/schedule-labels";
import { useFormat } from "@/components/format/format-provider";
import { lengthUnit } from "@/lib/format/length-input";

/** Set fields of every selected detector at once, or delete them. */
export function BulkEdit({ count, areas, onApply, onDelete, onClear }: { count: number; areas: SiteArea[]; onApply: (patch: BulkEditPatch["patch"]) => void; onDelete: () => void; onClear: () => void }) {
  const [error, setError] = useState<string | null>(null);
  const { units } = useFormat().settings;
  return (
    <form
      aria-label="Bulk edit"
      data-testid="bulk-edit"
      className="flex flex-wrap items-end gap-3 rounded-lg border border-signal bg-signal-soft p-3 text-sm"
      onSubmit={(e) => {
        e.preventDefault();
        const f = new FormData(e.currentTarget);
        const field = (name: string) => String(f.get(name) ?? "");
        const r = bulkPatch({ area: field("area"), cableM: field("cableM"), gauge: field("gauge"), supervision: field("supervision") }, units);
        if ("error" in r) return setError(r.error);
        setError(null);
        onApply(r.patch);
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
        Cable run ({lengthUnit(units)})
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
