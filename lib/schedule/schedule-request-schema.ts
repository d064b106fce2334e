import { z } from "zod";

// Request bodies of the device schedule API that are not a detector (see schema.ts for those), shared by the
// route handlers, the import form and the OpenAPI document.

export const deleteDetectorsSchema = z.strictObject({
  ids: z.array(z.string().min(1).max(64)).min(1).max(5000),
  /** Delete even detectors that an approved or commissioned layout places (it keeps its frozen copy). */
  confirmApproved: z.boolean().optional(),
});

/** ?confirmApproved=1 on deleting one detector. */
export const deleteDetectorQuerySchema = z.strictObject({ confirmApproved: z.enum(["0", "1", "true", "false"], "confirmApproved must be 1 or 0").optional() });
export type DeleteDetectorsInput = z.infer<typeof deleteDetectorsSchema>;

/** Largest CSV the import takes. */
export const MAX_IMPORT_BYTES = 1024 * 1024;

export const importRequestSchema = z.strictObject({
  mode: z.enum(["preview", "confirm"]),
  csv: z.string().max(MAX_IMPORT_BYTES, "the file is larger than 1 MiB"),
  fileName: z.string().max(200).optional(),
  /** On confirm: add the areas and rooms the file names that the site lacks (the preview lists them). */
  addUnknownPlaces: z.boolean().optional(),
});
export type ImportRequest = z.infer<typeof importRequestSchema>;
