"use client";

import { useState } from "react";
import type { ComparisonColumn } from "@/lib/compare/compare-layouts";
import type { DecisionView } from "@/lib/server/review";
import { describeError, FetchError, sendJson } from "@/lib/client/fetcher";
import { Button } from "@/components/ui/button";
import { Card } from "@/components/ui/card";
import { useFormat } from "@/components/format/format-provider";

/** Record which of the compared layouts is chosen and why; the choices already recorded below. */
export function ChooseForm({ siteId, columns, comparedIds, canChoose, choices: initial }: { siteId: number; columns: ComparisonColumn[]; comparedIds: number[]; canChoose: boolean; choices: DecisionView[] }) {
  const fmt = useFormat();
  const [chosen, setChosen] = useState<number | null>(null);
  const [reason, setReason] = useState("");
  const [choices, setChoices] = useState(initial);
  const [message, setMessage] = useState<{ kind: "ok" | "error"; text: string } | null>(null);
  const [busy, setBusy] = useState(false);
  const nameOf = (id: number) => columns.find((c) => Number(c.id) === id)?.name ?? `layout ${id}`;

  async function submit(e: React.FormEvent) {
    e.preventDefault();
    if (chosen === null) return setMessage({ kind: "error", text: "Pick the layout you chose." });
    setBusy(true);
    try {
      const r = await sendJson<{ decision: DecisionView }>(`/api/sites/${siteId}/decisions`, "POST", { chosenLayoutId: chosen, comparedLayoutIds: comparedIds, reason });
      setChoices((c) => [r.decision, ...c]);
      setMessage({ kind: "ok", text: `Recorded: ${nameOf(chosen)} chosen. Send it for review on its review page.` });
      setReason("");
    } catch (err) {
      setMessage({ kind: "error", text: err instanceof FetchError && !err.unreachable ? describeError(err) : "The server could not be reached; nothing was recorded." });
    } finally {
      setBusy(false);
    }
  }

  return (
    <Card>
      <h2 className="text-lg font-semibold">Decision</h2>
      {canChoose ? (
        <form onSubmit={submit} className="mt-2 flex flex-col gap-3 text-sm" data-testid="choose-form">
          <fieldset className="flex flex-wrap gap-3">
            <legend className="mb-1 font-medium">The layout chosen</legend>
            {columns.map((c) => (
              <label key={String(c.id)} className="flex items-center gap-2 rounded-md border border-line px-3 py-2">
                <input type="radio" name="chosen" value={String(c.id)} checked={chosen === Number(c.id)} onChange={() => setChosen(Number(c.id))} />
                {c.name}
              </label>
            ))}
          </fieldset>
          <label className="block">
            <span className="font-medium">Why (kept in the decision log)</span>
            <textarea required maxLength={4000} rows={3} className="mt-1 block w-full rounded-md border border-line bg-white px-3 py-2" value={reason} onChange={(e) => setReason(e.target.value)} />
          </label>
          <div>
            <Button type="submit" disabled={busy || chosen === null || !reason.trim()}>
              {busy ? "Recording…" : "Record the decision"}
            </Button>
          </div>
        </form>
      ) : (
        <p className="mt-2 text-sm text-slate-600">Designers, engineers and admins record which layout is chosen.</p>
      )}
      <p aria-live="polite" data-testid="choose-message" className={`mt-2 min-h-5 text-sm ${message?.kind === "error" ? "font-medium text-fault" : "text-signal"}`}>
        {message?.text ?? ""}
      </p>
      {choices.length ? (
        <ol className="mt-2 space-y-2 text-sm" data-testid="choices">
          {choices.map((d) => (
            <li key={d.id} className="border-l-2 border-signal pl-3">
              <p>
                <strong>{nameOf(d.layoutId)}</strong> (revision {d.revision}) chosen{d.comparedLayoutIds ? ` among ${d.comparedLayoutIds.map(nameOf).join(", ")}` : ""}
                {d.decidedBy ? ` by ${d.decidedBy}` : ""}
              </p>
              <p className="text-slate-700">“{d.reason}”</p>
              <p className="text-xs text-slate-500">{fmt.dateTime(d.createdAt)}</p>
            </li>
          ))}
        </ol>
      ) : null}
    </Card>
  );
}
