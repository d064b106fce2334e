import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { pageActor } from "@/lib/server/session";
import { getCommissioning } from "@/lib/server/commissioning";
import { findLayoutForReview, getTerminalSheet, loadSheetContext } from "@/lib/server/sheets";
import { catalogFor } from "@/lib/server/schedules";
import { idParam } from "@/lib/server/route";
import { can, refusal } from "@/lib/auth/permissions";
import { usualValuesOf } from "@/lib/commissioning/diagnose";
import { Refusal } from "@/components/ui/refusal";
import { CommissioningApp } from "@/components/commissioning/commissioning-app";
import { orNotFound } from "@/lib/server/page-load";

export const metadata: Metadata = { title: "Commissioning" };

export default async function CommissioningPage({ params }: { params: Promise<{ siteId: string; layoutId: string }> }) {
  const { siteId, layoutId } = await params;
  const { actor, allowed, reason } = await pageActor("sheet:read", `/sites/${siteId}/layouts/${layoutId}/commissioning`);
  if (!allowed) return <Refusal reason={reason} />;
  const sid = idParam.safeParse(siteId);
  const lid = idParam.safeParse(layoutId);
  if (!sid.success || !lid.success) notFound();
  const ref = await orNotFound(findLayoutForReview(actor, lid.data));
  if (ref.layout.siteId !== sid.data) notFound();
  const view = await getCommissioning(actor, lid.data);
  // The approved revision's own catalog (frozen with it), so the phone judges readings as the server does.
  const [sheet, catalog] = await Promise.all([
    view.revision === null ? null : getTerminalSheet(actor, lid.data, { revision: view.revision }),
    view.revision === null ? catalogFor(actor.organisationId) : loadSheetContext(actor, lid.data, { revision: view.revision }).then((c) => c.catalog),
  ]);
  const canRecord = can(actor.role, "commissioning:record");
  return (
    <>
      <CommissioningApp
        siteId={ref.site.id}
        layoutId={ref.layout.id}
        initial={view}
        sheet={sheet?.sheet ?? null}
        usualValues={usualValuesOf(catalog)}
        canRecord={canRecord}
        recordRefusal={canRecord ? "" : refusal(actor.role, "commissioning:record")}
      />
    </>
  );
}
