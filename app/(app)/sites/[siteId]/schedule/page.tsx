import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { pageActor } from "@/lib/server/session";
import { getSite } from "@/lib/server/sites";
import { catalogFor, loadSchedule } from "@/lib/server/schedules";
import { idParam } from "@/lib/server/route";
import { can } from "@/lib/auth/permissions";
import { isLifeSafety } from "@/lib/catalog/life-safety";
import { PageHeader } from "@/components/ui/page-header";
import { Refusal } from "@/components/ui/refusal";
import { ScheduleManager } from "@/components/schedule/schedule-manager";
import { SiteAreasProvider } from "@/components/schedule/site-areas-context";
import { siteAreasOf } from "@/components/schedule/schedule-labels";
import { FireCaution } from "@/components/editor/fire-caution";
import { orNotFound } from "@/lib/server/page-load";

export const metadata: Metadata = { title: "Device schedule" };

export default async function SchedulePage({ params }: { params: Promise<{ siteId: string }> }) {
  const { siteId } = await params;
  const { actor, allowed, reason } = await pageActor("site:read", `/sites/${siteId}/schedule`);
  if (!allowed) return <Refusal reason={reason} />;
  const id = idParam.safeParse(siteId);
  if (!id.success) notFound();
  const site = await orNotFound(getSite(actor, id.data));
  const [schedule, catalog] = await Promise.all([loadSchedule(site.id), catalogFor(actor.organisationId)]);
  const types = catalog.detectors.map((d) => ({ id: d.id, name: d.name, category: d.category, lifeSafety: isLifeSafety(d) }));
  const fireIds = new Set(types.filter((t) => t.lifeSafety).map((t) => t.id));
  return (
    <>
      <PageHeader
        title={`Device schedule — ${site.name}`}
        subtitle={
          <>
            Every detector of the site with its cable run to the board. Layouts place these detectors on inputs.{" "}
            <Link href={`/sites/${site.id}/layouts`} className="text-signal underline underline-offset-2">
              Open the layouts
            </Link>
          </>
        }
      />
      {schedule.some((d) => fireIds.has(d.catalogId)) ? (
        <div className="mb-4">
          <FireCaution />
        </div>
      ) : null}
      <SiteAreasProvider siteId={site.id} initial={siteAreasOf(site)} canAddRooms={can(actor.role, "site:write")}>
        <ScheduleManager siteId={site.id} initial={schedule} types={types} areas={siteAreasOf(site)} canWrite={can(actor.role, "schedule:write")} />
      </SiteAreasProvider>
    </>
  );
}
