import { z } from "zod";
import { idParam, route } from "@/lib/server/route";
import { copySite } from "@/lib/server/site-copy";
import { siteCopySchema } from "@/lib/sites/site-schema";

const params = z.object({ siteId: idParam });

// POST /api/sites/:siteId/copy — a new site with this site's details, structure and device schedule
export const POST = route({ permission: "schedule:write", params, body: siteCopySchema }, async ({ actor, params, body }) => copySite(actor, params.siteId, body));
