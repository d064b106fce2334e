import { z } from "zod";
import { idParam, route } from "@/lib/server/route";
import { restoreRevision } from "@/lib/server/layouts";
import { restoreSchema } from "@/lib/layout/layout-request-schema";

const params = z.object({ layoutId: idParam, rev: idParam });

// POST /api/layouts/:layoutId/revisions/:rev/restore — a new revision with the old document (409 when { version } is stale)
export const POST = route({ permission: "layout:write", params, body: restoreSchema }, async ({ actor, params, body }) => restoreRevision(actor, params.layoutId, params.rev, body?.version));
