import Link from "next/link";
import { pageActor } from "@/lib/server/session";
import { listSites } from "@/lib/server/sites";
import { siteListQuerySchema } from "@/lib/sites/site-schema";
import { can } from "@/lib/auth/permissions";
import { PageHeader } from "@/components/ui/page-header";
import { Refusal } from "@/components/ui/refusal";
import { Card } from "@/components/ui/card";

const filters = [
  ["exclude", "Current"],
  ["include", "All, archived too"],
  ["only", "Archived only"],
] as const;

export default async function SitesPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const { actor, allowed, reason } = await pageActor("site:read", "/");
  if (!allowed) return <Refusal reason={reason} />;
  const q = siteListQuerySchema.safeParse(await searchParams);
  const archived = q.success ? q.data.archived : "exclude";
  const sites = await listSites(actor, { archived });
  return (
    <>
      <PageHeader
        title="Sites"
        subtitle={`Buildings ${actor.organisationName} designs alarm systems for.`}
        actions={
          can(actor.role, "site:write") ? (
            <Link href="/sites/new" className="rounded-md bg-signal px-3 py-2 text-sm font-medium text-white hover:bg-[#0c5a5a]">
              New site
            </Link>
          ) : null
        }
      />
      <nav className="mb-4 flex gap-2 text-sm" aria-label="Which sites">
        {filters.map(([value, label]) => (
          <Link key={value} href={value === "exclude" ? "/" : `/?archived=${value}`} aria-current={archived === value ? "page" : undefined} className={`rounded-md border px-2 py-1 ${archived === value ? "border-signal bg-signal-soft font-medium" : "border-line bg-white"}`}>
            {label}
          </Link>
        ))}
      </nav>
      {sites.length === 0 ? <p className="text-sm text-slate-600">{archived === "only" ? "No archived sites." : "No sites yet."}</p> : null}
      <ul className="grid grid-cols-1 gap-4 sm:grid-cols-2 lg:grid-cols-3" data-testid="site-list">
        {sites.map((s) => (
          <li key={s.id}>
            <Link href={`/sites/${s.id}`}>
              <Card className="h-full hover:border-signal">
                <p className="font-semibold">
                  {s.name}
                  {s.archivedAt ? <span className="ml-2 rounded bg-slate-200 px-1.5 py-0.5 text-xs font-normal">archived</span> : null}
                </p>
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
