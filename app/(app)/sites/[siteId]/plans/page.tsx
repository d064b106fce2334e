import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { pageActor } from "@/lib/server/session";
import { getSite } from "@/lib/server/sites";
import { catalogFor, loadSchedule } from "@/lib/server/schedules";
import { listPlans } from "@/lib/server/plans";
import { loadLayoutForEditor } from "@/lib/server/layouts";
import { idParam } from "@/lib/server/route";
import { can } from "@/lib/auth/permissions";
import { orNotFound } from "@/lib/server/page-load";
import { isLifeSafety } from "@/lib/catalog/life-safety";
import { solveLayout } from "@/lib/solver";
import { markerStates } from "@/lib/plan/marker";
import { PageHeader } from "@/components/ui/page-header";
import { Refusal } from "@/components/ui/refusal";
import { FireCaution } from "@/components/editor/fire-caution";
import { FloorPlanFigure } from "@/components/plan/floor-plan-figure";

export const metadata: Metadata = { title: "Floor plans" };

/** The site's floor plans with each placed detector's zone and state in one layout (?layout=id), or none. */
export default async function PlansPage({ params, searchParams }: { params: Promise<{ siteId: string }>; searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const [{ siteId }, query] = await Promise.all([params, searchParams]);
  const { actor, allowed, reason } = await pageActor("site:read", `/sites/${siteId}/plans`);
  if (!allowed) return <Refusal reason={reason} />;
  const id = idParam.safeParse(siteId);
  if (!id.success) notFound();
  const site = await orNotFound(getSite(actor, id.data));
  const [{ plans, routes }, schedule, catalog] = await Promise.all([listPlans(actor, site.id), loadSchedule(site.id), catalogFor(actor.organisationId)]);
  const layoutId = idParam.safeParse(query.layout);
  let solved = null;
  if (layoutId.success) {
    const editor = await orNotFound(loadLayoutForEditor(actor, layoutId.data));
    if (editor.site.id !== site.id) notFound();
    const r = solveLayout(editor.document, editor.schedule, editor.catalog);
    solved = { zones: r.zones, findings: r.findings, inputs: editor.document.inputs };
  }
  const states = markerStates(
    schedule.map((d) => d.id),
    solved,
  );
  const labels = new Map(schedule.map((d) => [d.id, d.label]));
  const fireIds = new Set(catalog.detectors.filter(isLifeSafety).map((d) => d.id));
  return (
    <>
      <PageHeader
        title={`Floor plans — ${site.name}`}
        subtitle={
          <>
            Each floor&apos;s drawing with the detectors placed on it: a square with its zone number, a triangle when it has errors or warnings, a hollow circle when it is on no
            input yet.{" "}
            <Link href={`/sites/${site.id}`} className="text-signal underline underline-offset-2">
              Back to the site
            </Link>
          </>
        }
      />
      {schedule.some((d) => fireIds.has(d.catalogId)) ? (
        <div className="mb-4">
          <FireCaution />
        </div>
      ) : null}
      {site.floors.length === 0 ? (
        <p className="text-sm" data-testid="no-floors">
          This site has no floors yet: a plan belongs to a floor.{" "}
          {can(actor.role, "site:write") ? (
            <Link href={`/sites/${site.id}/edit`} className="text-signal underline underline-offset-2">
              Add the site&apos;s floors
            </Link>
          ) : null}
        </p>
      ) : null}
      {site.floors.map((f) => {
        const plan = plans.find((p) => p.floorId === f.id);
        return plan ? (
          <FloorPlanFigure key={f.id} siteId={site.id} floorName={f.name} plan={plan} routes={routes} labels={labels} states={states} units={actor.settings.units} />
        ) : (
          <section key={f.id} className="mb-6" aria-label={f.name}>
            <h2 className="text-lg font-semibold">{f.name}</h2>
            <p className="text-sm">No plan for this floor yet.</p>
          </section>
        );
      })}
    </>
  );
}
