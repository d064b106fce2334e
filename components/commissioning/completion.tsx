"use client";

import { useState } from "react";
import { describeError, FetchError, sendJson } from "@/lib/client/fetcher";
import type { EffectiveReview } from "@/lib/review/effective-state";

interface CompletionProps {
  layoutId: number;
  commissioned: boolean;
  canRecord: boolean;
  onCommissioned: (review: EffectiveReview) => void;
}

/** Once every loop has passed: the commissioning record and marking the layout commissioned. */
export function Completion({ layoutId, commissioned, canRecord, onCommissioned }: CompletionProps) {
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  async function mark() {
    setBusy(true);
    setError(null);
    try {
      const r = await sendJson<{ review: EffectiveReview }>(`/api/layouts/${layoutId}/commissioning/complete`, "POST");
      onCommissioned(r.review);
    } catch (e) {
      setError(e instanceof FetchError && !e.unreachable ? describeError(e) : "The server could not be reached; try again.");
    } finally {
      setBusy(false);
    }
  }
  return (
    <section className="rounded-lg border-2 border-signal bg-white p-3" data-testid="completion">
      <p className="text-lg font-semibold text-signal">Every loop has passed.</p>
      <div className="mt-2 flex flex-wrap gap-2">
        <a className="flex min-h-12 items-center rounded-md bg-signal px-4 font-semibold text-white" href={`/api/layouts/${layoutId}/commissioning/report?size=A4`} data-testid="report-pdf">
          Commissioning record (PDF, A4)
        </a>
        <a className="flex min-h-12 items-center rounded-md border border-signal px-4 font-semibold text-signal" href={`/api/layouts/${layoutId}/commissioning/report?size=LETTER`}>
          US Letter
        </a>
        {!commissioned && canRecord ? (
          <button type="button" disabled={busy} onClick={mark} className="min-h-12 rounded-md bg-ink px-4 font-semibold text-white disabled:bg-slate-400" data-testid="mark-commissioned">
            {busy ? "Marking…" : "Mark the layout commissioned"}
          </button>
        ) : null}
      </div>
      {error ? <p className="mt-2 text-sm font-medium text-fault">{error}</p> : null}
    </section>
  );
}
