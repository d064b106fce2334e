import { z } from "zod";
import { idParam, route } from "@/lib/server/route";
import { redraftFromSchedule } from "@/lib/server/layouts";
import { restoreSchema } from "@/lib/layout/layout-request-schema";

const params = z.object({ layoutId: idParam });

// POST /api/layouts/:layoutId/redraft — a new draft revision re-solved against the live schedule (409 without an approved revision, or when { version } is stale)
export const POST = route({ permission: "layout:write", params, body: restoreSchema }, async ({ actor, params, body }) => redraftFromSchedule(actor, params.layoutId, body?.version));
