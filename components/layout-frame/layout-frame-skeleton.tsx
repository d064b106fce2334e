import { Bone } from "@/components/ui/skeleton";
import { LAYOUT_TABS } from "@/components/layout-frame/layout-tabs-list";

/** The frame's shape before the layout is loaded: the trail, the name and state as grey blocks, the same tabs. */
export function LayoutFrameSkeleton() {
  return (
    <div className="no-print mb-4" aria-hidden="true" data-testid="layout-frame-loading">
      <p className="flex items-center gap-2 text-sm text-slate-600">
        <Bone className="h-4 w-28" /> › Layouts › Compare
      </p>
      <div className="mt-1 flex flex-wrap items-center gap-3">
        <Bone className="h-8 w-56" />
        <Bone className="h-5 w-20 rounded-full" />
        <Bone className="h-3 w-24" />
      </div>
      <div className="mt-3 flex flex-wrap gap-1 border-b border-line text-sm">
        {LAYOUT_TABS.map((t) => (
          <span key={t.tab} className="-mb-px rounded-t-md border border-transparent px-3 py-2 text-slate-500">
            {t.label}
          </span>
        ))}
      </div>
    </div>
  );
}
