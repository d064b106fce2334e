import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { pageActor } from "@/lib/server/session";
import { loadComparePage } from "@/lib/server/compare";
import { idParam } from "@/lib/server/route";
import { orNotFound } from "@/lib/server/page-load";
import { PageHeader } from "@/components/ui/page-header";
import { Refusal } from "@/components/ui/refusal";
import { CompareView } from "@/components/compare/compare-view";

export const metadata: Metadata = { title: "Compare layouts" };

export default async function ComparePage({ params, searchParams }: { params: Promise<{ siteId: string }>; searchParams: Promise<{ ids?: string | string[] }> }) {
  const { siteId } = await params;
  const { ids } = await searchParams;
  const { actor, allowed, reason } = await pageActor("layout:read", `/sites/${siteId}/compare${typeof ids === "string" ? `?ids=${encodeURIComponent(ids)}` : ""}`);
  if (!allowed) return <Refusal reason={reason} />;
  const sid = idParam.safeParse(siteId);
  if (!sid.success) notFound();
  const page = await orNotFound(loadComparePage(actor, sid.data, ids));
  return (
    <>
      <PageHeader
        title={`Compare layouts — ${page.site.name}`}
        subtitle="Cost, spare inputs, supplies and standby batteries, supervision coverage and findings of each layout side by side; then record which one is chosen and why."
        actions={
          <Link href={`/sites/${page.site.id}/layouts`} className="no-print rounded-md border border-line bg-white px-3 py-2 text-sm font-medium hover:bg-slate-50">
            Layouts
          </Link>
        }
      />
      <CompareView {...page} />
    </>
  );
}
