"use client";

import { useEditor } from "@/components/editor/editor-context";
import { targetDomId } from "@/components/editor/editor-model";
import type { Severity } from "@/lib/findings";

const plural = (n: number, word: string) => `${n} ${word}${n === 1 ? "" : "s"}`;

const sections: { severity: Severity; title: string; tone: string }[] = [
  { severity: "error", title: "Errors", tone: "text-fault" },
  { severity: "warning", title: "Warnings", tone: "text-warn" },
  { severity: "note", title: "Notes", tone: "text-slate-600" },
];

/** Every finding of the live solve, by severity, each with why it matters and a link to what it concerns. */
export function FindingsPanel() {
  const { result, show } = useEditor();
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
          const list = result.findings.filter((f) => f.severity === severity);
          if (!list.length) return null;
          return (
            <details key={severity} open={severity !== "note" || list.length <= 12} className="mb-2">
              <summary className={`cursor-pointer text-xs font-semibold ${tone}`}>
                {title} ({list.length})
              </summary>
              <ul className="mt-1 flex flex-col gap-2">
                {list.map((f, i) => (
                  <li key={`${f.code}-${i}`} className="border-l-2 pl-2 text-xs" style={{ borderColor: severity === "error" ? "var(--color-fault)" : severity === "warning" ? "var(--color-warn)" : "var(--color-line)" }} data-testid={`finding-${severity}`} data-code={f.code}>
                    <p className="font-medium">{f.message}</p>
                    <p className="text-slate-600">{f.why}</p>
                    <button type="button" className="text-signal underline" onClick={() => show(targetDomId(f.target))}>
                      {f.target.kind === "layout" ? "Show the figures" : f.target.kind === "supply" ? "Show the supply" : `Show the ${f.target.kind}`}
                    </button>
                  </li>
                ))}
              </ul>
            </details>
          );
        })}
      </div>
    </section>
  );
}
