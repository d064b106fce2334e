import { z } from "zod";
import { idSchema } from "@/lib/catalog/schema";
import { cableGaugeSchema, scheduleGaugeRange } from "@/lib/loop/cable-gauge";
import type { CableGauge } from "@/lib/loop/types";

// A site's device schedule: the list of its detectors, each with the cable run to its board.

/** What supervision the designer wants for a detector's loop. `shared-ok` lets it share an input with another detector. */
export const supervisionPreferenceSchema = z.enum(["double-eol", "single-eol", "shared-ok", "none"]);
export type SupervisionPreference = z.infer<typeof supervisionPreferenceSchema>;

export type ScheduleCableGauge = CableGauge;

/** Longest label, area and room a detector may have, in characters; stated in the form and the CSV import. */
export const TEXT_LIMITS = { label: 200, area: 120, room: 120 } as const;

/** Trimmed text of at most `max` characters: longer text is refused with its length, never cut. */
const text = (what: string, max: number) =>
  z
    .string()
    .trim()
    .max(max, { error: (issue) => `the ${what} is ${typeof issue.input === "string" ? issue.input.length : "too many"} characters long; at most ${max} are allowed` });

/** One-way cable run from the detector to its board, metres. */
export const cableMSchema = z.number().positive("the cable run must be longer than 0 m").max(2000, "the cable run must be at most 2000 m").finite();

const detectorFields = {
  label: text("label", TEXT_LIMITS.label).min(1, "a label is needed"),
  /** Detector id in the catalog. */
  catalogId: idSchema,
  area: text("area", TEXT_LIMITS.area),
  room: text("room", TEXT_LIMITS.room),
  cableM: cableMSchema,
  gauge: cableGaugeSchema.superRefine(scheduleGaugeRange),
  supervision: supervisionPreferenceSchema,
};

export const scheduleDetectorIdSchema = z.string().min(1).max(64);

export const scheduleDetectorSchema = z.strictObject({ id: scheduleDetectorIdSchema, ...detectorFields });
export type ScheduleDetector = z.infer<typeof scheduleDetectorSchema>;

/** A schedule row before it has an id (from a form or a CSV import). */
export const scheduleRowSchema = z.strictObject(detectorFields);
export type ScheduleRow = z.infer<typeof scheduleRowSchema>;

export const scheduleSchema = z.array(scheduleDetectorSchema).superRefine((rows, ctx) => {
  const seen = new Map<string, number>();
  rows.forEach((r, i) => {
    const first = seen.get(r.id);
    if (first !== undefined) ctx.addIssue({ code: "custom", path: [i, "id"], message: `id ${r.id} is used twice (rows ${first + 1} and ${i + 1})` });
    else seen.set(r.id, i);
  });
});
export type Schedule = ScheduleDetector[];

// Form schemas, shared by the client form and the route handler. Numbers are coerced so a form's text field parses too.
const formFields = { ...detectorFields, cableM: z.coerce.number().pipe(cableMSchema) };

export const createDetectorFormSchema = z.strictObject(formFields);
export type CreateDetectorForm = z.infer<typeof createDetectorFormSchema>;

export const updateDetectorFormSchema = z
  .strictObject(formFields)
  .partial()
  .refine((p) => Object.keys(p).length > 0, "nothing to change");
export type UpdateDetectorForm = z.infer<typeof updateDetectorFormSchema>;

/** One patch applied to many detectors; the label stays per detector. */
export const bulkEditPatchSchema = z.strictObject({
  ids: z.array(scheduleDetectorIdSchema).min(1).max(5000),
  patch: z
    .strictObject({
      catalogId: formFields.catalogId,
      area: formFields.area,
      room: formFields.room,
      cableM: formFields.cableM,
      gauge: formFields.gauge,
      supervision: formFields.supervision,
    })
    .partial()
    .refine((p) => Object.keys(p).length > 0, "nothing to change"),
});
export type BulkEditPatch = z.infer<typeof bulkEditPatchSchema>;

/** Apply a bulk-edit patch; rows not named keep their values. Returns a new array. */
export function applyBulkEdit(schedule: Schedule, edit: BulkEditPatch): Schedule {
  const ids = new Set(edit.ids);
  return schedule.map((d) => (ids.has(d.id) ? { ...d, ...edit.patch } : d));
}

export function formatGauge(g: ScheduleCableGauge): string {
  return "awg" in g ? `${g.awg} AWG` : `${g.mm2} mm2`;
}

/** Parses "22 AWG", "AWG 22", "0.5 mm2", "0,5 mm²". Returns null when it is neither. */
export function parseGauge(text: string): ScheduleCableGauge | null {
  const s = text.trim().toLowerCase().replace(/\s+/g, " ");
  let m = /^(\d+) ?awg$/.exec(s) ?? /^awg ?(\d+)$/.exec(s);
  if (m) return { awg: Number(m[1]) };
  m = /^(\d+(?:[.,]\d+)?|[.,]\d+) ?(?:mm2|mm²|mm\^2|sq ?mm)$/.exec(s);
  if (m) return { mm2: Number(m[1].replace(",", ".")) };
  return null;
}
