import { z } from "zod";
import { layoutDocumentSchema, layoutPowerSchema, outputDeviceSchema, pathwaySchema } from "@/lib/layout/schema";
import { suggestChoiceSchema } from "@/lib/layout/suggest-choice-schema";

// Request bodies of the layout API, shared by the route handlers, the forms and the OpenAPI document.

const nameSchema = z.string().trim().min(1, "a name is needed").max(200);
const noteSchema = z.string().trim().max(500);

export const createLayoutSchema = z.union([
  z.strictObject({ name: nameSchema, note: noteSchema.optional(), document: layoutDocumentSchema }),
  z.strictObject({ name: nameSchema, note: noteSchema.optional(), panelId: z.string().min(1).max(63) }),
  z.strictObject({ name: nameSchema, note: noteSchema.optional(), suggestion: z.strictObject({ allowShared: z.boolean(), busCableM: z.number().nonnegative().max(100000).optional(), pathway: pathwaySchema.optional(), choice: suggestChoiceSchema.optional() }) }),
]);
export type CreateLayoutInput = z.infer<typeof createLayoutSchema>;

export const saveLayoutSchema = z.strictObject({
  version: z.number().int().positive(),
  document: layoutDocumentSchema,
  name: nameSchema.optional(),
  note: noteSchema.optional(),
});
export type SaveLayoutInput = z.infer<typeof saveLayoutSchema>;

export const restoreSchema = z.strictObject({ version: z.number().int().positive().optional() }).optional();
export type RestoreInput = z.infer<typeof restoreSchema>;

export const suggestRequestSchema = z
  .strictObject({
    busCableM: z.number().nonnegative().max(100000).optional(),
    power: layoutPowerSchema.optional(),
    /** "class-a": wire each life-safety detector's input out and back to the panel (NFPA 72 Class A). */
    pathway: pathwaySchema.optional(),
    /** "cheapest" (default) or the most supervised layout within a percentage of the cheapest price. */
    choice: suggestChoiceSchema.optional(),
    /** Sounders and strobes the system drives: the suggestion puts each on an output rated for it. */
    outputDevices: z.array(outputDeviceSchema).max(500).optional(),
  })
  .optional();
export type SuggestRequest = z.infer<typeof suggestRequestSchema>;

/** Archive a layout, or bring an archived one back. */
export const archiveLayoutSchema = z.strictObject({ archived: z.boolean("say whether the layout is archived (true) or restored (false)") });
export type ArchiveLayoutInput = z.infer<typeof archiveLayoutSchema>;
