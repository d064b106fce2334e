import { z } from "zod";
import { loopJsonReplacer } from "@/lib/loop";
import { idParam, route } from "@/lib/server/route";
import { getTerminalSheet } from "@/lib/server/sheets";

const params = z.object({ layoutId: idParam });
const query = z.strictObject({ revision: z.coerce.number().int().positive().max(2 ** 31).optional() });

// GET /api/layouts/:layoutId/sheet — the terminal sheet as data: the approved revision, else the current one (?revision= for another); open readings as "Infinity"
export const GET = route({ permission: "sheet:read", params, query }, async ({ actor, params, query }) => {
  const view = await getTerminalSheet(actor, params.layoutId, { revision: query.revision });
  return new Response(JSON.stringify(view, loopJsonReplacer), { headers: { "content-type": "application/json" } });
});
