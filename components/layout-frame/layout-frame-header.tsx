import Link from "next/link";
import type { EffectiveReview } from "@/lib/review/effective-state";
import { StateBadge } from "@/components/review/state-badge";
import { LayoutTabNav } from "@/components/layout-frame/layout-tab-nav";

export interface LayoutFrameHeaderProps {
  site: { id: number; name: string };
  layout: { id: number; name: string };
  review: EffectiveReview;
}

/** The top of every page of a layout: where it belongs, its name and review state, its tabs. Never printed. */
export function LayoutFrameHeader({ site, layout, review }: LayoutFrameHeaderProps) {
  return (
    <div className="no-print mb-4" data-testid="layout-frame">
      <p className="text-sm text-slate-600">
        <Link href={`/sites/${site.id}`} className="break-words hover:underline">
          {site.name}
        </Link>{" "}
        ›{" "}
        <Link href={`/sites/${site.id}/layouts`} className="hover:underline">
          Layouts
        </Link>{" "}
        ›{" "}
        <Link href={`/sites/${site.id}/compare`} className="hover:underline">
          Compare
        </Link>
      </p>
      <div className="mt-1 flex flex-wrap items-center gap-x-3 gap-y-1">
        <h1 className="min-w-0 break-words text-2xl font-semibold tracking-tight" data-testid="layout-name">
          {layout.name}
        </h1>
        <StateBadge state={review.state} />
        <span className="text-xs text-slate-600" data-testid="layout-revisions">
          revision {review.currentRevision}
          {review.approvedRevision !== null ? ` · approved revision ${review.approvedRevision}` : ""}
          {review.commissionedRevision !== null ? ` · commissioned revision ${review.commissionedRevision}` : ""}
        </span>
      </div>
      <LayoutTabNav base={`/sites/${site.id}/layouts/${layout.id}`} />
    </div>
  );
}
