import { z } from "zod";
import { idParam, route } from "@/lib/server/route";
import { saveStructure } from "@/lib/server/site-structure";
import { siteStructureSchema } from "@/lib/sites/site-schema";

const params = z.object({ siteId: idParam });

// PUT /api/sites/:siteId/structure — the ordered floors with their areas and rooms (409 naming the count when a removed room is still used by detectors)
export const PUT = route({ permission: "site:write", params, body: siteStructureSchema }, async ({ actor, params, body }) => saveStructure(actor, params.siteId, body.floors));
