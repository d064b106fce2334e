import { z } from "zod";
import { idParam, route } from "@/lib/server/route";
import { getRevision } from "@/lib/server/layouts";

const params = z.object({ layoutId: idParam, rev: idParam });

// GET /api/layouts/:layoutId/revisions/:rev — one revision's document
export const GET = route({ permission: "layout:read", params }, async ({ actor, params }) => getRevision(actor, params.layoutId, params.rev));
