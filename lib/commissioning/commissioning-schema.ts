import { z } from "zod";
import { meterReadingSchema, testKeySchema } from "@/lib/commissioning/reading-schema";

// Request bodies of the commissioning API, shared by the forms and the route handlers.

export const recordReadingSchema = z.strictObject({
  /** Made once per reading on the device (crypto.randomUUID()), so a retried request is stored once. */
  clientId: z.uuid("clientId must be a UUID"),
  boardKey: z.string().min(1).max(40),
  input: z.number().int().min(1).max(256),
  test: testKeySchema,
  /** As typed from the meter: "4.71k", "4k7", "4710", "OL". */
  reading: meterReadingSchema,
});
export type RecordReadingInput = z.input<typeof recordReadingSchema>;
export type RecordReadingParsed = z.output<typeof recordReadingSchema>;

export const photoFieldsSchema = z.strictObject({
  boardKey: z.string().min(1).max(40).optional(),
  input: z.coerce.number().int().min(1).max(256).optional(),
  clientId: z.uuid("clientId must be a UUID").optional(),
});
export type PhotoFields = z.infer<typeof photoFieldsSchema>;
