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
  const installer = await layoutInstaller(actor, view.layoutId);
  const canSend = can(actor.role, "sheet:send");
  return (
    <TerminalSheetView view={view} installer={installer ? { name: installer.name, email: installer.email } : null} canSend={canSend} sendRefusal={canSend ? "" : refusal(actor.role, "sheet:send")} />
  );
}
