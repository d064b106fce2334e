"use client";

import type { Finding } from "@/lib/findings";
import { plural } from "@/lib/vocabulary/plural";

const tone = { error: "bg-fault text-white", warning: "bg-warn text-white", note: "bg-slate-300 text-ink" } as const;

/** A small badge in place: the worst severity among the findings about this thing, and how many there are. */
export function FindingMarker({ domId, findings }: { domId: string; findings: Finding[] | undefined }) {
  if (!findings?.length) return null;
  const worst = findings.some((f) => f.severity === "error") ? "error" : findings.some((f) => f.severity === "warning") ? "warning" : "note";
  const words = { error: "an error", warning: "a warning", note: "a note" }[worst];
  return (
    <span data-testid={`marker-${domId}`} data-severity={worst} className={`inline-flex h-5 min-w-5 shrink-0 items-center justify-center rounded-full px-1 text-[10px] font-bold ${tone[worst]}`} title={findings.map((f) => `${f.severity}: ${f.message}`).join("\n")}>
      <span aria-hidden>{findings.length}</span>
      <span className="sr-only">
        {plural(findings.length, "finding")}, the worst {words}
      </span>
    </span>
  );
}
