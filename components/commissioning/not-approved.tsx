import Link from "next/link";
import { REVIEW_STATE_WORDS } from "@/lib/review/state-machine";
import type { EffectiveReview } from "@/lib/review/effective-state";

/** Shown instead of the screen while the layout has no approved revision to commission. */
export function NotApproved({ siteId, layoutId, review }: { siteId: number; layoutId: number; review: EffectiveReview }) {
  return (
    <div className="mx-auto max-w-2xl rounded-lg border border-warn bg-warn-soft p-4" data-testid="not-approved">
      <p className="text-lg font-semibold">Nothing to commission yet</p>
      <p className="mt-1">
        Commissioning is done on an approved revision: this layout is {REVIEW_STATE_WORDS[review.state]} and has none. See its{" "}
        <Link className="text-signal underline" href={`/sites/${siteId}/layouts/${layoutId}/review`}>
          review
        </Link>
        .
      </p>
    </div>
  );
}
