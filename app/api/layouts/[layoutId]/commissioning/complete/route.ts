import { z } from "zod";
import { idParam, route } from "@/lib/server/route";
import { reviewAction } from "@/lib/server/review";

const params = z.object({ layoutId: idParam });

// POST /api/layouts/:layoutId/commissioning/complete — mark the approved layout commissioned, once every loop has passed (409 before)
export const POST = route({ permission: "commissioning:record", params }, async ({ actor, params }) => reviewAction(actor, params.layoutId, { action: "commission" }));
