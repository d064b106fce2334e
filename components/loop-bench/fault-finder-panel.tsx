"use client";
// The fault finder on the loop bench: type what the meter read at the panel end, see the explanations ranked.
// Computed here from the pure engine; nothing is sent anywhere.
import { useMemo, useState } from "react";
import type { InputType } from "@/lib/catalog/schema";
import { findFaults, type Explanation, type MeasuredReadings } from "@/lib/loop/fault-finder";
import type { LoopSpec } from "@/lib/loop/types";
import { parseOhms } from "@/lib/resistors/parse-ohms";

const FIELDS: { key: keyof MeasuredReadings; label: string }[] = [
  { key: "restOhms", label: "At rest" },
  { key: "activeOhms", label: "First detector active" },
  { key: "farEndShortedOhms", label: "Far end shorted" },
];

/** "OL" or "open" is an open loop, as a meter shows it. */
function readingOf(text: string): number | null | undefined {
  const t = text.trim();
  if (!t) return undefined;
  if (/^(ol|open|∞)$/i.test(t)) return Infinity;
  return parseOhms(t, { allowZero: true });
}

/** The ranked explanations, best first: shared by the loop bench and the commissioning diagnosis. */
export function FaultRanking({ ranking, limit = 4, testId }: { ranking: Explanation[]; limit?: number; testId?: string }) {
  return (
    <ol className="mt-2 grid gap-1 text-sm" data-testid={testId}>
      {ranking.slice(0, limit).map((e) => (
        <li key={e.kind} data-kind={e.kind} className="flex items-baseline gap-2">
          <span className="w-12 shrink-0 text-right font-semibold tabular-nums">{Math.round(e.fit * 100)} %</span>
          <span>
            {e.label}
            {e.distance ? (
              <span className="text-slate-500">
                {" "}
                ({e.distance.minM.toFixed(1)}–{e.distance.maxM.toFixed(1)} m over the parts&apos; tolerance and the cable&apos;s temperature range)
              </span>
            ) : null}
          </span>
        </li>
      ))}
    </ol>
  );
}

export function FaultFinderPanel({ loop, inputType }: { loop: LoopSpec; inputType: InputType }) {
  const [text, setText] = useState<Record<keyof MeasuredReadings, string>>({ restOhms: "", activeOhms: "", farEndShortedOhms: "" });
  const parsed = FIELDS.map((f) => [f.key, readingOf(text[f.key])] as const);
  const bad = parsed.filter(([, v]) => v === null).map(([k]) => k);
  const measured: MeasuredReadings = Object.fromEntries(parsed.filter(([, v]) => typeof v === "number"));
  const key = JSON.stringify(measured, (_, v) => (v === Infinity ? "OL" : v));
  // eslint-disable-next-line react-hooks/exhaustive-deps -- `key` stands for `measured`
  const ranking = useMemo(() => findFaults(loop, inputType, measured), [loop, inputType, key]);
  return (
    <section className="rounded-lg border border-line bg-white p-4 shadow-sm" data-testid="fault-finder">
      <h2 className="text-base font-semibold">Fault finder</h2>
      <p className="mt-1 text-xs text-slate-500">Meter readings across the pair at the panel end; one to three. Type OL for an open loop.</p>
      <div className="mt-2 grid gap-2">
        {FIELDS.map((f) => (
          <label key={f.key} className="grid grid-cols-1 gap-1 text-sm">
            <span className="font-medium">{f.label}</span>
            <input
              className={`rounded border px-2 py-1 ${bad.includes(f.key) ? "border-fault" : "border-line"}`}
              value={text[f.key]}
              inputMode="decimal"
              placeholder="e.g. 5.61k or OL"
              aria-invalid={bad.includes(f.key)}
              data-testid={`fault-finder-${f.key}`}
              onChange={(e) => setText({ ...text, [f.key]: e.target.value })}
            />
            {bad.includes(f.key) ? <span className="text-xs text-fault">Not a resistance: try 5600, 5.6k, 4k7 or OL.</span> : null}
          </label>
        ))}
      </div>
      {ranking.length ? <FaultRanking ranking={ranking} testId="fault-finder-ranking" /> : null}
    </section>
  );
}
