"use client";

import { Button } from "@/components/ui/button";

/** Someone else saved the layout since this editor loaded it. Nothing of either is lost: one copy becomes a new layout. */
export function ConflictDialog({ message, busy, error, onReloadLatest, onWorkOnCopy }: { message: string; busy: boolean; error: string | null; onReloadLatest: () => void; onWorkOnCopy: () => void }) {
  return (
    <div className="fixed inset-0 z-50 flex items-center justify-center bg-ink/40 p-4">
      <div role="alertdialog" aria-modal="true" aria-labelledby="conflict-title" aria-describedby="conflict-text" data-testid="conflict" className="max-w-lg rounded-lg border border-fault bg-white p-5 shadow-xl">
        <h2 id="conflict-title" className="text-lg font-semibold text-fault">
          This layout was changed elsewhere
        </h2>
        <p id="conflict-text" className="mt-2 text-sm">
          {message} Your changes have not been saved over theirs, and they are kept in this browser until you choose.
        </p>
        <div className="mt-4 flex flex-col gap-2">
          <Button autoFocus onClick={onReloadLatest} disabled={busy}>
            Reload the latest (my changes kept as a copy in a new layout)
          </Button>
          <Button variant="secondary" onClick={onWorkOnCopy} disabled={busy}>
            Keep working on a copy (save mine as a new layout)
          </Button>
        </div>
        {error ? (
          <p role="alert" className="mt-3 text-sm text-fault">
            {error}
          </p>
        ) : null}
      </div>
    </div>
  );
}
