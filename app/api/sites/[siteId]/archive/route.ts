import { z } from "zod";
import { idParam, route } from "@/lib/server/route";
import { setSiteArchived } from "@/lib/server/sites";

const params = z.object({ siteId: idParam });

// POST /api/sites/:siteId/archive — hide the site from the list; everything it holds stays (409 when already archived)
export const POST = route({ permission: "site:archive", params }, async ({ actor, params }) => setSiteArchived(actor, params.siteId, true));
