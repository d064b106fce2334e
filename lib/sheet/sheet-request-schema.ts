import { z } from "zod";

// Requests about a terminal sheet, shared by the sheet page and the route handlers.

/** Paper sizes the server PDFs are laid out for. */
export const PAPER_SIZES = ["A4", "LETTER"] as const;
export type PaperSize = (typeof PAPER_SIZES)[number];

export const PAPER_WORDS: Record<PaperSize, string> = { A4: "A4 (210 × 297 mm)", LETTER: "US Letter (8.5 × 11 in)" };

/** ?size=A4 | LETTER (any case); the organisation's default paper when absent (paperOf). */
export const paperSizeQuery = z
  .string()
  .trim()
  .transform((s) => s.toUpperCase())
  .pipe(z.enum(PAPER_SIZES, "size must be A4 or LETTER"))
  .optional();

/** The PDF page size of the organisation's default paper setting. */
export const paperOf = (settings: { paper: "a4" | "letter" }): PaperSize => (settings.paper === "letter" ? "LETTER" : "A4");

export const sendSheetSchema = z.strictObject({
  size: z.enum(PAPER_SIZES, "size must be A4 or LETTER").optional(),
  /** Needed to send a revision that is not approved: the sender has seen that it is only for review. */
  confirmUnapproved: z.boolean().optional(),
});
export type SendSheetInput = z.infer<typeof sendSheetSchema>;
