import { Bone, LoadingPage } from "@/components/ui/skeleton";

// Commissioning's shape while the record and the sheet load: progress, the boards, the loops of the first board.
export default function CommissioningLoading() {
  return (
    <LoadingPage what="the commissioning record">
      <div className="mx-auto flex max-w-3xl flex-col gap-4 text-base">
        <section className="rounded-lg border border-line bg-white p-3">
          <div className="flex flex-wrap items-baseline justify-between gap-2">
            <Bone className="h-6 w-48" />
            <Bone className="h-4 w-32" />
          </div>
          <div className="mt-2 h-3 w-full rounded-full bg-slate-200" />
          <Bone className="mt-2 h-4 w-64" />
        </section>
        <div className="grid grid-cols-2 gap-2 sm:grid-cols-3">
          {[0, 1, 2].map((i) => (
            <div key={i} className="min-h-16 rounded-lg border-2 border-line bg-white p-2">
              <Bone className="h-5 w-32" />
              <Bone className="mt-1 h-4 w-20" />
            </div>
          ))}
        </div>
        <section>
          <Bone className="mb-2 h-6 w-56" />
          <ul className="grid grid-cols-1 gap-2 sm:grid-cols-2">
            {Array.from({ length: 6 }, (_, i) => (
              <li key={i} className="min-h-16 rounded-lg border-2 border-line bg-white p-3">
                <Bone className="h-5 w-40" />
                <Bone className="mt-1 h-4 w-32" />
                <Bone className="mt-1 h-3 w-20" />
              </li>
            ))}
          </ul>
        </section>
      </div>
    </LoadingPage>
  );
}
