"use client";
// Every state × fault combination: reading, interval, report, what it should be, margin to the nearest band edge.
import { useState } from "react";
import { formatOhms, formatOhmsRange, statesLabel, type DetectorState, type Fault, type LoopDetector, type Reading } from "@/lib/loop";
import { FAULT_CHOICES, rowStatus } from "./bench-state";
import { ReportPills } from "./reading-panel";
import { STATUS_CLASS, STATUS_MARK, STATUS_WORDS, reportWord } from "./report-style";
import { Segmented } from "./controls";

type Filter = "all" | "none" | "shorts" | "cut";
const FILTERS: { value: Filter; label: string }[] = [
  { value: "all", label: "everything" },
  { value: "none", label: "no fault" },
  { value: "shorts", label: "shorts" },
  { value: "cut", label: "cut" },
];
const FAULT_ORDER: readonly Fault[] = ["none", "short-panel", "short-detector", "cut"];
const sentence = (x: string) => x.charAt(0).toUpperCase() + x.slice(1);
const keep = (f: Filter, fault: Fault) => f === "all" || (f === "none" ? fault === "none" : f === "shorts" ? fault === "short-panel" || fault === "short-detector" : fault === "cut");

export function StatesTable({ rows, detectors, current, onSelect }: { rows: readonly Reading[]; detectors: readonly LoopDetector[]; current: number | null; onSelect: (states: DetectorState[], fault: Fault) => void }) {
  const [filter, setFilter] = useState<Filter>("all");
  const shown = rows.map((r, i) => ({ r, i })).filter(({ r }) => keep(filter, r.fault));
  // with every fault shown, each state combination's four rows share one Detectors cell
  const grouped = filter === "all" && rows.every((r, i) => r.fault === FAULT_ORDER[i % 4]);
  return (
    <div>
      <div className="mb-3">
        <Segmented legend="Show" name="table-filter" value={filter} options={FILTERS} onChange={setFilter} />
      </div>
      <div className="relative overflow-x-auto">
        <table className="w-full min-w-[720px] text-sm" data-testid="states-table">
          <caption className="sr-only">Every combination of detector states and faults with its reading and report</caption>
          <thead>
            <tr className="border-b border-line text-left text-xs uppercase tracking-wide text-slate-500">
              <th className="py-2 pr-3 font-semibold">Detectors</th>
              <th className="py-2 pr-3 font-semibold">Fault</th>
              <th className="py-2 pr-3 text-right font-semibold">Reading</th>
              <th className="py-2 pr-3 text-right font-semibold">Min – max</th>
              <th className="py-2 pr-3 font-semibold">Report</th>
              <th className="py-2 pr-3 font-semibold">Should be</th>
              <th className="py-2 pr-3 text-right font-semibold">Margin</th>
              <th className="py-2 font-semibold">Verdict</th>
            </tr>
          </thead>
          <tbody>
            {shown.map(({ r, i }) => {
              const status = rowStatus(r);
              const here = i === current;
              return (
                <tr key={i} className={`border-b ${r.fault === "none" && filter === "all" ? "border-t-2 border-t-line" : ""} border-line/60 ${here ? "bg-signal-soft" : status === "defeat" ? "bg-fault-soft/60" : ""}`} aria-current={here ? "true" : undefined}>
                  {grouped && r.fault !== "none" ? null : (
                    <th scope="row" rowSpan={grouped ? 4 : 1} className="py-1.5 pr-3 text-left align-top font-medium">
                      {sentence(statesLabel(detectors, r.states))}
                    </th>
                  )}
                  <td className="py-1.5 pr-3">
                    <button type="button" className="whitespace-nowrap text-left hover:text-signal underline underline-offset-2" onClick={() => onSelect([...r.states], r.fault)} aria-label={`${r.fault === "none" ? "none" : FAULT_CHOICES[r.fault]}: show on the bench (${r.label})`}>
                      {r.fault === "none" ? "none" : FAULT_CHOICES[r.fault]}
                    </button>
                  </td>
                  <td className="whitespace-nowrap py-1.5 pr-3 text-right tabular-nums">{formatOhms(r.nominalOhms ?? r.minOhms)}</td>
                  <td className="whitespace-nowrap py-1.5 pr-3 text-right tabular-nums text-slate-600">{formatOhmsRange(r.minOhms, r.maxOhms)}</td>
                  <td className="py-1.5 pr-3">
                    <ReportPills reports={r.reports} />
                  </td>
                  <td className="py-1.5 pr-3 text-slate-600">{reportWord(r.expected)}</td>
                  <td className="whitespace-nowrap py-1.5 pr-3 text-right tabular-nums text-slate-600">{r.uncertain ? "straddles" : r.marginOhms === Infinity ? "no edge" : formatOhms(r.marginOhms)}</td>
                  <td className={`whitespace-nowrap py-1.5 ${STATUS_CLASS[status]}`}>
                    <span aria-hidden="true">{STATUS_MARK[status]} </span>
                    {STATUS_WORDS[status]}
                  </td>
                </tr>
              );
            })}
          </tbody>
        </table>
      </div>
    </div>
  );
}
