import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { pageActor } from "@/lib/server/session";
import { getReview } from "@/lib/server/review";
import { getLayout } from "@/lib/server/layouts";
import { getTerminalSheet } from "@/lib/server/sheets";
import { orNotFound } from "@/lib/server/page-load";
import { idParam } from "@/lib/server/route";
import { can } from "@/lib/auth/permissions";
import { Refusal } from "@/components/ui/refusal";
import { ReviewPanel } from "@/components/review/review-panel";

export const metadata: Metadata = { title: "Review" };

export default async function ReviewPage({ params }: { params: Promise<{ siteId: string; layoutId: string }> }) {
  const { siteId, layoutId } = await params;
  const { actor, allowed, reason } = await pageActor("layout:read", `/sites/${siteId}/layouts/${layoutId}/review`);
  if (!allowed) return <Refusal reason={reason} />;
  const sid = idParam.safeParse(siteId);
  const lid = idParam.safeParse(layoutId);
  if (!sid.success || !lid.success) notFound();
  const view = await orNotFound(getReview(actor, lid.data));
  if (view.siteId !== sid.data) notFound();
  const [current, sheet] = await Promise.all([getLayout(actor, view.layoutId), getTerminalSheet(actor, view.layoutId, { revision: view.review.currentRevision })]);
  const s = current.layout.summary;
  return (
    <>
      <ReviewPanel
        initial={view}
        summary={{ counts: s.counts, inputsUsed: s.inputsUsed, inputsTotal: s.inputsTotal, zonesUsed: s.zonesUsed, unplaced: s.unplaced, coverage: s.coverage, findings: s.findings }}
        boards={sheet.sheet.boards.map((b) => ({ key: b.boardKey, name: b.name, inputs: b.rows.length }))}
        canComment={can(actor.role, "layout:comment")}
        lifeSafety={sheet.sheet.lifeSafety}
      />
    </>
  );
}
