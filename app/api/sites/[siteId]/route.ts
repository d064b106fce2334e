import { z } from "zod";
import { idParam, route } from "@/lib/server/route";
import { getSite, updateSite } from "@/lib/server/sites";
import { siteUpdateSchema } from "@/lib/sites/site-schema";

const params = z.object({ siteId: idParam });

// GET /api/sites/:siteId — one site with its floors, areas, rooms and installers (404 outside the caller's organisation)
export const GET = route({ permission: "site:read", params }, async ({ actor, params }) => getSite(actor, params.siteId));

// PATCH /api/sites/:siteId — change the site's details or its assigned installers
export const PATCH = route({ permission: "site:write", params, body: siteUpdateSchema }, async ({ actor, params, body }) => updateSite(actor, params.siteId, body));
