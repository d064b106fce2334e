"use client";

import { useRevisions } from "@/lib/client/use-revisions";
import { Button } from "@/components/ui/button";
import { useFormat } from "@/components/format/format-provider";
import { plural } from "@/lib/vocabulary/plural";


/** The layout's history, newest first; restoring makes a new revision with the old document. */
export function RevisionDrawer({ layoutId, currentRevision, canWrite, busy, onRestore, onClose }: { layoutId: number; currentRevision: number; canWrite: boolean; busy: boolean; onRestore: (revision: number) => void; onClose: () => void }) {
  const fmt = useFormat();
  const { revisions, error, isLoading } = useRevisions(layoutId);
  return (
    <aside role="dialog" aria-modal="false" aria-labelledby="history-title" data-testid="history" className="fixed inset-y-0 right-0 z-40 flex w-full max-w-md flex-col border-l border-line bg-white shadow-xl">
      <header className="flex items-center justify-between border-b border-line p-4">
        <h2 id="history-title" className="text-lg font-semibold">
          Revision history
        </h2>
        <Button variant="secondary" onClick={onClose} autoFocus>
          Close
        </Button>
      </header>
      <div className="flex-1 overflow-y-auto p-4">
        {isLoading ? <p className="text-sm text-slate-600">Loading…</p> : null}
        {error ? <p className="text-sm text-fault">{error.message}</p> : null}
        <ol className="flex flex-col gap-3">
          {revisions.map((r) => (
            <li key={r.revision} className="rounded-md border border-line p-3 text-sm" data-testid={`revision-${r.revision}`}>
              <div className="flex items-baseline justify-between gap-2">
                <span className="font-semibold">
                  Revision {r.revision}
                  {r.revision === currentRevision ? <span className="ml-2 rounded bg-signal-soft px-1.5 text-xs text-signal">current</span> : null}
                </span>
                <time dateTime={r.createdAt} className="text-xs text-slate-500">
                  {fmt.dateTime(r.createdAt)}
                </time>
              </div>
              <p className="text-xs text-slate-600">
                {r.createdBy ?? "someone no longer a member"}
                {r.note ? ` · ${r.note}` : ""}
              </p>
              <p className="mt-1 text-xs">
                <span className="text-fault">{plural(r.summary.counts.error, "error")}</span> · <span className="text-warn">{plural(r.summary.counts.warning, "warning")}</span> · {plural(r.summary.counts.note, "note")} · {r.summary.detectorsPlaced} placed, {r.summary.unplaced} unplaced ·{" "}
                {r.summary.inputsUsed} of {plural(r.summary.inputsTotal, "input")}
              </p>
              {canWrite && r.revision !== currentRevision ? (
                <Button variant="secondary" className="mt-2" disabled={busy} onClick={() => onRestore(r.revision)}>
                  Restore revision {r.revision}
                </Button>
              ) : null}
            </li>
          ))}
        </ol>
      </div>
    </aside>
  );
}
