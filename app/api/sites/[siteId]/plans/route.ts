import { z } from "zod";
import { idParam, route } from "@/lib/server/route";
import { listPlans } from "@/lib/server/plans";

const params = z.object({ siteId: idParam });

// GET /api/sites/:siteId/plans — the site's floor plans with what is placed on them, and the cable routes with their runs
export const GET = route({ permission: "site:read", params }, async ({ actor, params }) => listPlans(actor, params.siteId));
