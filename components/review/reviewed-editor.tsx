"use client";

import Link from "next/link";
import { useState } from "react";
import type { EffectiveReview } from "@/lib/review/effective-state";
import { LayoutEditor, type LayoutEditorProps } from "@/components/editor/layout-editor";
import { ScheduleDriftNotice } from "@/components/review/schedule-drift-notice";
import type { ApprovedDrift } from "@/lib/server/schedule-drift";

/** The frozen-revision words the editor shows when the current revision is approved or commissioned. */
export function frozenReason(review: EffectiveReview): string | null {
  if (review.state === "approved") return `approved revision ${review.currentRevision} is frozen; changes make a new draft.`;
  if (review.state === "commissioned") return `commissioned revision ${review.currentRevision} is frozen; changes make a new draft.`;
  if (review.state === "in-review") return `revision ${review.currentRevision} is in review: take it back to draft on the review page to change it, or wait for the reviewer.`;
  return null;
}

/**
 * The layout editor under the review rules: read-only while in review, and read-only on an approved (or
 * commissioned) revision until the designer chooses to start a new draft, which the next save makes.
 */
export function ReviewedEditor({ review, editor, drift = null }: { review: EffectiveReview; editor: LayoutEditorProps; drift?: ApprovedDrift | null }) {
  const [newDraft, setNewDraft] = useState(false);
  const frozen = review.state === "approved" || review.state === "commissioned";
  const locked = review.state === "in-review" || (frozen && !newDraft);
  const reason = frozenReason(review);
  const base = `/sites/${editor.site.id}/layouts/${editor.layout.id}`;
  return (
    <>
      {frozen && editor.canWrite ? (
        <div className="no-print mb-3 flex flex-wrap items-center justify-between gap-3 rounded-md border border-signal bg-signal-soft p-3 text-sm" data-testid="frozen-note">
          {newDraft ? (
            <p>
              Editing as a new draft: your first change is saved as revision {review.currentRevision + 1}, a draft. Revision {review.currentRevision} stays {review.state} and is still the one on
              the terminal sheet.
            </p>
          ) : (
            <>
              <p>
                <strong>Revision {review.currentRevision} is {review.state}</strong> and frozen: the terminal sheet and commissioning use it. Changes make a new draft, which needs review again.
              </p>
              <button type="button" className="rounded-md bg-signal px-3 py-2 font-medium text-white" onClick={() => setNewDraft(true)} data-testid="start-new-draft">
                Make changes as a new draft
              </button>
            </>
          )}
        </div>
      ) : null}
      {drift ? <ScheduleDriftNotice drift={drift} version={editor.layout.version} canWrite={editor.canWrite && review.state !== "in-review"} /> : null}
      {review.state === "in-review" ? (
        <p className="no-print mb-3 rounded-md border border-warn bg-warn-soft p-3 text-sm">
          Revision {review.currentRevision} is in review.{" "}
          <Link className="font-medium text-signal underline" href={`${base}/review`}>
            Open the review
          </Link>
        </p>
      ) : null}
      {review.note ? (
        <p className="no-print mb-3 rounded-md border border-warn bg-warn-soft p-3 text-sm" role="note" data-testid="review-note">
          {review.note}
        </p>
      ) : null}
      <LayoutEditor key={`${editor.layout.id}-${locked ? "locked" : "open"}`} {...editor} canWrite={editor.canWrite && !locked} readOnlyReason={locked && reason ? reason : editor.readOnlyReason} />
    </>
  );
}
