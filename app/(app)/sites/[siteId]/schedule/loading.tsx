import { Bone, LoadingPage, TableSkeleton } from "@/components/ui/skeleton";
import { PageHeader } from "@/components/ui/page-header";

// The device schedule's shape while it loads: the filter bar and ScheduleManager's columns, rows as grey blocks.
const COLUMNS = ["Label", "Type", "Area", "Room", "Cable (m)", "Gauge", "Supervision"] as const;

export default function ScheduleLoading() {
  return (
    <LoadingPage what="the device schedule">
      <PageHeader title="Device schedule" subtitle="Every detector of the site with its cable run to the board. Layouts place these detectors on inputs." />
      <div className="flex flex-col gap-4">
        <div className="flex flex-wrap items-end gap-3 text-sm">
          <div>
            <span className="font-medium">Filter</span>
            <Bone className="mt-1 h-8 w-56" />
          </div>
          <div>
            <span className="font-medium">Area</span>
            <Bone className="mt-1 h-8 w-32" />
          </div>
          <Bone className="h-4 w-40" />
          <div className="ml-auto flex gap-2">
            <Bone className="h-9 w-28" />
            <Bone className="h-9 w-24" />
          </div>
        </div>
        <div className="relative overflow-x-auto rounded-lg border border-line bg-white">
          <TableSkeleton columns={COLUMNS} rows={12} />
        </div>
      </div>
    </LoadingPage>
  );
}
