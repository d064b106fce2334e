"use client";

import { LifeSafetyCaution } from "@/components/ui/life-safety-caution";
import Link from "next/link";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { reviewActionSchema, type ReviewStep } from "@/lib/review/review-schema";
import { REVIEW_STATES, REVIEW_STATE_WORDS } from "@/lib/review/state-machine";
import type { ReviewView } from "@/lib/server/review";
import { Button } from "@/components/ui/button";
import { Card } from "@/components/ui/card";
import { describeError, FetchError, sendJson } from "@/lib/client/fetcher";
import { useReview } from "@/lib/client/use-review";
import { DECISION_WORDS, STEP_HINTS, STEP_LABELS } from "@/components/review/review-words";
import { Comments } from "@/components/review/review-comments";
import { useFormat } from "@/components/format/format-provider";
import { plural } from "@/lib/vocabulary/plural";

export interface ReviewSummary {
  counts: { error: number; warning: number; note: number };
  inputsUsed: number;
  inputsTotal: number;
  zonesUsed: number;
  unplaced: number;
  coverage: number | null;
  findings: { code: string; severity: "error" | "warning" | "note"; message: string }[];
}

export interface ReviewPanelProps {
  initial: ReviewView;
  summary: ReviewSummary | null;
  boards: { key: string; name: string; inputs: number }[];
  canComment: boolean;
  lifeSafety: boolean;
}

const SEVERITY_STYLE = { error: "text-fault", warning: "text-warn", note: "text-slate-600" } as const;

export function ReviewPanel({ initial, summary, boards, canComment, lifeSafety }: ReviewPanelProps) {
  const router = useRouter();
  const fmt = useFormat();
  const { data, mutate } = useReview(initial.layoutId, initial);
  const view = data ?? initial;
  const [reason, setReason] = useState("");
  const [busy, setBusy] = useState<ReviewStep | null>(null);
  const [message, setMessage] = useState<{ kind: "ok" | "error"; text: string } | null>(null);
  const base = `/sites/${view.siteId}/layouts/${view.layoutId}`;
  const boardName = (key: string) => boards.find((b) => b.key === key)?.name ?? key;
  const stateIndex = REVIEW_STATES.indexOf(view.review.state);

  async function step(action: ReviewStep) {
    if (action === "reject" && !reason.trim()) {
      setMessage({ kind: "error", text: "Say why it goes back to draft (in the box below), so its author knows what to change." });
      return;
    }
    const body = reviewActionSchema.safeParse({ action, revision: view.review.currentRevision, ...(reason.trim() ? { reason: reason.trim() } : {}) });
    if (!body.success) {
      setMessage({ kind: "error", text: body.error.issues.map((i) => i.message).join("; ") });
      return;
    }
    setBusy(action);
    setMessage(null);
    try {
      const next =
        action === "commission"
          ? await sendJson<ReviewView>(`/api/layouts/${view.layoutId}/commissioning/complete`, "POST")
          : await sendJson<ReviewView>(`/api/layouts/${view.layoutId}/review`, "POST", body.data);
      await mutate(next, { revalidate: false });
      setReason("");
      setMessage({ kind: "ok", text: `Revision ${next.review.currentRevision} is now ${REVIEW_STATE_WORDS[next.review.state]}.` });
      router.refresh();
    } catch (e) {
      setMessage({ kind: "error", text: e instanceof FetchError && e.unreachable ? "The server could not be reached; nothing was changed. Try again." : describeError(e) });
    } finally {
      setBusy(null);
    }
  }

  return (
    <div className="grid grid-cols-1 gap-6 lg:grid-cols-[minmax(0,1fr)_26rem]">
      <div className="flex flex-col gap-4">
        <Card>
          <h2 className="text-lg font-semibold">Where this layout stands</h2>
          <ol className="mt-3 grid grid-cols-4 gap-2 text-center text-sm" aria-label="Review states">
            {REVIEW_STATES.map((s, i) => (
              <li
                key={s}
                aria-current={i === stateIndex ? "step" : undefined}
                className={`rounded-md border px-2 py-2 ${i === stateIndex ? "border-signal bg-signal text-white font-semibold" : i < stateIndex ? "border-signal bg-signal-soft text-signal" : "border-line text-slate-500"}`}
              >
                {REVIEW_STATE_WORDS[s]}
              </li>
            ))}
          </ol>
          <p className="mt-3 text-sm">
            Revision {view.review.currentRevision} is <strong>{REVIEW_STATE_WORDS[view.review.state]}</strong>.
            {view.review.approvedRevision !== null ? ` Approved revision ${view.review.approvedRevision} is frozen: it is the one the terminal sheet and commissioning use; changes make a new draft.` : " No revision is approved yet: the terminal sheet is for review only."}
          </p>
          {view.review.approvedSolo ? (
            <p className="mt-2 rounded-md border border-fault bg-fault-soft p-2 text-sm font-semibold" data-testid="solo-approval">
              Revision {view.review.approvedRevision} was approved without a second review: the person who approved it also sent or made it.
            </p>
          ) : null}
          {view.review.note ? (
            <p className="mt-2 rounded-md border border-warn bg-warn-soft p-2 text-sm" role="note" data-testid="review-note">
              {view.review.note}
            </p>
          ) : null}
        </Card>

        <Card>
          <h2 className="text-lg font-semibold">What you can do</h2>
          <ul className="mt-3 flex flex-col gap-3" data-testid="review-actions">
            {view.actions.map((a) => {
              const s = a.action as ReviewStep;
              return (
                <li key={s} className="flex flex-wrap items-start gap-3" data-testid={`action-${s}`} data-allowed={a.allowed}>
                  <Button variant={s === "reject" ? "secondary" : "primary"} className="w-48" disabled={!a.allowed || busy !== null} onClick={() => step(s)}>
                    {busy === s ? "Working…" : STEP_LABELS[s]}
                  </Button>
                  <p className={`max-w-md flex-1 text-sm ${a.allowed ? "text-slate-700" : "text-slate-500"}`}>{a.allowed ? STEP_HINTS[s] : a.reason}</p>
                </li>
              );
            })}
          </ul>
          {view.actions.some((a) => a.action === "reject" && a.allowed) ? (
            <label className="mt-4 block text-sm">
              <span className="font-medium">Reason for sending it back (needed for “Send back to draft”)</span>
              <textarea className="mt-1 block w-full rounded-md border border-line bg-white px-3 py-2" rows={3} maxLength={4000} value={reason} onChange={(e) => setReason(e.target.value)} />
            </label>
          ) : null}
          <p aria-live="polite" data-testid="review-message" className={`mt-3 min-h-5 text-sm ${message?.kind === "error" ? "font-medium text-fault" : "text-signal"}`}>
            {message?.text ?? ""}
          </p>
        </Card>

        {summary ? (
          <Card>
            <h2 className="text-lg font-semibold">Revision {view.review.currentRevision} in brief</h2>
            <dl className="mt-2 grid grid-cols-2 gap-x-6 gap-y-1 text-sm sm:grid-cols-3">
              <div>
                <dt className="text-slate-500">Inputs used</dt>
                <dd className="font-semibold tabular-nums">
                  {summary.inputsUsed} of {summary.inputsTotal} ({summary.inputsTotal - summary.inputsUsed} spare)
                </dd>
              </div>
              <div>
                <dt className="text-slate-500">Zones</dt>
                <dd className="font-semibold tabular-nums">{summary.zonesUsed}</dd>
              </div>
              <div>
                <dt className="text-slate-500">Supervision coverage</dt>
                <dd className="font-semibold tabular-nums">{summary.coverage === null ? "no inputs used" : `${Math.round(summary.coverage * 100)} %`}</dd>
              </div>
              <div>
                <dt className="text-slate-500">Findings</dt>
                <dd className="font-semibold tabular-nums">
                  <span className="text-fault">{plural(summary.counts.error, "error")}</span>, <span className="text-warn">{plural(summary.counts.warning, "warning")}</span>, {plural(summary.counts.note, "note")}
                </dd>
              </div>
              <div>
                <dt className="text-slate-500">Detectors not placed</dt>
                <dd className={`font-semibold tabular-nums ${summary.unplaced ? "text-fault" : ""}`}>{summary.unplaced}</dd>
              </div>
            </dl>
            {summary.findings.filter((f) => f.severity !== "note").length ? (
              <ul className="mt-3 list-disc space-y-1 pl-5 text-sm">
                {summary.findings
                  .filter((f) => f.severity !== "note")
                  .map((f, i) => (
                    <li key={i} className={SEVERITY_STYLE[f.severity]}>
                      <span className="font-medium">{f.severity}:</span> <span className="text-ink">{f.message}</span>
                    </li>
                  ))}
              </ul>
            ) : null}
            <p className="mt-3 text-sm">
              <Link className="text-signal underline" href={base}>
                Open it in the editor
              </Link>{" "}
              ·{" "}
              <Link className="text-signal underline" href={`${base}/sheet?revision=${view.review.currentRevision}`}>
                Terminal sheet of this revision
              </Link>
            </p>
          </Card>
        ) : null}
        {lifeSafety ? (
          <LifeSafetyCaution>
            This layout has smoke, heat or other life-safety devices. Their design must follow the local fire code and the authority having jurisdiction, and be installed and
            certified by licensed people. Approval here is a design review step: Loopwright&apos;s figures are an aid, not an approval.
          </LifeSafetyCaution>
        ) : null}
      </div>

      <div className="flex flex-col gap-4">
        <Comments layoutId={view.layoutId} comments={view.comments} boards={boards} boardName={boardName} canComment={canComment} onAdded={(c) => mutate((v) => (v ? { ...v, comments: [...v.comments, c] } : v), { revalidate: false })} />
        <Card>
          <h2 className="text-lg font-semibold">Decisions</h2>
          {view.decisions.length === 0 ? <p className="mt-2 text-sm text-slate-600">No review steps yet.</p> : null}
          <ol className="mt-2 space-y-2 text-sm" data-testid="decision-log">
            {[...view.decisions].reverse().map((d) => (
              <li key={d.id} className="border-l-2 border-line pl-3">
                <p>
                  Revision {d.revision} {DECISION_WORDS[d.kind] ?? d.kind}
                  {d.decidedBy ? ` by ${d.decidedBy}` : ""}
                </p>
                {d.reason ? <p className="text-slate-700">“{d.reason}”</p> : null}
                <p className="text-xs text-slate-500">{fmt.dateTime(d.createdAt)}</p>
              </li>
            ))}
          </ol>
        </Card>
      </div>
    </div>
  );
}
