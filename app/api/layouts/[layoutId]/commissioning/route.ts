import { z } from "zod";
import { loopJsonReplacer } from "@/lib/loop";
import { idParam, route } from "@/lib/server/route";
import { getCommissioning } from "@/lib/server/commissioning";

const params = z.object({ layoutId: idParam });

// GET /api/layouts/:layoutId/commissioning — progress per loop on the approved revision, the readings and the photos; open readings as "Infinity"
export const GET = route({ permission: "sheet:read", params }, async ({ actor, params }) => {
  const view = await getCommissioning(actor, params.layoutId);
  return new Response(JSON.stringify(view, loopJsonReplacer), { headers: { "content-type": "application/json" } });
});
