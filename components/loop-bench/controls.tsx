"use client";
// Small labelled controls for the bench: a segmented radio group, a select, a number with its unit.
import { useId, useState, type ReactNode } from "react";

export function Segmented<T extends string>({
  legend,
  name,
  value,
  options,
  onChange,
  hints,
  disabled,
  columns,
  testId,
}: {
  legend: string;
  name: string;
  value: T;
  options: readonly { value: T; label: string; disabled?: boolean }[];
  onChange: (v: T) => void;
  hints?: Partial<Record<T, string>>;
  disabled?: boolean;
  /** Stack the options, one per line (for options with hints). */
  columns?: 1;
  testId?: string;
}) {
  const id = useId();
  return (
    <fieldset className="min-w-0" disabled={disabled} data-testid={testId}>
      <legend className="mb-1 text-sm font-medium">{legend}</legend>
      <div className={columns === 1 ? "grid gap-1.5" : "flex flex-wrap gap-1.5"}>
        {options.map((o) => {
          const hintId = hints?.[o.value] ? `${id}-${o.value}-hint` : undefined;
          const nameId = `${id}-${o.value}-name`;
          const checked = o.value === value;
          return (
            <label
              key={o.value}
              className={`flex cursor-pointer items-start gap-2 rounded-md border px-2.5 py-1.5 text-sm transition-colors has-[:focus-visible]:outline-2 has-[:focus-visible]:outline-signal has-[:disabled]:cursor-not-allowed has-[:disabled]:opacity-50 ${
                checked ? "border-signal bg-signal-soft font-medium text-ink" : "border-line bg-white hover:bg-slate-50"
              }`}
            >
              <input
                type="radio"
                name={name}
                value={o.value}
                checked={checked}
                disabled={o.disabled}
                onChange={() => onChange(o.value)}
                aria-labelledby={nameId}
                aria-describedby={hintId}
                className="mt-0.5 accent-[var(--color-signal)]"
              />
              <span>
                <span id={nameId}>{o.label}</span>
                {hintId ? (
                  <span id={hintId} className="block text-xs font-normal text-slate-500">
                    {hints![o.value]}
                  </span>
                ) : null}
              </span>
            </label>
          );
        })}
      </div>
    </fieldset>
  );
}

export function SelectField({ label, value, onChange, children, hint, testId }: { label: string; value: string; onChange: (v: string) => void; children: ReactNode; hint?: ReactNode; testId?: string }) {
  const id = useId();
  return (
    <div className="text-sm">
      <label htmlFor={id} className="font-medium">
        {label}
      </label>
      <select id={id} value={value} onChange={(e) => onChange(e.target.value)} data-testid={testId} className="mt-1 block w-full rounded-md border border-line bg-white px-2.5 py-2">
        {children}
      </select>
      {hint ? <p className="mt-1 text-xs text-slate-500">{hint}</p> : null}
    </div>
  );
}

/** A number with its unit beside it; keeps what was typed while it is not a number, reports only numbers. */
export function NumberField({
  label,
  unit,
  value,
  onChange,
  min,
  max,
  step,
  error,
  list,
  testId,
}: {
  label: string;
  unit: string;
  value: number;
  onChange: (v: number) => void;
  min?: number;
  max?: number;
  step?: number | "any";
  error?: string;
  list?: string;
  testId?: string;
}) {
  const id = useId();
  // what is being typed, while the field has focus ("", "-", "1." are on the way to a number)
  const [draft, setDraft] = useState<string | null>(null);
  return (
    <div className="text-sm">
      <label htmlFor={id} className="font-medium">
        {label}
      </label>
      <div className="mt-1 flex items-center gap-1.5">
        <input
          id={id}
          type="number"
          inputMode="decimal"
          value={draft ?? (Number.isFinite(value) ? String(value) : "")}
          min={min}
          max={max}
          step={step ?? "any"}
          list={list}
          onChange={(e) => {
            setDraft(e.target.value);
            const v = e.target.valueAsNumber;
            if (Number.isFinite(v)) onChange(v);
          }}
          onBlur={() => setDraft(null)}
          aria-invalid={!!error}
          aria-describedby={error ? `${id}-err` : undefined}
          data-testid={testId}
          className={`block w-full min-w-0 rounded-md border bg-white px-2.5 py-2 tabular-nums ${error ? "border-fault" : "border-line"}`}
        />
        <span className="w-10 shrink-0 text-slate-600">{unit}</span>
      </div>
      {error ? (
        <p id={`${id}-err`} className="mt-1 text-xs text-fault">
          {error}
        </p>
      ) : null}
    </div>
  );
}

export function Section({ title, children, testId }: { title: string; children: ReactNode; testId?: string }) {
  return (
    <section className="rounded-lg border border-line bg-white p-4 shadow-sm" data-testid={testId}>
      <h2 className="mb-3 text-sm font-semibold uppercase tracking-wide text-slate-600">{title}</h2>
      <div className="grid grid-cols-1 gap-4">{children}</div>
    </section>
  );
}
