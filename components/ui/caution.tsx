import type { ReactNode } from "react";

/** A caution as one compact line that opens to its full text; the full text stays in the page for readers and search. */
export function Caution({ summary, children, testId, className = "" }: { summary: ReactNode; children: ReactNode; testId?: string; className?: string }) {
  return (
    <details role="note" data-testid={testId} className={`group rounded-md border border-warn bg-warn-soft px-3 py-1.5 text-sm text-ink ${className}`}>
      <summary className="cursor-pointer list-inside">
        {summary} <span className="text-xs text-slate-600 underline group-open:hidden">Read the caution</span>
      </summary>
      <div className="mt-1 pb-1">{children}</div>
    </details>
  );
}
