import { z } from "zod";

// The multipart form of `POST /api/catalog/uploads`, shared by the upload form, the route handler and the OpenAPI document.

/** Largest accepted catalog file. The shipped catalog's five files together are about 40 KiB. */
export const MAX_UPLOAD_BYTES = 256 * 1024;

export const UPLOAD_MODES = ["preview", "store"] as const;
export type UploadMode = (typeof UPLOAD_MODES)[number];

/** The file field: anything File-like (the browser's File, or undici's on the server). Its size and bytes are checked by the server. */
export const uploadFileFieldSchema = z.custom<File>((v) => typeof v === "object" && v !== null && typeof (v as File).arrayBuffer === "function" && typeof (v as File).name === "string", {
  message: "choose a YAML file to upload",
});

export const catalogUploadFormSchema = z.object({
  mode: z.enum(UPLOAD_MODES, { message: 'mode must be "preview" or "store"' }).default("preview"),
  /** The version the preview's diff was made against; storing refuses (409) if another version came in since. */
  baseVersion: z.coerce.number().int().min(0).max(2 ** 31).optional(),
  file: uploadFileFieldSchema,
});
export type CatalogUploadFields = z.input<typeof catalogUploadFormSchema>;

/** `?preview=1` asks for a preview whatever the form says. */
export const uploadQuerySchema = z.object({ preview: z.enum(["0", "1", "true", "false"]).optional() });
