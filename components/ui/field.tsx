import type { InputHTMLAttributes, ReactNode } from "react";

export function Field({ label, error, hint, ...props }: InputHTMLAttributes<HTMLInputElement> & { label: string; error?: string; hint?: ReactNode }) {
  const id = props.id ?? props.name;
  return (
    <label className="block text-sm" htmlFor={id}>
      <span className="font-medium">{label}</span>
      <input id={id} className={`mt-1 block w-full rounded-md border bg-white px-3 py-2 ${error ? "border-fault" : "border-line"}`} aria-invalid={!!error} {...props} />
      {hint && !error ? <span className="mt-1 block text-xs text-slate-500">{hint}</span> : null}
      {error ? <span className="mt-1 block text-xs text-fault">{error}</span> : null}
    </label>
  );
}
