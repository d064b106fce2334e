import { z } from "zod";

// Minimum strength: length first (it matters most), plus a mix, and not one repeated character.
export const passwordSchema = z
  .string()
  .min(10, "Use at least 10 characters")
  .max(200, "Use at most 200 characters")
  .refine((p) => /[a-zA-Z]/.test(p) && /[^a-zA-Z]/.test(p), "Mix letters with digits or symbols")
  .refine((p) => new Set(p).size >= 5, "Use at least 5 different characters");
