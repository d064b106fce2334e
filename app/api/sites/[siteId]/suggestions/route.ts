import { z } from "zod";
import { idParam, route } from "@/lib/server/route";
import { suggestForSite, suggestRequestSchema } from "@/lib/server/layouts";

const params = z.object({ siteId: idParam });

// POST /api/sites/:siteId/suggestions — the cheapest catalog hardware for the schedule, one detector per input and with shared inputs
export const POST = route({ permission: "layout:read", params, body: suggestRequestSchema }, async ({ actor, params, body }) => suggestForSite(actor, params.siteId, body));
