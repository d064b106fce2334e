import { z } from "zod";
import { idParam, route } from "@/lib/server/route";
import { suggestForSite } from "@/lib/server/layouts";
import { suggestRequestSchema } from "@/lib/layout/layout-request-schema";

const params = z.object({ siteId: idParam });

// POST /api/sites/:siteId/suggestions — the cheapest catalog hardware for the schedule, one detector per input and with shared inputs
export const POST = route({ permission: "layout:read", params, body: suggestRequestSchema }, async ({ actor, params, body }) => suggestForSite(actor, params.siteId, body));
