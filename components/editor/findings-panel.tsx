"use client";

import { useMemo } from "react";
import { useEditor } from "@/components/editor/editor-context";
import { targetDomId } from "@/components/editor/editor-model";
import { FindingGroupItem } from "@/components/editor/finding-group-item";
import type { Severity } from "@/lib/findings";
import { groupFindings } from "@/lib/findings-grouping";
import { plural } from "@/lib/vocabulary/plural";


const sections: { severity: Severity; title: string; tone: string }[] = [
  { severity: "error", title: "Errors", tone: "text-fault" },
  { severity: "warning", title: "Warnings", tone: "text-warn" },
  { severity: "note", title: "Notes", tone: "text-slate-600" },
];

/** Every finding of the live solve: the same finding on many inputs said once, what a scheme brings said once per scheme, worst first. */
export function FindingsPanel() {
  const { result, show } = useEditor();
  const grouped = useMemo(() => {
    const names = new Map(result.boards.map((b) => [b.boardKey, b.name]));
    const schemes = new Map(result.inputs.map((i) => [`${i.boardKey}#${i.input}`, i.scheme]));
    return groupFindings(result.findings, { boardName: (k) => names.get(k) ?? k, schemeOf: (k, n) => schemes.get(`${k}#${n}`) });
  }, [result]);
  const go = (t: Parameters<typeof targetDomId>[0]) => show(targetDomId(t));
  return (
    <section aria-labelledby="findings-heading" data-testid="findings" className="rounded-lg border border-line bg-white p-3">
      <h2 id="findings-heading" className="flex items-baseline justify-between text-sm font-semibold">
        Findings
        <span className="text-xs font-normal" data-testid="finding-counts">
          <span className="text-fault">{plural(result.counts.error, "error")}</span> · <span className="text-warn">{plural(result.counts.warning, "warning")}</span> · {plural(result.counts.note, "note")}
        </span>
      </h2>
      {result.findings.length === 0 ? <p className="mt-2 text-xs text-slate-600">Nothing to report.</p> : null}
      <div className="mt-2 max-h-[45vh] overflow-y-auto pr-1">
        {sections.map(({ severity, title, tone }) => {
          const list = grouped.groups.filter((g) => g.severity === severity);
          if (!list.length) return null;
          const n = list.reduce((a, g) => a + g.findings.length, 0);
          return (
            <details key={severity} open={severity !== "note" || list.length <= 12} className="mb-2">
              <summary className={`cursor-pointer text-xs font-semibold ${tone}`}>
                {title} ({n === list.length ? n : `${n}, said in ${list.length}`})
              </summary>
              <ul className="mt-1 flex flex-col gap-2">
                {list.map((g, i) => (
                  <FindingGroupItem key={`${g.code}-${i}`} group={g} show={go} testId={`finding-${severity}`} />
                ))}
              </ul>
            </details>
          );
        })}
        {grouped.schemeNotes.length ? (
          <details open className="mb-2" data-testid="scheme-notes">
            <summary className="cursor-pointer text-xs font-semibold text-slate-600">What the chosen schemes bring ({grouped.schemeNotes.length})</summary>
            {grouped.schemeNotes.map((note) => (
              <div key={note.scheme} className="mt-1 text-xs" data-scheme={note.scheme}>
                <p className="font-medium">{note.heading}</p>
                <p className="text-slate-600">{note.remedy}</p>
                <ul className="mt-1 flex flex-col gap-2">
                  {note.groups.map((g, i) => (
                    <FindingGroupItem key={`${g.code}-${i}`} group={g} show={go} testId={`finding-${g.severity}`} />
                  ))}
                </ul>
              </div>
            ))}
          </details>
        ) : null}
      </div>
    </section>
  );
}
