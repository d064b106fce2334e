"use client";

import type { FindingGroup } from "@/lib/findings-grouping";
import type { FindingTarget } from "@/lib/findings";

const border = { error: "var(--color-fault)", warning: "var(--color-warn)", note: "var(--color-line)" } as const;

const showWords = (t: FindingTarget) => (t.kind === "layout" ? "Show the figures" : t.kind === "supply" ? "Show the supply" : `Show the ${t.kind}`);

/** One finding, or the same finding on several inputs: said once, the inputs listed, each input's own figures one click away. */
export function FindingGroupItem({ group, show, testId }: { group: FindingGroup; show: (target: FindingTarget) => void; testId: string }) {
  const many = group.findings.length > 1;
  const first = group.findings[0];
  return (
    <li className="border-l-2 pl-2 text-xs" style={{ borderColor: border[group.severity] }} data-testid={testId} data-code={group.code} data-count={group.findings.length}>
      <p className="font-medium">
        {group.where ? <span>{group.where}: </span> : null}
        {group.title}
      </p>
      <p className="text-slate-600">{group.why}</p>
      {many ? (
        <details className="mt-0.5">
          <summary className="cursor-pointer text-signal">Each of the {group.findings.length} with its figures</summary>
          <ul className="mt-1 flex flex-col gap-1">
            {group.findings.map((f, i) => (
              <li key={i} className="flex flex-wrap items-baseline gap-x-2">
                <span>{f.message}</span>
                <button type="button" className="text-signal underline" onClick={() => show(f.target)}>
                  {showWords(f.target)}
                </button>
              </li>
            ))}
          </ul>
        </details>
      ) : (
        <button type="button" className="text-signal underline" onClick={() => show(first.target)}>
          {showWords(first.target)}
        </button>
      )}
    </li>
  );
}
