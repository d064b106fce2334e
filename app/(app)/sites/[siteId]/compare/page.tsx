import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { pageActor } from "@/lib/server/session";
import { compareSiteLayouts, listSiteDecisions, type ComparisonView } from "@/lib/server/review";
import { getLayout, listLayouts } from "@/lib/server/layouts";
import { catalogFor, loadSchedule } from "@/lib/server/schedules";
import { getSite } from "@/lib/server/sites";
import { ApiError } from "@/lib/server/errors";
import { idParam } from "@/lib/server/route";
import { can } from "@/lib/auth/permissions";
import { compareRequestSchema } from "@/lib/review/review-schema";
import { layoutDocumentSchema } from "@/lib/layout/schema";
import { solveLayout } from "@/lib/solver";
import { isLifeSafety } from "@/lib/solver/resolve";
import { severityRank } from "@/lib/findings";
import { PageHeader } from "@/components/ui/page-header";
import { Refusal } from "@/components/ui/refusal";
import { CompareView } from "@/components/compare/compare-view";
import { orNotFound } from "@/lib/server/page-load";

export const metadata: Metadata = { title: "Compare layouts" };

export default async function ComparePage({ params, searchParams }: { params: Promise<{ siteId: string }>; searchParams: Promise<{ ids?: string | string[] }> }) {
  const { siteId } = await params;
  const { ids } = await searchParams;
  const { actor, allowed, reason } = await pageActor("layout:read", `/sites/${siteId}/compare${typeof ids === "string" ? `?ids=${encodeURIComponent(ids)}` : ""}`);
  if (!allowed) return <Refusal reason={reason} />;
  const sid = idParam.safeParse(siteId);
  if (!sid.success) notFound();
  const site = await orNotFound(getSite(actor, sid.data));
  const layouts = await listLayouts(actor, site.id);
  const raw = (typeof ids === "string" ? ids : "").split(",").map((s) => s.trim()).filter(Boolean).map(Number);
  let comparison: ComparisonView | null = null;
  let error: string | null = null;
  const findings: Record<number, { severity: "error" | "warning" | "note"; message: string }[]> = {};
  let lifeSafety = false;
  if (raw.length) {
    const parsed = compareRequestSchema.safeParse({ layoutIds: raw });
    if (!parsed.success) error = `Cannot compare these: ${parsed.error.issues.map((i) => i.message).join("; ")}.`;
    else {
      try {
        comparison = await compareSiteLayouts(actor, site.id, parsed.data.layoutIds);
        const [schedule, catalog] = await Promise.all([loadSchedule(site.id), catalogFor(actor.organisationId)]);
        lifeSafety = schedule.some((d) => {
          const c = catalog.detectors.find((x) => x.id === d.catalogId);
          return !!c && isLifeSafety(c);
        });
        for (const id of parsed.data.layoutIds) {
          const { document } = await getLayout(actor, id);
          findings[id] = solveLayout(layoutDocumentSchema.parse(document), schedule, catalog)
            .findings.map((f) => ({ severity: f.severity, message: f.message }))
            .sort((a, b) => severityRank[a.severity] - severityRank[b.severity]);
        }
      } catch (e) {
        if (!(e instanceof ApiError && e.status === 404)) throw e;
        error = "One of those layouts is not a layout of this site.";
        comparison = null;
      }
    }
  }
  const choices = comparison ? (await listSiteDecisions(actor, site.id)).filter((d) => d.kind === "choose") : [];
  return (
    <>
      <PageHeader
        title={`Compare layouts — ${site.name}`}
        subtitle="Cost, spare inputs, supplies and standby batteries, supervision coverage and findings of each layout side by side; then record which one is chosen and why."
        actions={
          <Link href={`/sites/${site.id}/layouts`} className="no-print rounded-md border border-line bg-white px-3 py-2 text-sm font-medium hover:bg-slate-50">
            Layouts
          </Link>
        }
      />
      <CompareView
        siteId={site.id}
        layouts={layouts.map((l) => ({ id: l.id, name: l.name, status: l.status, currentRevision: l.currentRevision, inputsUsed: l.summary.inputsUsed, inputsTotal: l.summary.inputsTotal, errors: l.summary.counts.error }))}
        selected={comparison ? comparison.layouts.map((l) => l.id) : []}
        comparison={comparison}
        error={error}
        findings={findings}
        choices={choices}
        canChoose={can(actor.role, "layout:write")}
        lifeSafety={lifeSafety}
      />
    </>
  );
}
