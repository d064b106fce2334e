import type { SiteDetails } from "@/lib/sites/site-schema";
import { Field } from "@/components/ui/field";

const area = "mt-1 block w-full rounded-md border bg-white px-3 py-2 text-sm";

/** EN 50131-1's grades by the risk they are for, in our own short words. */
const GRADES: [number, string][] = [
  [1, "low risk"],
  [2, "low to medium risk"],
  [3, "medium to high risk"],
  [4, "high risk"],
];

/** The site's details as form fields (read with FormData), each with its error beside it. */
export function SiteDetailsFields({ values, errors }: { values?: Partial<SiteDetails>; errors: Record<string, string> }) {
  const textarea = (name: "description" | "notes", label: string, rows: number) => (
    <label className="block text-sm sm:col-span-2" htmlFor={name}>
      <span className="font-medium">{label}</span>
      <textarea id={name} name={name} rows={rows} defaultValue={values?.[name] ?? ""} aria-invalid={!!errors[name]} className={`${area} ${errors[name] ? "border-fault" : "border-line"}`} />
      {errors[name] ? <span className="mt-1 block text-xs text-fault">{errors[name]}</span> : null}
    </label>
  );
  return (
    <div className="grid grid-cols-1 gap-3 sm:grid-cols-2">
      <Field label="Site name" name="name" defaultValue={values?.name ?? ""} error={errors.name} maxLength={200} />
      <Field label="Address" name="address" defaultValue={values?.address ?? ""} error={errors.address} maxLength={500} />
      <Field label="Customer contact" name="contactName" defaultValue={values?.contactName ?? ""} error={errors.contactName} maxLength={200} />
      <Field label="Contact phone" name="contactPhone" type="tel" defaultValue={values?.contactPhone ?? ""} error={errors.contactPhone} maxLength={60} />
      <Field label="Contact e-mail" name="contactEmail" type="email" defaultValue={values?.contactEmail ?? ""} error={errors.contactEmail} maxLength={254} />
      <label className="block text-sm" htmlFor="securityGrade">
        <span className="font-medium">Security grade (EN 50131-1)</span>
        <select id="securityGrade" name="securityGrade" defaultValue={values?.securityGrade ? String(values.securityGrade) : ""} className={`${area} border-line`}>
          <option value="">Not chosen yet</option>
          {GRADES.map(([g, words]) => (
            <option key={g} value={g}>
              Grade {g}: {words}
            </option>
          ))}
        </select>
        <span className="mt-1 block text-xs text-slate-600">New layouts take this grade. Check against the edition your authority uses.</span>
        {errors.securityGrade ? <span className="mt-1 block text-xs text-fault">{errors.securityGrade}</span> : null}
      </label>
      {textarea("description", "Description", 2)}
      {textarea("notes", "Notes", 3)}
    </div>
  );
}

/** The detail fields of a form, as the site schemas read them. */
export function readDetails(form: FormData): Record<Exclude<keyof SiteDetails, "securityGrade">, string> & { securityGrade: number | null } {
  const v = (k: keyof SiteDetails) => String(form.get(k) ?? "");
  const grade = v("securityGrade");
  return { name: v("name"), address: v("address"), description: v("description"), contactName: v("contactName"), contactPhone: v("contactPhone"), contactEmail: v("contactEmail"), notes: v("notes"), securityGrade: grade ? Number(grade) : null };
}
