"use client";

import { useState } from "react";
import { useEditor } from "@/components/editor/editor-context";
import { documentParts, securityGradeSchema, type SecurityGrade } from "@/lib/layout/schema";
import { boardName } from "@/lib/layout/names";
import { addArea, removeArea, setAreaKeypads, setGrade } from "@/lib/layout/zone-output-operations";
import { CHECK_EDITION } from "@/lib/solver/standby-profiles";
import { plural } from "@/lib/vocabulary/plural";

const GRADE_WORDS: Record<SecurityGrade, string> = { 1: "low risk", 2: "low to medium risk", 3: "medium to high risk", 4: "high risk" };

/** The layout's security grade (with what it changes and where that comes from) and its areas. */
export function AreasGradePanel() {
  const { doc, ctx, ix, canWrite, apply, result } = useEditor();
  const [name, setName] = useState("");
  const areas = documentParts(doc).areas;
  const keypads = doc.boards.filter((b) => b.kind === "keypad");
  const maxAreas = ix.panels.get(doc.panelId)?.maxAreas ?? 1;
  const zonesIn = (key: string) => result.areas.find((a) => a.key === key)?.zones ?? 0;
  const add = () => {
    const edit = addArea(doc, ctx, name);
    apply(edit);
    if (edit.ok) setName("");
  };
  return (
    <section aria-labelledby="areas-grade-heading" className="rounded-lg border border-line bg-white p-3 text-xs" data-testid="areas-grade">
      <h2 id="areas-grade-heading" className="text-sm font-semibold">
        Zones, areas and grade
      </h2>
      <label className="mt-2 block">
        <span className="font-medium">Security grade (EN 50131-1)</span>
        <select
          className="mt-1 block w-full rounded border border-line px-2 py-1"
          value={doc.grade ?? ""}
          disabled={!canWrite}
          onChange={(e) => {
            const g = securityGradeSchema.safeParse(Number(e.target.value));
            if (g.success) apply(setGrade(doc, ctx, g.data as SecurityGrade));
          }}
        >
          {doc.grade === undefined ? <option value="">Not chosen: no grade rule applies</option> : null}
          {([1, 2, 3, 4] as const).map((g) => (
            <option key={g} value={g}>
              Grade {g}: {GRADE_WORDS[g]}
            </option>
          ))}
        </select>
      </label>
      <p className="mt-1 text-slate-600">{CHECK_EDITION}</p>
      {result.grade ? (
        <ul className="mt-1 list-disc pl-4 text-slate-700" data-testid="grade-rules" aria-label={`What grade ${result.grade.grade} asks`}>
          {result.grade.rules.map((r) => (
            <li key={r.text}>
              {r.text} <span className="text-slate-500">({r.source})</span>
            </li>
          ))}
        </ul>
      ) : null}
      <h3 className="mt-3 font-medium">
        Areas <span className="font-normal text-slate-500">({areas.length} of the panel&apos;s {maxAreas})</span>
      </h3>
      <p className="text-slate-600">Each area is set and unset on its own. A zone with no area chosen is in the first one. Choose a zone&apos;s area under Zone on its input.</p>
      <ul className="mt-1 flex flex-col gap-1" aria-label="Areas of this layout">
        {areas.map((a) => (
          <li key={a.key} data-testid={`area-${a.key}`}>
            <span className="flex items-center justify-between gap-2">
              <span>
                {a.name} <span className="text-slate-500">({plural(zonesIn(a.key), "zone")})</span>
              </span>
              {canWrite ? (
                <button type="button" className="rounded px-1 text-fault hover:bg-fault-soft" aria-label={`Remove area ${a.name}`} onClick={() => apply(removeArea(doc, ctx, a.key))}>
                  ×
                </button>
              ) : null}
            </span>
            {keypads.length ? (
              <span className="ml-2 flex flex-wrap gap-x-2 text-slate-600">
                Set from:
                {keypads.map((k) => {
                  const on = a.keypadKeys?.includes(k.key) ?? false;
                  const next = on ? (a.keypadKeys ?? []).filter((x) => x !== k.key) : [...(a.keypadKeys ?? []), k.key];
                  return (
                    <label key={k.key} className="flex items-center gap-1">
                      <input type="checkbox" checked={on} disabled={!canWrite} aria-label={`Area ${a.name} set from ${boardName(doc, k.key)}`} onChange={() => apply(setAreaKeypads(doc, ctx, a.key, next))} />
                      {boardName(doc, k.key)}
                    </label>
                  );
                })}
              </span>
            ) : null}
          </li>
        ))}
      </ul>
      {canWrite ? (
        <div className="mt-2 flex gap-1">
          <input
            aria-label="New area name"
            placeholder="e.g. Offices"
            maxLength={80}
            className="min-w-0 flex-1 rounded border border-line px-2 py-1"
            value={name}
            onChange={(e) => setName(e.target.value)}
            onKeyDown={(e) => {
              if (e.key === "Enter") add();
            }}
          />
          <button type="button" className="rounded bg-signal px-2 py-1 font-medium text-white" onClick={add}>
            Add area
          </button>
        </div>
      ) : null}
    </section>
  );
}
