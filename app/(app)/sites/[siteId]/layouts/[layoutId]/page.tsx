import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { pageActor } from "@/lib/server/session";
import { loadLayoutForEditor } from "@/lib/server/layouts";
import { idParam } from "@/lib/server/route";
import { can, refusal } from "@/lib/auth/permissions";
import { Refusal } from "@/components/ui/refusal";
import { ReviewedEditor } from "@/components/review/reviewed-editor";
import { findLayoutForReview } from "@/lib/server/sheets";
import { orNotFound } from "@/lib/server/page-load";
import { approvedScheduleDrift } from "@/lib/server/schedule-drift";

export const metadata: Metadata = { title: "Layout editor" };

export default async function LayoutEditorPage({ params }: { params: Promise<{ siteId: string; layoutId: string }> }) {
  const { siteId, layoutId } = await params;
  const { actor, allowed, reason } = await pageActor("layout:read", `/sites/${siteId}/layouts/${layoutId}`);
  if (!allowed) return <Refusal reason={reason} />;
  const sid = idParam.safeParse(siteId);
  const lid = idParam.safeParse(layoutId);
  if (!sid.success || !lid.success) notFound();
  const data = await orNotFound(loadLayoutForEditor(actor, lid.data));
  if (data.site.id !== sid.data) notFound();
  const canWrite = can(actor.role, "layout:write");
  const [{ review }, drift] = await Promise.all([findLayoutForReview(actor, data.layout.id), approvedScheduleDrift(actor, data.layout.id)]);
  return <ReviewedEditor key={data.layout.id} review={review} drift={drift} editor={{ layout: data.layout, document: data.document, site: data.site, schedule: data.schedule, catalog: data.catalog, canWrite, readOnlyReason: canWrite ? "" : refusal(actor.role, "layout:write") }} />;
}
