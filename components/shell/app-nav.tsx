import Link from "next/link";
import { can, roleLabels } from "@/lib/auth/permissions";
import type { Actor } from "@/lib/server/session";
import { SignOutButton } from "@/components/auth/sign-out-button";

export function AppNav({ actor }: { actor: Actor }) {
  const links = [
    { href: "/", label: "Sites", show: can(actor.role, "site:read") },
    { href: "/catalog", label: "Catalog", show: can(actor.role, "catalog:read") },
    { href: "/loop-bench", label: "Loop bench", show: can(actor.role, "loop:analyze") },
    { href: "/members", label: "Members", show: can(actor.role, "members:read") },
    { href: "/audit", label: "Audit log", show: can(actor.role, "audit:read") },
    { href: "/settings", label: "Settings", show: can(actor.role, "organisation:manage") },
  ].filter((l) => l.show);
  return (
    <header className="no-print border-b border-line bg-ink text-white">
      <div className="mx-auto flex max-w-7xl flex-wrap items-center gap-6 px-4 py-3">
        <Link href="/" className="text-lg font-semibold tracking-tight">
          Loopwright
        </Link>
        <nav aria-label="Main" className="flex flex-wrap gap-4 text-sm">
          {links.map((l) => (
            <Link key={l.href} href={l.href} className="text-slate-200 hover:text-white">
              {l.label}
            </Link>
          ))}
        </nav>
        <div className="ml-auto flex items-center gap-3 text-sm">
          <span data-testid="whoami" className="text-slate-300">
            {actor.name} · {roleLabels[actor.role]} · {actor.organisationName}
          </span>
          <Link href="/account" className="text-slate-200 underline-offset-2 hover:text-white hover:underline">
            Account
          </Link>
          <SignOutButton />
        </div>
      </div>
    </header>
  );
}
