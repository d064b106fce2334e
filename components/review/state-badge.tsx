import { REVIEW_STATE_WORDS, type ReviewState } from "@/lib/review/state-machine";

const STYLE: Record<ReviewState, string> = {
  draft: "border-line bg-slate-100 text-slate-700",
  "in-review": "border-warn bg-warn-soft text-warn",
  approved: "border-signal bg-signal-soft text-signal",
  commissioned: "border-signal bg-signal text-white",
};

export function StateBadge({ state, className = "" }: { state: ReviewState; className?: string }) {
  return (
    <span data-testid="review-state" data-state={state} className={`inline-block rounded border px-2 py-0.5 text-xs font-semibold uppercase tracking-wide ${STYLE[state]} ${className}`}>
      {REVIEW_STATE_WORDS[state]}
    </span>
  );
}
