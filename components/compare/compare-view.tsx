"use client";

import { LifeSafetyCaution } from "@/components/ui/life-safety-caution";
import type { ComparePage } from "@/lib/server/compare";
import { Card } from "@/components/ui/card";
import { ChooseForm } from "@/components/compare/choose-form";
import { CompareDetails } from "@/components/compare/compare-details";
import { shortSummary } from "@/components/compare/compare-format";
import { ComparePicker } from "@/components/compare/compare-picker";
import { CompareTable } from "@/components/compare/compare-table";
import { ComparisonChart } from "@/components/compare/comparison-chart";

export type CompareViewProps = Omit<ComparePage, "site"> & { site: { id: number } };

/** The compare page: pick layouts, see them side by side (as the server compared them), record the choice. */
export function CompareView({ site, layouts, selected, comparison, error, choices, canChoose }: CompareViewProps) {
  const siteId = site.id;
  const cols = comparison?.comparison.columns ?? [];
  return (
    <div className="flex flex-col gap-6">
      <ComparePicker siteId={siteId} layouts={layouts} selected={selected} error={error} />

      {comparison ? (
        <>
          <Card>
            <h2 className="text-lg font-semibold">In short</h2>
            <ul className="mt-2 list-disc space-y-1 pl-5 text-sm" data-testid="compare-summary">
              {comparison.comparison.summary.map((s, i) => (
                <li key={i}>{shortSummary(s)}</li>
              ))}
            </ul>
            <div className="mt-4">
              <ComparisonChart columns={cols} />
            </div>
          </Card>

          <CompareTable siteId={siteId} comparison={comparison} />

          <div className="grid grid-cols-1 gap-4" style={{ gridTemplateColumns: `repeat(auto-fit, minmax(20rem, 1fr))` }}>
            {cols.map((c, i) => (
              <CompareDetails key={i} column={c} />
            ))}
          </div>

          {comparison.comparison.lifeSafety ? (
            <LifeSafetyCaution>
              These layouts carry smoke, heat or other life-safety devices. Their design and standby battery sizing must follow the local fire code and the authority having
              jurisdiction, and be installed and certified by licensed people. Loopwright&apos;s figures are an aid, not an approval.
            </LifeSafetyCaution>
          ) : null}

          <ChooseForm siteId={siteId} columns={cols} comparedIds={comparison.layouts.map((l) => l.id)} canChoose={canChoose} choices={choices} />
        </>
      ) : null}
    </div>
  );
}
