// The cable's own resistance and the longest run before a reading leaves its band or the input's loop limit.
import { formatOhmsRange, type LoopAnalysis } from "@/lib/loop";
import { useFormat } from "@/components/format/format-provider";

export function CableSummary({ analysis, lengthM, gaugeText, conductors, maxLoopOhms, tempMaxC }: { analysis: LoopAnalysis; lengthM: number; gaugeText: string; conductors: number; maxLoopOhms: number; tempMaxC: number }) {
  const fmt = useFormat();
  const byBands = analysis.maxCableM;
  const byLimit = analysis.maxCableByLoopOhmsM ?? null;
  const limits = [byBands, byLimit].filter((x): x is number => x !== null);
  const longest = limits.length ? Math.min(...limits) : null;
  const over = longest !== null && lengthM > longest;
  return (
    <dl className="grid grid-cols-1 gap-3 text-sm sm:grid-cols-3" data-testid="cable-summary">
      <div>
        <dt className="text-xs font-semibold uppercase tracking-wide text-slate-500">Conductors in the loop path</dt>
        <dd className="mt-1 text-lg font-semibold tabular-nums">{analysis.conductorOhms ? formatOhmsRange(analysis.conductorOhms.minOhms, analysis.conductorOhms.maxOhms) : "–"}</dd>
        <dd className="text-xs text-slate-500">
          {conductors} × {fmt.length(lengthM)} of {gaugeText}
        </dd>
      </div>
      <div>
        <dt className="text-xs font-semibold uppercase tracking-wide text-slate-500">Longest run</dt>
        <dd className={`mt-1 text-lg font-semibold tabular-nums ${over ? "text-fault" : ""}`} data-testid="longest-run">
          {longest === null ? "no limit" : fmt.length(longest, "down")}
        </dd>
        <dd className="text-xs text-slate-500">{over ? `this run (${fmt.length(lengthM)}) is longer` : "one way, from the input to the last detector"}</dd>
      </div>
      <div>
        <dt className="text-xs font-semibold uppercase tracking-wide text-slate-500">Limited by</dt>
        <dd className="mt-1 text-slate-700">
          readings staying in their bands: {byBands === null ? "no limit" : fmt.length(byBands, "down")}
        </dd>
        <dd className="text-slate-700">
          the input&apos;s {maxLoopOhms} Ω loop limit at {tempMaxC} °C: {byLimit === null ? "no limit" : fmt.length(byLimit, "down")}
        </dd>
      </div>
    </dl>
  );
}
