// Shared input: the four state combinations, their readings, and whether each decodes on its own.
import { formatOhmsRange, type LoopAnalysis } from "@/lib/loop";
import { REPORT_CLASS, reportWord } from "./report-style";

export function DecodeTable({ decode, lost }: { decode: NonNullable<LoopAnalysis["decode"]>; lost?: string[] }) {
  const name = (s: readonly string[]) => (s[0] === "active" && s[1] === "active" ? "A and B active" : s[0] === "active" ? "A active" : s[1] === "active" ? "B active" : "both at rest");
  return (
    <div>
      <table className="w-full text-sm" data-testid="decode-table">
        <caption className="sr-only">Shared input decode table</caption>
        <thead>
          <tr className="border-b border-line text-left text-xs uppercase tracking-wide text-slate-500">
            <th className="py-2 pr-3 font-semibold">Detectors</th>
            <th className="py-2 pr-3 font-semibold">Reading</th>
            <th className="py-2 pr-3 font-semibold">Report</th>
            <th className="py-2 font-semibold">Decodes on its own</th>
          </tr>
        </thead>
        <tbody>
          {decode.map((d, i) => (
            <tr key={i} className="border-b border-line/60">
              <td className="py-2 pr-3">{name(d.states)}</td>
              <td className="py-2 pr-3 tabular-nums">{formatOhmsRange(d.minOhms, d.maxOhms)}</td>
              <td className="py-2 pr-3">
                <span className={`rounded px-2 py-0.5 text-xs font-semibold ${REPORT_CLASS[d.report]}`}>{reportWord(d.report)}</span>
              </td>
              <td className={`py-2 font-medium ${d.unique ? "text-signal" : "text-fault"}`}>{d.unique ? "✓ yes" : "✗ no: overlaps another state"}</td>
            </tr>
          ))}
        </tbody>
      </table>
      {lost?.length ? (
        <div className="mt-3 text-sm">
          <p className="font-medium">What sharing one input loses</p>
          <ul className="mt-1 list-disc space-y-1 pl-5 text-slate-700">
            {lost.map((l, i) => (
              <li key={i}>{l}</li>
            ))}
          </ul>
        </div>
      ) : null}
    </div>
  );
}
