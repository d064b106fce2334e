import { z } from "zod";

// Request body of "duplicate a layout", shared by the route handler, the button's form and the OpenAPI document.
export const duplicateLayoutSchema = z.strictObject({
  /** Defaults to "Copy of <name>". */
  name: z.string().trim().min(1, "a name is needed").max(200, "at most 200 characters").optional(),
});
export type DuplicateLayoutInput = z.infer<typeof duplicateLayoutSchema>;

export const copyName = (name: string) => `Copy of ${name}`.slice(0, 200);
