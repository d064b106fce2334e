import { z } from "zod";

// How the hardware suggestion chooses among layouts that carry the schedule: the lowest list price, or the most
// supervision whose price is within a margin of the lowest. Shared by the suggestion request, the create-from-
// suggestion request and the exact model's options (lib/solver/suggest-exact.ts).

export const suggestChoiceSchema = z.discriminatedUnion("kind", [
  z.strictObject({ kind: z.literal("cheapest") }),
  z.strictObject({
    kind: z.literal("most-supervised"),
    withinPct: z.number("give the margin over the cheapest price as a percentage").min(0, "the margin cannot be negative").max(200, "the margin is at most 200 %"),
  }),
]);
export type SuggestChoiceInput = z.infer<typeof suggestChoiceSchema>;
