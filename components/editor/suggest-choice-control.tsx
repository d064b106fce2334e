"use client";

import { suggestChoiceSchema, type SuggestChoiceInput } from "@/lib/layout/suggest-choice-schema";

// How the suggestion picks among layouts that carry the schedule: the cheapest, or the most supervised whose price
// is within N % of the cheapest. The margin is checked with the request's own schema before anything is sent.

export interface ChoiceDraft {
  kind: SuggestChoiceInput["kind"];
  /** As typed, so a half-typed number is kept until the button is pressed. */
  withinPct: string;
}

export function choiceFromDraft(d: ChoiceDraft): { ok: true; choice: SuggestChoiceInput } | { ok: false; message: string } {
  const raw = d.kind === "cheapest" ? { kind: "cheapest" } : { kind: d.kind, withinPct: d.withinPct.trim() === "" ? undefined : Number(d.withinPct) };
  const r = suggestChoiceSchema.safeParse(raw);
  if (r.success) return { ok: true, choice: r.data };
  return { ok: false, message: `Margin over the cheapest price: ${r.error.issues[0]?.message ?? "give it as a percentage"}` };
}

export function SuggestChoiceControl({ value, onChange }: { value: ChoiceDraft; onChange: (d: ChoiceDraft) => void }) {
  return (
    <fieldset className="mt-2 text-sm">
      <legend className="font-medium">Which layout</legend>
      <label className="mt-1 flex items-center gap-2">
        <input type="radio" name="suggest-choice" checked={value.kind === "cheapest"} onChange={() => onChange({ ...value, kind: "cheapest" })} />
        The cheapest
      </label>
      <label className="mt-1 flex flex-wrap items-center gap-2">
        <input type="radio" name="suggest-choice" checked={value.kind === "most-supervised"} onChange={() => onChange({ ...value, kind: "most-supervised" })} />
        The most supervised within
        <input
          type="number"
          inputMode="decimal"
          min={0}
          max={200}
          step="any"
          aria-label="Margin over the cheapest price, percent"
          className="w-20 rounded-md border border-line bg-white px-2 py-1"
          value={value.withinPct}
          onChange={(e) => onChange({ kind: "most-supervised", withinPct: e.target.value })}
        />
        % of the cheapest price
      </label>
    </fieldset>
  );
}
