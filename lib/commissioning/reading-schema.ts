import { z } from "zod";
import { TEST_KEYS } from "@/lib/sheet/sheet-types";
import type { MeasuredReading } from "@/lib/commissioning/diagnose";

// What an installer types from the meter: "4.71k", "4k7" (RKM code, IEC 60062), "4710", "4.71 kΩ", "OL", "open".

const MULT: Record<string, number> = { "": 1, r: 1, k: 1e3, m: 1e6 };

/** Parse a meter reading; null when it is neither ohms nor open. An "M" is mega, as on resistance ranges. */
export function parseMeterReading(text: string): MeasuredReading | null {
  const s = text.trim().replace(/\s+/g, "").replace(/(ohms?|Ω)$/i, "").replace(",", ".");
  if (/^(ol|o\.l\.?|open|∞|inf)$/i.test(s)) return { kind: "open" };
  let m = /^(\d+(?:\.\d+)?|\.\d+)([rkKmM]?)$/.exec(s);
  if (m) return finite(Number(m[1]) * MULT[m[2].toLowerCase()]);
  m = /^(\d+)([rRkKmM])(\d+)$/.exec(s); // RKM: 4k7 = 4.7 kΩ, 2R2 = 2.2 Ω
  if (m) return finite(Number(`${m[1]}.${m[3]}`) * MULT[m[2].toLowerCase()]);
  return null;
}

function finite(ohms: number): MeasuredReading | null {
  return Number.isFinite(ohms) && ohms >= 0 && ohms < 1e10 ? { kind: "ohms", ohms } : null;
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
