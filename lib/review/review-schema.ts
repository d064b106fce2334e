import { z } from "zod";

// Request bodies of the review API, shared by the forms and the route handlers.

export const reviewStepSchema = z.enum(["submit", "withdraw", "approve", "reject", "commission"]);
export type ReviewStep = z.infer<typeof reviewStepSchema>;

export const reviewActionSchema = z.strictObject({
  action: reviewStepSchema,
  /** Needed to send a layout back to draft. */
  reason: z.string().trim().max(4000).optional(),
  /** The revision the reviewer looked at; a newer one gives 409. */
  revision: z.number().int().positive().optional(),
});
export type ReviewActionInput = z.infer<typeof reviewActionSchema>;

export const commentTargetSchema = z.union([
  z.strictObject({ kind: z.literal("layout") }),
  z.strictObject({ kind: z.literal("board"), boardKey: z.string().min(1).max(40) }),
  z.strictObject({ kind: z.literal("input"), boardKey: z.string().min(1).max(40), input: z.number().int().min(1).max(256) }),
  z.strictObject({ kind: z.literal("detector"), detectorId: z.string().min(1).max(64) }),
]);

export const commentSchema = z.strictObject({
  body: z.string().trim().min(1, "write a comment").max(4000, "at most 4000 characters"),
  target: commentTargetSchema.optional(),
});
export type CommentInput = z.infer<typeof commentSchema>;

const layoutIds = z.array(z.number().int().positive()).min(2, "compare at least two layouts").max(6, "compare at most six layouts");

export const compareRequestSchema = z.strictObject({ layoutIds }).refine((v) => new Set(v.layoutIds).size === v.layoutIds.length, { message: "a layout is listed twice", path: ["layoutIds"] });

export const chooseLayoutSchema = z
  .strictObject({
    chosenLayoutId: z.number().int().positive(),
    comparedLayoutIds: layoutIds,
    reason: z.string().trim().min(1, "say why this layout was chosen").max(4000),
  })
  .refine((v) => v.comparedLayoutIds.includes(v.chosenLayoutId), { message: "the chosen layout must be one of those compared", path: ["chosenLayoutId"] });
export type ChooseLayoutInput = z.infer<typeof chooseLayoutSchema>;
