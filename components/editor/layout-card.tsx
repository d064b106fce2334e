"use client";

import Link from "next/link";
import { useState } from "react";
import type { LayoutMeta } from "@/lib/server/layouts";
import { Button } from "@/components/ui/button";
import { Card } from "@/components/ui/card";
import { useFormat } from "@/components/format/format-provider";
import { plural } from "@/lib/vocabulary/plural";
import { DuplicateLayout } from "@/components/editor/duplicate-layout";


function Counts({ c }: { c: { error: number; warning: number; note: number } }) {
  return (
    <span>
      <span className={c.error ? "font-semibold text-fault" : ""}>{plural(c.error, "error")}</span> · <span className={c.warning ? "text-warn" : ""}>{plural(c.warning, "warning")}</span> · {plural(c.note, "note")}
    </span>
  );
}

interface LayoutCardProps {
  siteId: number;
  layout: LayoutMeta;
  canWrite: boolean;
  onDelete: (l: LayoutMeta) => Promise<void>;
  onArchive: (l: LayoutMeta, archived: boolean) => Promise<void>;
}

/**
 * One layout of the site. A draft that was never approved may be deleted after a confirmation naming it; an
 * approved or commissioned one is archived instead (it stays readable) and can be brought back.
 */
export function LayoutCard({ siteId, layout: l, canWrite, onDelete, onArchive }: LayoutCardProps) {
  const [confirming, setConfirming] = useState(false);
  const { dateTime } = useFormat();
  const archived = l.archivedAt !== null;
  return (
    <Card className={`flex h-full flex-col gap-1 ${archived ? "opacity-80" : ""}`} data-testid={`layout-card-${l.id}`}>
      <div className="flex items-baseline justify-between gap-2">
        <Link href={`/sites/${siteId}/layouts/${l.id}`} className="font-semibold text-signal underline underline-offset-2">
          {l.name}
        </Link>
        <span className="flex gap-1">
          {archived ? <span className="rounded bg-slate-200 px-1.5 text-xs uppercase tracking-wide">archived</span> : null}
          <span className="rounded bg-slate-100 px-1.5 text-xs uppercase tracking-wide">{l.status}</span>
        </span>
      </div>
      <p className="text-xs text-slate-600">
        revision {l.currentRevision} · saved {dateTime(l.updatedAt)}
      </p>
      <p className="text-sm">
        <Counts c={l.summary.counts} />
      </p>
      <p className="text-xs text-slate-600">
        {plural(l.summary.detectorsPlaced, "detector")} placed, {l.summary.unplaced} unplaced · {l.summary.inputsUsed} of {plural(l.summary.inputsTotal, "input")} · {plural(l.summary.boards, "board")}
      </p>
      {canWrite ? <DuplicateLayout siteId={siteId} layoutId={l.id} name={l.name} /> : null}
      {canWrite ? (
        <div className="mt-auto flex justify-end gap-3 text-xs">
          {l.hasApproval || archived ? (
            <button type="button" className="text-signal hover:underline" onClick={() => void onArchive(l, !archived)} data-testid={`archive-${l.id}`}>
              {archived ? "Bring back from the archive" : "Archive"}
            </button>
          ) : null}
          {!l.hasApproval ? (
            <button type="button" className="text-fault hover:underline" onClick={() => setConfirming(true)} data-testid={`delete-${l.id}`}>
              Delete…
            </button>
          ) : null}
        </div>
      ) : null}
      {confirming ? (
        <div role="alertdialog" aria-label={`Delete ${l.name}?`} className="mt-2 rounded-md border-2 border-fault bg-fault-soft p-2 text-sm" data-testid={`delete-confirm-${l.id}`}>
          <p>
            Delete the draft layout <strong>“{l.name}”</strong> and its {plural(l.currentRevision, "revision")}? This cannot be undone.
          </p>
          <div className="mt-2 flex gap-2">
            <Button
              onClick={() => {
                setConfirming(false);
                void onDelete(l);
              }}
            >
              Delete “{l.name}”
            </Button>
            <Button variant="secondary" onClick={() => setConfirming(false)}>
              Keep it
            </Button>
          </div>
        </div>
      ) : null}
    </Card>
  );
}
