/** A labelled select with its error beside it, like Field. */
export function SelectField({ label, name, defaultValue, options, error }: { label: string; name: string; defaultValue: string; options: [string, string][]; error?: string }) {
  return (
    <label className="block text-sm" htmlFor={name}>
      <span className="font-medium">{label}</span>
      <select id={name} name={name} defaultValue={defaultValue} aria-invalid={!!error} className={`mt-1 block w-full rounded-md border bg-white px-3 py-2 ${error ? "border-fault" : "border-line"}`}>
        {options.map(([value, text]) => (
          <option key={value} value={value}>
            {text}
          </option>
        ))}
      </select>
      {error ? <span className="mt-1 block text-xs text-fault">{error}</span> : null}
    </label>
  );
}
