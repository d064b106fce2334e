import Link from "next/link";
import type { EffectiveReview } from "@/lib/review/effective-state";
import { StateBadge } from "@/components/review/state-badge";

export type LayoutTab = "editor" | "review" | "sheet" | "commissioning";

export const TABS: { tab: LayoutTab; label: string; path: string }[] = [
  { tab: "editor", label: "Editor", path: "" },
  { tab: "review", label: "Review", path: "/review" },
  { tab: "sheet", label: "Terminal sheet", path: "/sheet" },
  { tab: "commissioning", label: "Commissioning", path: "/commissioning" },
];

/** The layout's pages and its review state; never printed. */
export function LayoutTabs({ siteId, siteName, layoutId, layoutName, review, current, compact = false }: { siteId: number; siteName?: string; layoutId: number; layoutName?: string; review: EffectiveReview; current: LayoutTab; compact?: boolean }) {
  const base = `/sites/${siteId}/layouts/${layoutId}`;
  return (
    <div className="no-print mb-4">
      {!compact ? (
        <>
          <p className="text-sm text-slate-600">
            <Link href={`/sites/${siteId}`} className="hover:underline">
              {siteName ?? "Site"}
            </Link>{" "}
            ›{" "}
            <Link href={`/sites/${siteId}/layouts`} className="hover:underline">
              Layouts
            </Link>{" "}
            ›{" "}
            <Link href={`/sites/${siteId}/compare`} className="hover:underline">
              Compare
            </Link>
          </p>
          <div className="mt-1 flex flex-wrap items-center gap-3">
            <h1 className="text-2xl font-semibold tracking-tight" data-testid="layout-title">
              {layoutName}
            </h1>
            <StateBadge state={review.state} />
            <span className="text-xs text-slate-600">
              revision {review.currentRevision}
              {review.approvedRevision !== null ? ` · approved revision ${review.approvedRevision}` : ""}
              {review.commissionedRevision !== null ? ` · commissioned revision ${review.commissionedRevision}` : ""}
            </span>
          </div>
        </>
      ) : null}
      <nav aria-label="Layout pages" className="mt-3 flex flex-wrap gap-1 border-b border-line text-sm">
        {TABS.map((t) => (
          <Link
            key={t.tab}
            href={`${base}${t.path}`}
            aria-current={t.tab === current ? "page" : undefined}
            className={`-mb-px rounded-t-md border px-3 py-2 ${t.tab === current ? "border-line border-b-paper bg-paper font-semibold" : "border-transparent text-signal hover:bg-signal-soft"}`}
          >
            {t.label}
          </Link>
        ))}
      </nav>
    </div>
  );
}
