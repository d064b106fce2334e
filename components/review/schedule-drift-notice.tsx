"use client";

import { useRouter } from "next/navigation";
import { useState } from "react";
import { describeError, sendJson } from "@/lib/client/fetcher";
import { differenceText } from "@/lib/review/schedule-drift";
import type { ApprovedDrift } from "@/lib/server/schedule-drift";

/** The schedule has moved on since approval: what differs, and a new draft re-solved against it. The approved sheet does not change. */
export function ScheduleDriftNotice({ drift, version, canWrite }: { drift: ApprovedDrift; version: number; canWrite: boolean }) {
  const router = useRouter();
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  if (!drift.headline) return null;
  async function redraft() {
    setBusy(true);
    setError(null);
    try {
      await sendJson(`/api/layouts/${drift.layoutId}/redraft`, "POST", { version });
      router.refresh();
    } catch (e) {
      setError(describeError(e));
    } finally {
      setBusy(false);
    }
  }
  return (
    <div role="note" className="no-print mb-3 rounded-md border-2 border-warn bg-warn-soft p-3 text-sm" data-testid="schedule-drift" data-count={drift.differences.length}>
      <p className="font-semibold">{drift.headline}</p>
      <p>Approved revision {drift.approvedRevision} and its terminal sheet keep the schedule as it was approved; a new draft takes in the changes and needs review again.</p>
      <ul className="mt-1 list-disc pl-5" data-testid="schedule-drift-list">
        {drift.differences.map((d) => (
          <li key={`${d.kind}-${d.id}`} data-kind={d.kind}>
            {differenceText(d)}
          </li>
        ))}
      </ul>
      {canWrite ? (
        <button type="button" disabled={busy} onClick={() => void redraft()} className="mt-2 rounded-md bg-signal px-3 py-2 font-medium text-white disabled:bg-slate-400" data-testid="redraft">
          {busy ? "Starting…" : "Start a new draft from the schedule as it is now"}
        </button>
      ) : null}
      {error ? (
        <p role="alert" className="mt-1 font-medium text-fault">
          {error}
        </p>
      ) : null}
    </div>
  );
}
