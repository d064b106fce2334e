import { z } from "zod";
import { TEST_KEYS } from "@/lib/sheet/sheet-types";
import type { MeasuredReading } from "@/lib/commissioning/diagnose";
import { parseOhms } from "@/lib/resistors/parse-ohms";

// What an installer types from the meter: "4.71k", "4k7" (letter code, IEC 60062), "4710", "4.71 kΩ", "OL", "open".

/** Parse a meter reading; null when it is neither ohms nor open. An "M" is mega, as on resistance ranges. */
export function parseMeterReading(text: string): MeasuredReading | null {
  if (/^(ol|o\.l\.?|open|∞|inf)$/i.test(text.trim().replace(/\s+/g, ""))) return { kind: "open" };
  // 0 Ω is a reading (a short); above 10 GΩ no hand meter reads, so it is a typing slip
  const ohms = parseOhms(text, { allowZero: true });
  return ohms !== null && ohms < 1e10 ? { kind: "ohms", ohms } : null;
}

export const testKeySchema = z.enum(TEST_KEYS);

export const meterReadingSchema = z
  .string()
  .trim()
  .min(1, "type the meter reading, e.g. 4.71k or OL")
  .max(40)
  .transform((s, ctx) => {
    const r = parseMeterReading(s);
    if (!r) {
      ctx.addIssue({ code: "custom", message: `"${s}" is not a reading: type ohms (4710, 4.71k, 4k7) or OL for open` });
      return z.NEVER;
    }
    return r;
  });
