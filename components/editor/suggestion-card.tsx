"use client";

import type { SuggestionView } from "@/lib/server/layouts";
import { Button } from "@/components/ui/button";
import { Card } from "@/components/ui/card";
import { useFormat } from "@/components/format/format-provider";
import { plural } from "@/lib/vocabulary/plural";

// One hardware suggestion: its price and how far it is proven, its parts and figures, and the button that takes it.

function Counts({ c }: { c: { error: number; warning: number; note: number } }) {
  return (
    <span>
      <span className={c.error ? "font-semibold text-fault" : ""}>{plural(c.error, "error")}</span> · <span className={c.warning ? "text-warn" : ""}>{plural(c.warning, "warning")}</span> · {plural(c.note, "note")}
    </span>
  );
}

export function SuggestionCard({ s, busy, canWrite, onAccept }: { s: SuggestionView; busy: boolean; canWrite: boolean; onAccept: () => void }) {
  const { money } = useFormat();
  const title = s.allowShared ? "Shared inputs allowed" : "One detector per input";
  return (
    <Card className="flex flex-col" data-testid={`suggestion-${s.allowShared ? "shared" : "single"}`}>
      <h3 className="font-semibold">{title}</h3>
      {!s.found ? (
        <p className="mt-2 text-sm text-fault">{s.reason}</p>
      ) : (
        <>
          <p className="mt-1 text-2xl font-semibold">{money(s.cost ?? 0)}</p>
          <p className="text-xs text-slate-500">catalog list prices · {proofWords(s)}</p>
          {s.cheapestCost !== null && s.cost !== null && s.cost > s.cheapestCost + 0.005 ? (
            <p className="text-xs text-slate-600" data-testid="suggestion-margin">
              {Math.round(((s.cost - s.cheapestCost) / s.cheapestCost) * 1000) / 10} % above the cheapest layout ({money(s.cheapestCost)}), for more supervision
            </p>
          ) : null}
          <ul className="mt-2 text-sm">
            {s.parts.map((p) => (
              <li key={`${p.kind}:${p.catalogId}`}>
                {p.count} × {p.name} <span className="text-slate-500">({money(p.unitPrice)} each)</span>
              </li>
            ))}
          </ul>
          <dl className="mt-2 grid grid-cols-[auto_1fr] gap-x-3 text-sm">
            <dt className="text-slate-600">Boards</dt>
            <dd>{s.boards}</dd>
            <dt className="text-slate-600">Inputs used</dt>
            <dd>
              {s.inputsUsed} of {s.inputsTotal}
            </dd>
            <dt className="text-slate-600">Shared inputs</dt>
            <dd>{s.sharedInputs}</dd>
            <dt className="text-slate-600">Findings</dt>
            <dd>{s.counts ? <Counts c={s.counts} /> : null}</dd>
          </dl>
          {canWrite ? (
            <Button className="mt-3" disabled={busy} onClick={onAccept}>
              Accept as a new layout
            </Button>
          ) : null}
        </>
      )}
    </Card>
  );
}

/** How far the price is proven: by the exact model, within a gap a time limit left, or by the older search. */
function proofWords(s: SuggestionView): string {
  if (s.method === "search-fallback") return `found by the older search, not proven cheapest (${s.fallbackReason ?? "the optimiser gave no answer"})`;
  if (s.optimal) return s.cheapestCost !== null && s.cost !== null && s.cost > s.cheapestCost + 0.005 ? "proven the most supervised within the margin" : "proven the lowest price";
  return s.gap === null ? "the lowest price found in the time allowed, not proven" : `within ${Math.ceil(s.gap * 1000) / 10} % of the lowest possible price`;
}
