import { z } from "zod";
import { idParam, route } from "@/lib/server/route";
import { duplicateLayout } from "@/lib/server/layout-duplicate";
import { duplicateLayoutSchema } from "@/lib/layout/duplicate-schema";

const params = z.object({ layoutId: idParam });

// POST /api/layouts/:layoutId/duplicate — the layout's current design as a new draft layout with its own history
export const POST = route({ permission: "layout:write", params, body: duplicateLayoutSchema }, async ({ actor, params, body }) => ({ layout: await duplicateLayout(actor, params.layoutId, body) }));
