import { Bone, LoadingPage } from "@/components/ui/skeleton";

// The layout editor's frame while the layout, schedule and catalog load: the same three columns as LayoutEditor.
export default function LayoutEditorLoading() {
  return (
    <LoadingPage what="the layout editor">
      <div className="mx-[calc((100%-min(100vw-2rem,110rem))/2)]">
        <div className="mb-3 flex flex-wrap items-center justify-between gap-3">
          <Bone className="h-4 w-48" />
          <div className="flex items-start gap-2">
            <Bone className="h-9 w-24" />
            <span className="rounded-md border border-line bg-white px-3 py-2 text-sm font-medium text-slate-400">History</span>
          </div>
        </div>
        <div className="mb-3 min-h-6" />
        <div className="grid grid-cols-1 gap-4 lg:grid-cols-[15rem_minmax(0,1fr)_20rem] 2xl:grid-cols-[17rem_minmax(0,1fr)_24rem]">
          <aside className="flex flex-col gap-2">
            <h2 className="mb-2 text-sm font-semibold">Unplaced detectors</h2>
            {Array.from({ length: 8 }, (_, i) => (
              <Bone key={i} className="h-7 w-full" />
            ))}
          </aside>
          <div className="flex min-w-0 flex-col gap-3">
            {["Control panel", "", ""].map((title, i) => (
              <section key={i} className="rounded-lg border border-line bg-white p-3 shadow-sm">
                {title ? <h3 className="font-semibold">{title}</h3> : <Bone className="h-5 w-40" />}
                <Bone className="mt-1 h-3 w-72 max-w-full" />
                <div className="mt-3 grid grid-cols-2 gap-2 sm:grid-cols-4">
                  {Array.from({ length: i === 0 ? 8 : 4 }, (_, k) => (
                    <Bone key={k} className="h-14 w-full" />
                  ))}
                </div>
              </section>
            ))}
          </div>
          <div className="flex min-w-0 flex-col gap-3">
            {["Findings", "Figures", "Hardware and power"].map((title) => (
              <section key={title} className="rounded-lg border border-line bg-white p-3">
                <h2 className="text-sm font-semibold">{title}</h2>
                <Bone className="mt-2 h-3 w-full" />
                <Bone className="mt-2 h-3 w-5/6" />
                <Bone className="mt-2 h-3 w-2/3" />
              </section>
            ))}
          </div>
        </div>
      </div>
    </LoadingPage>
  );
}
