import Link from "next/link";
import { pageActor } from "@/lib/server/session";
import { listSites } from "@/lib/server/sites";
import { PageHeader } from "@/components/ui/page-header";
import { Refusal } from "@/components/ui/refusal";
import { Card } from "@/components/ui/card";

export default async function SitesPage() {
  const { actor, allowed, reason } = await pageActor("site:read", "/");
  if (!allowed) return <Refusal reason={reason} />;
  const sites = await listSites(actor);
  return (
    <>
      <PageHeader title="Sites" subtitle={`Buildings ${actor.organisationName} designs alarm systems for.`} />
      {sites.length === 0 ? <p className="text-sm text-slate-600">No sites yet.</p> : null}
      <ul className="grid gap-4 sm:grid-cols-2 lg:grid-cols-3" data-testid="site-list">
        {sites.map((s) => (
          <li key={s.id}>
            <Link href={`/sites/${s.id}`}>
              <Card className="h-full hover:border-signal">
                <p className="font-semibold">{s.name}</p>
                <p className="text-sm text-slate-600">{s.address}</p>
                <p className="mt-2 line-clamp-2 text-sm">{s.description}</p>
              </Card>
            </Link>
          </li>
        ))}
      </ul>
    </>
  );
}
