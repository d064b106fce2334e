import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { pageActor } from "@/lib/server/session";
import { getZoneList } from "@/lib/server/sheets";
import { idParam } from "@/lib/server/route";
import { Refusal } from "@/components/ui/refusal";
import { orNotFound } from "@/lib/server/page-load";
import { ZoneListView } from "@/components/zone-list/zone-list-view";

export const metadata: Metadata = { title: "Zone list" };

export default async function ZoneListPage({ params, searchParams }: { params: Promise<{ siteId: string; layoutId: string }>; searchParams: Promise<{ revision?: string }> }) {
  const { siteId, layoutId } = await params;
  const { revision } = await searchParams;
  const { actor, allowed, reason } = await pageActor("sheet:read", `/sites/${siteId}/layouts/${layoutId}/zones`);
  if (!allowed) return <Refusal reason={reason} />;
  const sid = idParam.safeParse(siteId);
  const lid = idParam.safeParse(layoutId);
  const rev = revision === undefined ? undefined : idParam.safeParse(revision);
  if (!sid.success || !lid.success || (rev && !rev.success)) notFound();
  const view = await orNotFound(getZoneList(actor, lid.data, { revision: rev?.data }));
  if (view.siteId !== sid.data) notFound();
  return <ZoneListView view={view} />;
}
