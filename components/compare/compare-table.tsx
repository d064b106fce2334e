"use client";

import Link from "next/link";
import type { ComparisonView } from "@/lib/server/review";
import { Card } from "@/components/ui/card";
import { HARDWARE, isBest, loadStyle, ma, pct, plural } from "@/components/compare/compare-format";
import { useFormat } from "@/components/format/format-provider";

/** "best" on a measure, unless every layout ties on it. */
function Best({ on }: { on: boolean }) {
  return on ? <span className="ml-1 rounded bg-signal-soft px-1 text-[11px] font-semibold uppercase text-signal">best</span> : null;
}

function Row({ label, children }: { label: string; children: React.ReactNode }) {
  return (
    <tr className="border-b border-line">
      <th scope="row" className="py-2 pr-3 text-left font-medium text-slate-600">
        {label}
      </th>
      {children}
    </tr>
  );
}

/** Every measure of the compared layouts in one table, the best of each marked. */
export function CompareTable({ siteId, comparison }: { siteId: number; comparison: ComparisonView }) {
  const { money } = useFormat();
  const cols = comparison.comparison.columns;
  const best = comparison.comparison.best;
  const bestOn = (list: number[], i: number) => isBest(list, i, cols.length);
  return (
    <Card className="relative overflow-x-auto">
      <h2 className="text-lg font-semibold">Side by side</h2>
      <p className="mt-1 text-xs text-slate-600">Costs are the catalog&apos;s list prices (in its currency); resistors and batteries carry no price there and are counted apart.</p>
      <table className="mt-3 w-full min-w-[640px] border-collapse text-sm" data-testid="compare-table">
        <thead>
          <tr className="border-b border-line text-left align-bottom">
            <th className="w-48 py-2 pr-3 text-slate-500">Measure</th>
            {cols.map((c, i) => (
              <th key={i} className="px-3 py-2">
                <Link href={`/sites/${siteId}/layouts/${Number(c.id)}`} className="text-signal underline underline-offset-2">
                  {c.name}
                </Link>
                <span className="block text-xs font-normal text-slate-600">
                  {comparison.layouts[i]?.status} · revision {comparison.layouts[i]?.revision} ·{" "}
                  <Link className="underline" href={`/sites/${siteId}/layouts/${Number(c.id)}/review`}>
                    review
                  </Link>
                </span>
                {c.notRanked ? (
                  <span className="mt-1 block text-xs font-medium text-fault" data-testid="not-ranked">
                    {c.notRanked}: never marked best
                  </span>
                ) : null}
              </th>
            ))}
          </tr>
        </thead>
        <tbody className="align-top">
          <Row label="Cost (list prices)">
            {cols.map((c, i) => (
              <td key={i} className="px-3 py-2 tabular-nums">
                <span className="text-lg font-semibold">{money(c.cost)}</span>
                <Best on={bestOn(best.cost, i)} />
                {c.unpricedLines ? <span className="block text-xs text-slate-600">+ {plural(c.unpricedLines, "unpriced line")} (resistors, batteries)</span> : null}
              </td>
            ))}
          </Row>
          <Row label="Boards and supplies">
            {cols.map((c, i) => (
              <td key={i} className="px-3 py-2">
                <ul className="space-y-0.5">
                  {c.bom.lines
                    .filter((l) => HARDWARE.includes(l.kind))
                    .map((l) => (
                      <li key={l.key}>
                        {l.quantity} × {l.description} <span className="tabular-nums text-slate-600">{l.total === null ? "(unpriced)" : money(l.total)}</span>
                      </li>
                    ))}
                </ul>
              </td>
            ))}
          </Row>
          <Row label="Inputs used / spare">
            {cols.map((c, i) => (
              <td key={i} className="px-3 py-2 tabular-nums">
                {c.inputs.used} of {c.inputs.total} used, <strong>{c.inputs.spare} spare</strong>
                <Best on={bestOn(best.spare, i)} />
                <span className="block text-xs text-slate-600">
                  {plural(c.zones, "zone")}{c.unplaced ? `, ${plural(c.unplaced, "detector")} not placed` : ""}
                </span>
              </td>
            ))}
          </Row>
          <Row label="Current and battery per supply">
            {cols.map((c, i) => (
              <td key={i} className="px-3 py-2">
                <ul className="space-y-2">
                  {c.supplies.map((s) => (
                    <li key={s.key} className="tabular-nums">
                      <span className="font-medium">{s.name}</span>
                      <span className="block">
                        {ma(s.restMa)} at rest, {ma(s.alarmMa)} in alarm, rated {ma(s.ratingMa)}
                      </span>
                      <span className={`block ${loadStyle(s.alarmLoad)}`}>detector load in alarm {Math.round(s.alarmLoad * 100)} % of the rating</span>
                      <span className="block">
                        standby battery {s.batteryNeededAh.toFixed(1)} Ah needed → {s.batteryAh === null ? <strong className="text-fault">no common size fits</strong> : `${s.batteryAh} Ah`}
                      </span>
                    </li>
                  ))}
                </ul>
              </td>
            ))}
          </Row>
          <Row label="Supervision coverage">
            {cols.map((c, i) => (
              <td key={i} className="px-3 py-2 tabular-nums">
                <span className="text-lg font-semibold">{pct(c.coverage.share)}</span>
                <Best on={bestOn(best.coverage, i)} />
                <span className="block text-xs text-slate-600">
                  {c.coverage.covered} of {c.coverage.used} used inputs report both a short and a cut as themselves
                </span>
              </td>
            ))}
          </Row>
          <Row label="Findings">
            {cols.map((c, i) => (
              <td key={i} className="px-3 py-2 tabular-nums">
                <span className="text-fault">{plural(c.findings.error, "error")}</span>, <span className="text-warn">{plural(c.findings.warning, "warning")}</span>, {plural(c.findings.note, "note")}
                <Best on={bestOn(best.errors, i)} />
              </td>
            ))}
          </Row>
          <Row label="Shared inputs">
            {cols.map((c, i) => (
              <td key={i} className="px-3 py-2">
                {c.shared.length === 0 ? <span className="text-slate-600">none: one detector per input</span> : `${plural(c.shared.length, "shared input")}, saving ${plural(c.shared.length, "input")}`}
              </td>
            ))}
          </Row>
        </tbody>
      </table>
    </Card>
  );
}
