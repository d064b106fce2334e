import { route } from "@/lib/server/route";
import { createSite, listSites } from "@/lib/server/sites";
import { siteInputSchema } from "@/lib/sites/site-schema";

// GET /api/sites — the caller's organisation's sites
export const GET = route({ permission: "site:read" }, async ({ actor }) => ({ sites: await listSites(actor) }));

// POST /api/sites — create a site with its floors/areas and rooms
export const POST = route({ permission: "site:write", body: siteInputSchema }, async ({ actor, body }) => createSite(actor, body));
