import { z } from "zod";
import { idParam, route } from "@/lib/server/route";
import { moveItem } from "@/lib/server/plans";
import { moveItemSchema } from "@/lib/plan/plan-schema";

const params = z.object({ siteId: idParam, itemId: idParam });

// PATCH /api/sites/:siteId/plan-items/:itemId — move a placed device on its plan
export const PATCH = route({ permission: "schedule:write", params, body: moveItemSchema }, async ({ actor, params, body }) => moveItem(actor, params.siteId, params.itemId, body));
