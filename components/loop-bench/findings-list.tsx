// The engine's findings, worst first and what can be acted on before information, each with its plain explanation.
import type { Finding } from "@/lib/findings";
import { orderFindings } from "@/lib/findings-grouping";

const SEVERITY = {
  error: { word: "error", cls: "bg-fault text-white" },
  warning: { word: "warning", cls: "bg-warn text-white" },
  note: { word: "note", cls: "bg-slate-200 text-ink" },
} as const;

export function FindingsList({ findings }: { findings: readonly Finding[] }) {
  if (findings.length === 0) return <p className="text-sm text-slate-600">No findings: this loop is supervised as intended.</p>;
  const sorted = orderFindings(findings);
  return (
    <ul className="grid grid-cols-1 gap-2" data-testid="findings">
      {sorted.map((f, i) => (
        <li key={`${f.code}-${i}`} className="rounded-md border border-line p-3" data-code={f.code}>
          <p className="flex flex-wrap items-baseline gap-2 text-sm">
            <span className={`rounded px-1.5 py-0.5 text-xs font-semibold uppercase tracking-wide ${SEVERITY[f.severity].cls}`}>{SEVERITY[f.severity].word}</span>
            <span className="font-medium">{f.message.charAt(0).toUpperCase() + f.message.slice(1)}</span>
          </p>
          <p className="mt-1 text-sm text-slate-600">{f.why}</p>
        </li>
      ))}
    </ul>
  );
}
