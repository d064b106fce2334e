import { z } from "zod";
import type { CableGauge } from "./types";

// The one cable-gauge schema, { awg } or { mm2 }, for loop requests and device schedules alike. The loop engine
// takes any gauge from 0000 to 40 AWG (checked in loop-problems.ts, so the engine and the API give the same
// words); a device schedule narrows it with `scheduleGaugeRange`.

const num = (what: string) => z.number({ error: `${what} must be a number` });

export const cableGaugeSchema = z.union([z.strictObject({ awg: num("AWG") }), z.strictObject({ mm2: num("mm²") })], {
  error: "gauge is { awg: <gauge number> } or { mm2: <cross-section> }",
});

export const SCHEDULE_AWG_MIN = 10;
export const SCHEDULE_AWG_MAX = 30;
export const SCHEDULE_MM2_MAX = 10;

/** The gauges a device schedule takes: whole AWG numbers 10–30, or more than 0 and at most 10 mm². */
export function scheduleGaugeRange(g: CableGauge, ctx: z.RefinementCtx): void {
  if ("awg" in g) {
    if (!Number.isInteger(g.awg) || g.awg < SCHEDULE_AWG_MIN || g.awg > SCHEDULE_AWG_MAX)
      ctx.addIssue({ code: "custom", path: ["awg"], message: `AWG must be a whole number from ${SCHEDULE_AWG_MIN} to ${SCHEDULE_AWG_MAX} (got ${g.awg})` });
  } else if (!(g.mm2 > 0 && g.mm2 <= SCHEDULE_MM2_MAX))
    ctx.addIssue({ code: "custom", path: ["mm2"], message: `the cross-section must be more than 0 and at most ${SCHEDULE_MM2_MAX} mm² (got ${g.mm2})` });
}
