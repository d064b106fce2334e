import { z } from "zod";
import { idParam, route } from "@/lib/server/route";
import { setSiteArchived } from "@/lib/server/sites";

const params = z.object({ siteId: idParam });

// POST /api/sites/:siteId/restore — bring an archived site back into the list (409 when it is not archived)
export const POST = route({ permission: "site:archive", params }, async ({ actor, params }) => setSiteArchived(actor, params.siteId, false));
