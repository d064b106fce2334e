"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import type { PickerLayout } from "@/lib/server/compare";
import { Button } from "@/components/ui/button";
import { Card } from "@/components/ui/card";
import { plural } from "@/components/compare/compare-format";

const MAX_COMPARED = 6;

/** The site's layouts as checkboxes: two to six of them are compared. */
export function ComparePicker({ siteId, layouts, selected, error }: { siteId: number; layouts: PickerLayout[]; selected: number[]; error: string | null }) {
  const router = useRouter();
  const [picked, setPicked] = useState<number[]>(selected.length ? selected : layouts.slice(0, 2).map((l) => l.id));
  const toggle = (id: number) => setPicked((p) => (p.includes(id) ? p.filter((x) => x !== id) : p.length >= MAX_COMPARED ? p : [...p, id]));

  return (
    <Card className="no-print">
      <h2 className="text-lg font-semibold">Pick the layouts to compare</h2>
      {layouts.length < 2 ? <p className="mt-2 text-sm">This site has {layouts.length === 0 ? "no layouts" : "one layout"}: make at least two on the layouts page to compare them.</p> : null}
      <ul className="mt-2 grid grid-cols-1 gap-2 sm:grid-cols-2 lg:grid-cols-3" data-testid="compare-picker">
        {layouts.map((l) => (
          <li key={l.id}>
            <label className="flex cursor-pointer items-start gap-2 rounded-md border border-line bg-white p-2 text-sm hover:bg-slate-50">
              <input type="checkbox" className="mt-1 h-4 w-4" checked={picked.includes(l.id)} onChange={() => toggle(l.id)} />
              <span>
                <span className="font-medium">{l.name}</span>
                <span className="block text-xs text-slate-600">
                  {l.status} · revision {l.currentRevision} · {l.inputsUsed} of {plural(l.inputsTotal, "input")} · {plural(l.errors, "error")}
                </span>
              </span>
            </label>
          </li>
        ))}
      </ul>
      <div className="mt-3 flex items-center gap-3">
        <Button disabled={picked.length < 2} onClick={() => router.push(`/sites/${siteId}/compare?ids=${picked.join(",")}`)}>
          Compare {plural(picked.length, "layout")}
        </Button>
        <span className="text-xs text-slate-600">Two to six layouts.</span>
      </div>
      {error ? (
        <p role="alert" className="mt-2 text-sm font-medium text-fault">
          {error}
        </p>
      ) : null}
    </Card>
  );
}
