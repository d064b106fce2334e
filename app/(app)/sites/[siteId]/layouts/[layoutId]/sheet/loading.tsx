import { Bone, LoadingPage, TableSkeleton } from "@/components/ui/skeleton";

// The terminal sheet's shape while the sheet is built: toolbar, header, then one block per input as in SheetInputBlock.
const DETECTOR_COLUMNS = ["Zone", "Detector", "Area / room", "Device type", "Contact", "Cable"] as const;

export default function TerminalSheetLoading() {
  return (
    <LoadingPage what="the terminal sheet">
      <div className="mb-4 flex flex-wrap items-center gap-3 rounded-lg border border-line bg-white p-3 text-sm">
        <span className="font-medium">Paper</span>
        <Bone className="h-7 w-16" />
        <Bone className="h-7 w-24" />
        <Bone className="h-9 w-16" />
        <Bone className="h-9 w-40" />
        <Bone className="ml-auto h-9 w-64" />
      </div>
      <header className="mb-3 flex flex-col gap-2">
        <Bone className="h-7 w-80 max-w-full" />
        <Bone className="h-4 w-[32rem] max-w-full" />
        <Bone className="h-4 w-[40rem] max-w-full" />
      </header>
      <section className="mb-8">
        <div className="mb-2 border-b-2 border-ink pb-1">
          <Bone className="h-6 w-72 max-w-full" />
          <Bone className="mt-1 h-3 w-96 max-w-full" />
        </div>
        {[0, 1, 2].map((i) => (
          <section key={i} className="mb-5 rounded-md border border-line bg-white p-3">
            <div className="flex flex-wrap items-baseline justify-between gap-2 border-b border-line pb-1">
              <Bone className="h-5 w-64" />
              <Bone className="h-3 w-72" />
            </div>
            <div className="mt-2 text-xs">
              <TableSkeleton columns={DETECTOR_COLUMNS} rows={i === 0 ? 2 : 1} thClassName="border border-line bg-slate-50 px-1.5 py-1 text-left font-semibold" tdClassName="border border-line px-1.5 py-1" />
            </div>
            <Bone className="mt-3 h-20 w-full" />
          </section>
        ))}
      </section>
    </LoadingPage>
  );
}
