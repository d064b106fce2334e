import { z } from "zod";
import { idParam, route } from "@/lib/server/route";
import { calibratePlan } from "@/lib/server/plans";
import { calibrateSchema } from "@/lib/plan/plan-schema";

const params = z.object({ siteId: idParam, planId: idParam });

// PUT /api/sites/:siteId/plans/:planId/calibration — the plan's scale from two points and the real distance in the organisation's unit; routes on it are re-measured
export const PUT = route({ permission: "schedule:write", params, body: calibrateSchema }, async ({ actor, params, body }) => calibratePlan(actor, params.siteId, params.planId, body));
