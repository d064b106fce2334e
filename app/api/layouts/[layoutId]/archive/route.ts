import { z } from "zod";
import { idParam, route } from "@/lib/server/route";
import { setLayoutArchived } from "@/lib/server/layouts";
import { archiveLayoutSchema } from "@/lib/layout/layout-request-schema";

const params = z.object({ layoutId: idParam });

// POST /api/layouts/:layoutId/archive — archive a layout ({ archived: true }) or restore it ({ archived: false }); it stays readable either way
export const POST = route({ permission: "layout:write", params, body: archiveLayoutSchema }, async ({ actor, params, body }) => setLayoutArchived(actor, params.layoutId, body.archived));
