// The chosen conductor fault's verdict, and what the panel reports in each state combination with it.
import { formatOhmsRange, statesLabel, type ConductorFaultResult, type ConductorVerdict, type LoopDetector } from "@/lib/loop";
import { ReportPills } from "./reading-panel";

const WORDS: Record<ConductorVerdict, { title: string; text: string; cls: string }> = {
  detected: { title: "detected", text: "reported as itself (or as trouble) in every state", cls: "border-signal bg-signal-soft text-signal" },
  mistaken: { title: "mistaken", text: "reported, but as something else in some state", cls: "border-warn bg-warn-soft text-warn" },
  defeat: { title: "defeat", text: "reads as normal in some state: silenced without a report", cls: "border-fault bg-fault-soft text-fault" },
  "not-supervised": { title: "not supervised", text: "the loop reads the same; this input type doesn't watch earth", cls: "border-warn bg-warn-soft text-warn" },
  "no-effect": { title: "no effect", text: "the two points are already joined: nothing changes", cls: "border-line bg-slate-50 text-ink" },
};

export function ConductorVerdict({ result, detectors }: { result: ConductorFaultResult; detectors: readonly LoopDetector[] }) {
  const w = WORDS[result.verdict];
  return (
    <section className={`rounded-lg border p-4 ${w.cls}`} data-testid="conductor-result" aria-live="polite">
      <p className="text-sm font-medium text-ink">{result.label.charAt(0).toUpperCase() + result.label.slice(1)}</p>
      <p className="mt-0.5 text-lg font-semibold" data-testid="conductor-verdict">
        {w.title}
      </p>
      <p className="text-xs text-ink/80">{w.text}</p>
      <table className="mt-3 w-full text-left text-sm text-ink">
        <thead>
          <tr className="text-xs text-slate-500">
            <th className="py-1 pr-3 font-medium">Detectors</th>
            <th className="py-1 pr-3 font-medium">Reading</th>
            <th className="py-1 font-medium">Panel reports</th>
          </tr>
        </thead>
        <tbody>
          {result.rows.map((r, i) => (
            <tr key={i} className="border-t border-line/60">
              <td className="py-1 pr-3">{statesLabel(detectors, r.states)}</td>
              <td className="py-1 pr-3 tabular-nums">{formatOhmsRange(r.minOhms, r.maxOhms)}</td>
              <td className="py-1">
                <ReportPills reports={r.reports} />
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </section>
  );
}
