import { z } from "zod";
import { idParam, route } from "@/lib/server/route";
import { saveRoute } from "@/lib/server/plans";
import { saveRouteSchema } from "@/lib/plan/plan-schema";

const params = z.object({ siteId: idParam });

// PUT /api/sites/:siteId/plan-routes — a device's cable route to its board (replaces its earlier one); the measured run becomes the detector's cable length
export const PUT = route({ permission: "schedule:write", params, body: saveRouteSchema }, async ({ actor, params, body }) => saveRoute(actor, params.siteId, body));
