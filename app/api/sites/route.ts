import { route } from "@/lib/server/route";
import { createSite, listSites } from "@/lib/server/sites";
import { siteInputSchema, siteListQuerySchema } from "@/lib/sites/site-schema";

// GET /api/sites?archived=exclude|include|only — the caller's organisation's sites (archived ones left out by default)
export const GET = route({ permission: "site:read", query: siteListQuerySchema }, async ({ actor, query }) => ({ sites: await listSites(actor, { archived: query.archived }) }));

// POST /api/sites — create a site with its details and its floors, areas and rooms
export const POST = route({ permission: "site:write", body: siteInputSchema }, async ({ actor, body }) => createSite(actor, body));
