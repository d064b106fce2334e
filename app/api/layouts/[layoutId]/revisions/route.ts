import { z } from "zod";
import { idParam, route } from "@/lib/server/route";
import { listRevisions } from "@/lib/server/layouts";

const params = z.object({ layoutId: idParam });

// GET /api/layouts/:layoutId/revisions — every revision, newest first, with who saved it and its findings summary
export const GET = route({ permission: "layout:read", params }, async ({ actor, params }) => ({ revisions: await listRevisions(actor, params.layoutId) }));
