import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { pageActor } from "@/lib/server/session";
import { getTerminalSheet } from "@/lib/server/sheets";
import { layoutInstaller } from "@/lib/server/send-sheet";
import { idParam } from "@/lib/server/route";
import { can, refusal } from "@/lib/auth/permissions";
import { Refusal } from "@/components/ui/refusal";
import { TerminalSheetView } from "@/components/sheet/terminal-sheet-view";
import { orNotFound } from "@/lib/server/page-load";
import { approvedScheduleDrift } from "@/lib/server/schedule-drift";
import Link from "next/link";
import { paperOf } from "@/lib/sheet/sheet-request-schema";

export const metadata: Metadata = { title: "Terminal sheet" };

export default async function SheetPage({ params, searchParams }: { params: Promise<{ siteId: string; layoutId: string }>; searchParams: Promise<{ revision?: string }> }) {
  const { siteId, layoutId } = await params;
  const { revision } = await searchParams;
  const { actor, allowed, reason } = await pageActor("sheet:read", `/sites/${siteId}/layouts/${layoutId}/sheet`);
  if (!allowed) return <Refusal reason={reason} />;
  const sid = idParam.safeParse(siteId);
  const lid = idParam.safeParse(layoutId);
  const rev = revision === undefined ? undefined : idParam.safeParse(revision);
  if (!sid.success || !lid.success || (rev && !rev.success)) notFound();
  const view = await orNotFound(getTerminalSheet(actor, lid.data, { revision: rev?.data }));
  if (view.siteId !== sid.data) notFound();
  const [installer, drift] = await Promise.all([layoutInstaller(actor, view.layoutId), view.approved ? approvedScheduleDrift(actor, view.layoutId) : Promise.resolve(null)]);
  const canSend = can(actor.role, "sheet:send");
  return (
    <>
      {drift?.headline && drift.approvedRevision === view.meta.revision ? (
        <p role="note" className="no-print mb-3 rounded-md border-2 border-warn bg-warn-soft p-3 text-sm" data-testid="schedule-drift">
          <strong>{drift.headline}</strong> This sheet stays as approved.{" "}
          <Link className="font-medium text-signal underline" href={`/sites/${view.siteId}/layouts/${view.layoutId}`}>
            See the differences on the layout
          </Link>
        </p>
      ) : null}
      <TerminalSheetView view={view} installer={installer ? { name: installer.name, email: installer.email } : null} canSend={canSend} sendRefusal={canSend ? "" : refusal(actor.role, "sheet:send")} defaultPaper={paperOf(actor.settings)} />
    </>
  );
}
