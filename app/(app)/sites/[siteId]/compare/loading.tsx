import { Bone, LoadingPage } from "@/components/ui/skeleton";
import { Card } from "@/components/ui/card";
import { PageHeader } from "@/components/ui/page-header";

// Compare's shape while the layouts are solved side by side: the picker, then CompareView's measures with grey cells.
const MEASURES = ["Cost (list prices)", "Boards and supplies", "Inputs used / spare", "Current and battery per supply", "Supervision coverage", "Findings", "Shared inputs"] as const;

export default function CompareLoading() {
  return (
    <LoadingPage what="the comparison">
      <PageHeader
        title="Compare layouts"
        subtitle="Cost, spare inputs, supplies and standby batteries, supervision coverage and findings of each layout side by side; then record which one is chosen and why."
      />
      <div className="flex flex-col gap-6">
        <Card>
          <h2 className="text-lg font-semibold">Pick the layouts to compare</h2>
          <div className="mt-2 grid grid-cols-1 gap-2 sm:grid-cols-2 lg:grid-cols-3">
            {[0, 1, 2].map((i) => (
              <div key={i} className="flex items-start gap-2 rounded-md border border-line bg-white p-2">
                <Bone className="mt-1 h-4 w-4" />
                <span className="flex-1">
                  <Bone className="h-4 w-32" />
                  <Bone className="mt-1 h-3 w-48" />
                </span>
              </div>
            ))}
          </div>
          <Bone className="mt-3 h-9 w-40" />
        </Card>
        <Card className="relative overflow-x-auto">
          <h2 className="text-lg font-semibold">Side by side</h2>
          <table className="mt-3 w-full min-w-[640px] border-collapse text-sm">
            <thead>
              <tr className="border-b border-line text-left align-bottom">
                <th className="w-48 py-2 pr-3 text-slate-500">Measure</th>
                {[0, 1].map((i) => (
                  <th key={i} className="px-3 py-2">
                    <Bone className="h-4 w-32" />
                    <Bone className="mt-1 h-3 w-40" />
                  </th>
                ))}
              </tr>
            </thead>
            <tbody className="align-top">
              {MEASURES.map((m) => (
                <tr key={m} className="border-b border-line">
                  <th scope="row" className="py-2 pr-3 text-left font-medium text-slate-600">
                    {m}
                  </th>
                  {[0, 1].map((i) => (
                    <td key={i} className="px-3 py-2">
                      <Bone className="h-5 w-28" />
                      <Bone className="mt-1 h-3 w-44" />
                    </td>
                  ))}
                </tr>
              ))}
            </tbody>
          </table>
        </Card>
      </div>
    </LoadingPage>
  );
}
