"use client";
// A resistor value: typed freely (4k7, 4.7 kΩ, 4700) or picked from the E24 series, with what the input type expects.
import { useId, useState } from "react";
import { formatOhms, seriesValues } from "@/lib/loop";
import { ohmsText, parseOhms } from "@/lib/resistors/parse-ohms";

const E24_CHOICES = seriesValues("E24", 10, 1_000_000); // IEC 60063 E24, 10 Ω to 1 MΩ
const DECADES = [10, 100, 1e3, 1e4, 1e5, 1e6].map((lo) => ({ lo, values: E24_CHOICES.filter((v) => v >= lo && v < lo * 10) })).filter((d) => d.values.length);

export function ResistorField({ label, value, expected, onChange, testId }: { label: string; value: number | null; expected: number | null; onChange: (ohms: number) => void; testId?: string }) {
  const id = useId();
  const [draft, setDraft] = useState<string | null>(null);
  const text = draft ?? (value === null ? "" : ohmsText(value));
  const parsed = draft === null ? value : parseOhms(draft);
  const error = draft !== null && parsed === null ? "Enter a value above 0 Ω, e.g. 4700, 4k7 or 4.7 kΩ" : undefined;
  const inSeries = value !== null && E24_CHOICES.includes(value);
  return (
    <div className="text-sm" data-testid={testId}>
      <label htmlFor={id} className="font-medium">
        {label}
      </label>
      <div className="mt-1 grid grid-cols-[1fr_auto] gap-1.5">
        <div className="flex items-center gap-1.5">
          <input
            id={id}
            type="text"
            inputMode="decimal"
            autoComplete="off"
            spellCheck={false}
            value={text}
            onChange={(e) => {
              setDraft(e.target.value);
              const v = parseOhms(e.target.value);
              if (v !== null) onChange(v);
            }}
            onBlur={() => setDraft(null)}
            aria-invalid={!!error}
            aria-describedby={`${id}-hint`}
            className={`block w-full min-w-0 rounded-md border bg-white px-2.5 py-2 tabular-nums ${error ? "border-fault" : "border-line"}`}
          />
          <span className="text-slate-600">Ω</span>
        </div>
        <select
          aria-label={`${label}: E24 value`}
          value={inSeries ? String(value) : ""}
          onChange={(e) => {
            if (e.target.value === "") return;
            setDraft(null);
            onChange(Number(e.target.value));
          }}
          className="rounded-md border border-line bg-white px-2 py-2"
        >
          <option value="">{inSeries ? "E24" : "E24…"}</option>
          {DECADES.map((d) => (
            <optgroup key={d.lo} label={`${formatOhms(d.lo)} –`}>
              {d.values.map((v) => (
                <option key={v} value={v}>
                  {formatOhms(v)}
                </option>
              ))}
            </optgroup>
          ))}
        </select>
      </div>
      <p id={`${id}-hint`} className={`mt-1 text-xs ${error ? "text-fault" : "text-slate-500"}`}>
        {error ??
          (expected === null ? (
            "The input type expects no value here."
          ) : value === expected ? (
            `As the input type expects (${formatOhms(expected)}).`
          ) : (
            <>
              The input type expects {formatOhms(expected)}.{" "}
              <button type="button" className="text-signal underline" onClick={() => (setDraft(null), onChange(expected))}>
                Fit {formatOhms(expected)}
              </button>
            </>
          ))}
      </p>
    </div>
  );
}
