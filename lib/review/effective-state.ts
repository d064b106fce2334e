import { isReviewState, type ReviewState } from "@/lib/review/state-machine";

// Revisions never change once saved, so an approved revision stays frozen by itself: a later save is a new
// revision, and that new revision is a draft. The stored review names the revision its state belongs to.

export interface StoredReview {
  state: string;
  /** The revision the state belongs to. */
  revision: number;
  approvedRevision: number | null;
  commissionedRevision: number | null;
  /** The approved revision was approved without a second review. */
  approvedSolo?: boolean;
}

export interface EffectiveReview {
  /** The state of the layout's current revision. */
  state: ReviewState;
  currentRevision: number;
  /** The revision sent for review, while it is in review. */
  inReviewRevision: number | null;
  /** The latest approved revision (frozen), even when a newer draft exists: the one to wire and commission. */
  approvedRevision: number | null;
  commissionedRevision: number | null;
  /** The approved revision was approved by the person who sent it or last changed it (the organisation allows it). */
  approvedSolo: boolean;
  /** Plain words when the current revision has moved on from the stored state. */
  note: string | null;
}

export function effectiveReview(stored: StoredReview | null, currentRevision: number): EffectiveReview {
  const base = { currentRevision, approvedRevision: stored?.approvedRevision ?? null, commissionedRevision: stored?.commissionedRevision ?? null, approvedSolo: !!stored?.approvedSolo && stored.approvedRevision != null };
  if (!stored || !isReviewState(stored.state) || stored.state === "draft") return { ...base, state: "draft", inReviewRevision: null, note: null };
  if (stored.revision === currentRevision) return { ...base, state: stored.state, inReviewRevision: stored.state === "in-review" ? currentRevision : null, note: null };
  if (stored.state === "in-review")
    return { ...base, state: "draft", inReviewRevision: null, note: `Revision ${stored.revision} was sent for review, and the layout has changed since (now revision ${currentRevision}): send it again.` };
  return {
    ...base,
    state: "draft",
    inReviewRevision: null,
    note: `Revision ${stored.revision} is ${stored.state} and stays as it was; revision ${currentRevision} is a new draft.`,
  };
}

/** The plain words every approval given without a second review carries (the approval, the audit log, the sheet). */
export const SOLO_APPROVAL_WORDS = "approved without a second review";
