import type { ReactNode } from "react";

/** A grey block where data will go. */
export function Bone({ className = "" }: { className?: string }) {
  return <span aria-hidden="true" className={`block animate-pulse rounded bg-slate-200 motion-reduce:animate-none ${className}`} />;
}

/**
 * A page's own shape while its data loads. Assistive technology hears one status line, not the grey blocks;
 * the fixed words (headings, column names) stay visible so the page does not jump when the data arrives.
 */
export function LoadingPage({ what, className = "", children }: { what: string; className?: string; children: ReactNode }) {
  return (
    <div aria-busy="true" className={className} data-testid="loading">
      <p role="status" className="sr-only">
        Loading {what} …
      </p>
      <div aria-hidden="true">{children}</div>
    </div>
  );
}

/** The first rows of a table as grey blocks under its real column names. */
export function TableSkeleton({ columns, rows, thClassName = "px-2 py-2", tdClassName = "px-2 py-2" }: { columns: readonly string[]; rows: number; thClassName?: string; tdClassName?: string }) {
  return (
    <table className="w-full text-sm">
      <thead className="text-left text-slate-600">
        <tr>
          {columns.map((c) => (
            <th key={c} className={thClassName}>
              {c}
            </th>
          ))}
        </tr>
      </thead>
      <tbody>
        {Array.from({ length: rows }, (_, r) => (
          <tr key={r} className="border-t border-line">
            {columns.map((c, i) => (
              <td key={c} className={tdClassName}>
                <Bone className={`h-4 ${i === 0 ? "w-32" : (r + i) % 3 === 0 ? "w-12" : "w-20"}`} />
              </td>
            ))}
          </tr>
        ))}
      </tbody>
    </table>
  );
}
