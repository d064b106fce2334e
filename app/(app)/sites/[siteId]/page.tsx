import Link from "next/link";
import { notFound } from "next/navigation";
import { pageActor } from "@/lib/server/session";
import { getSite } from "@/lib/server/sites";
import { idParam } from "@/lib/server/route";
import { PageHeader } from "@/components/ui/page-header";
import { Refusal } from "@/components/ui/refusal";
import { Card } from "@/components/ui/card";
import { orNotFound } from "@/lib/server/page-load";
import { can } from "@/lib/auth/permissions";
import { makeFormat } from "@/lib/format/format";

export default async function SitePage({ params }: { params: Promise<{ siteId: string }> }) {
  const { siteId } = await params;
  const { actor, allowed, reason } = await pageActor("site:read", `/sites/${siteId}`);
  if (!allowed) return <Refusal reason={reason} />;
  const id = idParam.safeParse(siteId);
  if (!id.success) notFound();
  const site = await orNotFound(getSite(actor, id.data));
  return (
    <>
      <PageHeader
        title={site.name}
        subtitle={site.address}
        actions={
          <>
            <Link href={`/sites/${site.id}/edit`} className="rounded-md border border-line bg-white px-3 py-2 text-sm font-medium hover:bg-slate-50">
              {can(actor.role, "site:write") ? "Edit site" : "Site details"}
            </Link>
            <Link href={`/sites/${site.id}/schedule`} className="rounded-md border border-line bg-white px-3 py-2 text-sm font-medium hover:bg-slate-50">
              Device schedule
            </Link>
            <Link href={`/sites/${site.id}/plans`} className="rounded-md border border-line bg-white px-3 py-2 text-sm font-medium hover:bg-slate-50">
              Floor plans
            </Link>
            <Link href={`/sites/${site.id}/compare`} className="rounded-md border border-line bg-white px-3 py-2 text-sm font-medium hover:bg-slate-50">
              Compare layouts
            </Link>
            <Link href={`/sites/${site.id}/layouts`} className="rounded-md bg-signal px-3 py-2 text-sm font-medium text-white hover:bg-[#0c5a5a]">
              Layouts
            </Link>
          </>
        }
      />
      {site.archivedAt ? (
        <p className="mb-4 rounded border border-line bg-slate-100 p-2 text-sm" role="status">
          This site is archived ({makeFormat(actor.settings).date(site.archivedAt)}): it is hidden from the site list; everything it holds is kept.
        </p>
      ) : null}
      <p className="mb-4 max-w-3xl text-sm">{site.description}</p>
      <dl className="mb-6 grid max-w-3xl grid-cols-1 gap-x-4 gap-y-1 text-sm sm:grid-cols-[10rem_1fr]">
        <dt className="text-slate-500">Customer contact</dt>
        <dd>{[site.contactName, site.contactPhone, site.contactEmail].filter(Boolean).join(" · ") || "none recorded"}</dd>
        <dt className="text-slate-500">Installers</dt>
        <dd data-testid="site-installer-names">{site.installers.map((i) => i.name).join(", ") || "none assigned"}</dd>
        {site.notes ? (
          <>
            <dt className="text-slate-500">Notes</dt>
            <dd className="whitespace-pre-line">{site.notes}</dd>
          </>
        ) : null}
      </dl>
      <h2 className="mb-3 text-lg font-semibold">Floors, areas and rooms</h2>
      {site.floors.length === 0 ? <p className="text-sm text-slate-600">No floors yet.</p> : null}
      <div className="grid grid-cols-1 gap-4 sm:grid-cols-2 lg:grid-cols-3">
        {site.floors.map((f) => (
          <Card key={f.id}>
            <p className="font-medium">{f.name}</p>
            {f.areas.map((a) => (
              <div key={a.id} className="mt-2 text-sm">
                {a.name === f.name ? null : <p className="font-medium text-slate-700">{a.name}</p>}
                <ul className="text-slate-600">
                  {a.rooms.map((r) => (
                    <li key={r.id}>{r.name}</li>
                  ))}
                </ul>
              </div>
            ))}
          </Card>
        ))}
      </div>
    </>
  );
}
