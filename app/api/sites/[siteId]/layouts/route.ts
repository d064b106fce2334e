import { z } from "zod";
import { idParam, route } from "@/lib/server/route";
import { createLayout, listLayouts } from "@/lib/server/layouts";
import { createLayoutSchema } from "@/lib/layout/layout-request-schema";

const params = z.object({ siteId: idParam });

// GET /api/sites/:siteId/layouts — the site's layouts with their current revision's findings summary
export const GET = route({ permission: "layout:read", params }, async ({ actor, params }) => ({ layouts: await listLayouts(actor, params.siteId) }));

// POST /api/sites/:siteId/layouts — create a layout from a document, a blank panel, or a hardware suggestion (revision 1)
export const POST = route({ permission: "layout:write", params, body: createLayoutSchema }, async ({ actor, params, body }) => createLayout(actor, params.siteId, body));
