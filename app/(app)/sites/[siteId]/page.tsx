import Link from "next/link";
import { notFound } from "next/navigation";
import { pageActor } from "@/lib/server/session";
import { getSite } from "@/lib/server/sites";
import { idParam } from "@/lib/server/route";
import { PageHeader } from "@/components/ui/page-header";
import { Refusal } from "@/components/ui/refusal";
import { Card } from "@/components/ui/card";
import { orNotFound } from "@/lib/server/page-load";

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
            <Link href={`/sites/${site.id}/schedule`} className="rounded-md border border-line bg-white px-3 py-2 text-sm font-medium hover:bg-slate-50">
              Device schedule
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
      <p className="mb-6 max-w-3xl text-sm">{site.description}</p>
      <h2 className="mb-3 text-lg font-semibold">Floors and areas</h2>
      <div className="grid gap-4 sm:grid-cols-2 lg:grid-cols-3">
        {site.areas.map((a) => (
          <Card key={a.id}>
            <p className="font-medium">{a.name}</p>
            <ul className="mt-2 text-sm text-slate-600">
              {a.rooms.map((r) => (
                <li key={r.id}>{r.name}</li>
              ))}
            </ul>
          </Card>
        ))}
      </div>
    </>
  );
}
