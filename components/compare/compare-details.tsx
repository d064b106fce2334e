"use client";

import type { ComparisonColumn } from "@/lib/compare/compare-layouts";
import { Card } from "@/components/ui/card";
import { SEVERITY_STYLE } from "@/components/compare/compare-format";
import { useFormat } from "@/components/format/format-provider";

/** One compared layout in full: what each shared input trades, every finding, and the bill of materials. */
export function CompareDetails({ column: c }: { column: ComparisonColumn }) {
  const { money } = useFormat();
  return (
    <Card data-testid={`compare-details-${Number(c.id)}`}>
      <h3 className="font-semibold">{c.name}</h3>
      <h4 className="mt-3 text-sm font-semibold">What each shared input trades</h4>
      {c.shared.length === 0 ? (
        <p className="text-sm text-slate-600">No shared inputs: every detector has its own input, so a cable fault takes out one zone only.</p>
      ) : (
        <ul className="mt-1 list-disc space-y-1 pl-5 text-sm" data-testid="tradeoffs">
          {c.shared.map((s) => (
            <li key={`${s.boardKey}#${s.input}`}>{s.text}</li>
          ))}
        </ul>
      )}
      <h4 className="mt-3 text-sm font-semibold">Every finding ({c.findingList.length})</h4>
      <ul className="mt-1 max-h-96 space-y-1 overflow-y-auto pr-1 text-sm" data-testid="compare-findings" tabIndex={0} aria-label="Findings (scrolls)">
        {c.findingList.map((f, k) => (
          <li key={k}>
            <span className={`font-medium ${SEVERITY_STYLE[f.severity]}`}>{f.severity}:</span> {f.message}
          </li>
        ))}
      </ul>
      <details className="mt-3 text-sm">
        <summary className="cursor-pointer font-semibold">Bill of materials ({c.bom.lines.length} lines)</summary>
        <table className="mt-2 w-full text-xs">
          <tbody>
            {c.bom.lines.map((l) => (
              <tr key={l.key} className="border-t border-line">
                <td className="py-1 pr-2 tabular-nums">{l.quantity} ×</td>
                <td className="py-1 pr-2">{l.description}</td>
                <td className="py-1 text-right tabular-nums">{l.total === null ? "—" : money(l.total)}</td>
              </tr>
            ))}
          </tbody>
        </table>
        {c.bom.notes.map((n, k) => (
          <p key={k} className="mt-1 text-xs text-slate-600">
            {n}
          </p>
        ))}
      </details>
    </Card>
  );
}
