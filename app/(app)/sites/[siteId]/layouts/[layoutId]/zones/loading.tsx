import { Bone, LoadingPage, TableSkeleton } from "@/components/ui/skeleton";

// The zone list's shape while it is built: downloads, heading, then the table as in ZoneListTable.
const COLUMNS = ["Zone", "Keypad label", "Type", "Area", "Part-set", "Options", "Input", "Resistors"] as const;

export default function ZoneListLoading() {
  return (
    <LoadingPage what="the zone list">
      <div className="mb-4 flex flex-wrap items-center gap-3 rounded-lg border border-line bg-white p-3 text-sm">
        <Bone className="h-9 w-32" />
        <Bone className="h-5 w-28" />
      </div>
      <header className="mb-3 flex flex-col gap-2">
        <Bone className="h-7 w-80 max-w-full" />
        <Bone className="h-4 w-[32rem] max-w-full" />
      </header>
      <div className="text-sm">
        <TableSkeleton columns={COLUMNS} rows={8} thClassName="border border-line bg-slate-50 px-1.5 py-1 text-left font-semibold" tdClassName="border border-line px-1.5 py-1" />
      </div>
    </LoadingPage>
  );
}
