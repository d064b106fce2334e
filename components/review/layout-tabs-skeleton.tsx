import { Bone } from "@/components/ui/skeleton";
import { TABS, type LayoutTab } from "@/components/review/layout-tabs";

/** LayoutTabs' shape before the layout is loaded: the trail, the name and state as grey blocks, the same tabs. */
export function LayoutTabsSkeleton({ current, compact = false }: { current: LayoutTab; compact?: boolean }) {
  return (
    <div className="no-print mb-4">
      {!compact ? (
        <>
          <p className="flex items-center gap-2 text-sm text-slate-600">
            <Bone className="h-4 w-28" /> › Layouts › Compare
          </p>
          <div className="mt-1 flex flex-wrap items-center gap-3">
            <Bone className="h-8 w-56" />
            <Bone className="h-5 w-20 rounded-full" />
            <Bone className="h-3 w-24" />
          </div>
        </>
      ) : null}
      <div className="mt-3 flex flex-wrap gap-1 border-b border-line text-sm">
        {TABS.map((t) => (
          <span key={t.tab} className={`-mb-px rounded-t-md border px-3 py-2 ${t.tab === current ? "border-line border-b-paper bg-paper font-semibold" : "border-transparent text-slate-500"}`}>
            {t.label}
          </span>
        ))}
      </div>
    </div>
  );
}
