import type { Metadata } from "next";
import Link from "next/link";
import { notFound } from "next/navigation";
import { pageActor } from "@/lib/server/session";
import { getSite, listInstallerMembers } from "@/lib/server/sites";
import { idParam } from "@/lib/server/route";
import { orNotFound } from "@/lib/server/page-load";
import { can, refusal } from "@/lib/auth/permissions";
import { PageHeader } from "@/components/ui/page-header";
import { Refusal } from "@/components/ui/refusal";
import { Card } from "@/components/ui/card";
import { SiteDetailsSection } from "@/components/sites/site-details-section";
import { StructureSection } from "@/components/sites/structure-section";
import { InstallersSection } from "@/components/sites/installers-section";
import { ArchiveSection } from "@/components/sites/archive-section";
import { CopySiteForm } from "@/components/sites/copy-site-form";

export const metadata: Metadata = { title: "Edit site" };

export default async function EditSitePage({ params }: { params: Promise<{ siteId: string }> }) {
  const { siteId } = await params;
  const { actor, allowed, reason } = await pageActor("site:read", `/sites/${siteId}/edit`);
  if (!allowed) return <Refusal reason={reason} />;
  const id = idParam.safeParse(siteId);
  if (!id.success) notFound();
  const [site, candidates] = await Promise.all([orNotFound(getSite(actor, id.data)), listInstallerMembers(actor)]);
  const canWrite = can(actor.role, "site:write");
  const section = (title: string, body: React.ReactNode, testId?: string) => (
    <Card>
      <h2 className="mb-3 font-semibold" data-testid={testId}>
        {title}
      </h2>
      {body}
    </Card>
  );
  return (
    <>
      <PageHeader
        title={`Edit site — ${site.name}`}
        subtitle={
          <Link href={`/sites/${site.id}`} className="text-signal hover:underline">
            Back to the site
          </Link>
        }
      />
      {!canWrite ? <p className="mb-4 text-sm text-slate-600">{refusal(actor.role, "site:write")}</p> : null}
      <div className="flex flex-col gap-4">
        {section("Details", <SiteDetailsSection siteId={site.id} canWrite={canWrite} values={{ name: site.name, address: site.address, description: site.description, contactName: site.contactName, contactPhone: site.contactPhone, contactEmail: site.contactEmail, notes: site.notes, securityGrade: site.securityGrade }} />)}
        {section("Floors, areas and rooms", <StructureSection site={site} canWrite={canWrite} />)}
        {section("Installers", <InstallersSection siteId={site.id} assigned={site.installers} candidates={candidates} canWrite={canWrite} />)}
        {can(actor.role, "schedule:write") ? section("Start a new site from this one", <CopySiteForm siteId={site.id} name={site.name} />) : null}
        {section("Archive", <ArchiveSection siteId={site.id} name={site.name} archivedAt={site.archivedAt} canArchive={can(actor.role, "site:archive")} refusal={refusal(actor.role, "site:archive")} />)}
      </div>
    </>
  );
}
