import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { pageActor } from "@/lib/server/session";
import { getSite } from "@/lib/server/sites";
import { listLayouts } from "@/lib/server/layouts";
import { catalogFor, loadSchedule } from "@/lib/server/schedules";
import { idParam } from "@/lib/server/route";
import { can } from "@/lib/auth/permissions";
import { PageHeader } from "@/components/ui/page-header";
import { Refusal } from "@/components/ui/refusal";
import { LayoutsOverview } from "@/components/editor/layouts-overview";
import { orNotFound } from "@/lib/server/page-load";

export const metadata: Metadata = { title: "Layouts" };

export default async function LayoutsPage({ params }: { params: Promise<{ siteId: string }> }) {
  const { siteId } = await params;
  const { actor, allowed, reason } = await pageActor("layout:read", `/sites/${siteId}/layouts`);
  if (!allowed) return <Refusal reason={reason} />;
  const id = idParam.safeParse(siteId);
  if (!id.success) notFound();
  const site = await orNotFound(getSite(actor, id.data));
  const [layouts, catalog, schedule] = await Promise.all([listLayouts(actor, site.id), catalogFor(actor.organisationId), loadSchedule(site.id)]);
  const panels = catalog.panels.map((p) => ({ id: p.id, name: p.name, inputs: p.onboardInputs.count, maxZones: p.maxZones, listPrice: p.listPrice }));
  return (
    <>
      <PageHeader
        title={`Layouts — ${site.name}`}
        subtitle="Each layout is one design of the system: hardware chosen and detectors assigned. Every save is kept as a revision."
        actions={
          <Link href={`/sites/${site.id}/compare${layouts.length >= 2 ? `?ids=${layouts.slice(0, 2).map((l) => l.id).join(",")}` : ""}`} className="rounded-md border border-line bg-white px-3 py-2 text-sm font-medium hover:bg-slate-50" data-testid="compare-link">
            Compare layouts
          </Link>
        }
      />
      <LayoutsOverview siteId={site.id} initial={layouts} panels={panels} detectorCount={schedule.length} canWrite={can(actor.role, "layout:write")} />
    </>
  );
}
