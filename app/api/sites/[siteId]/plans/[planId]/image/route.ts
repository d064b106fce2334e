import { contentDisposition } from "@/lib/http/content-disposition";
import { z } from "zod";
import { idParam, route } from "@/lib/server/route";
import { getPlanImage } from "@/lib/server/plans";

const params = z.object({ siteId: idParam, planId: idParam });

// GET /api/sites/:siteId/plans/:planId/image — the plan's drawing, as stored
export const GET = route({ permission: "site:read", params }, async ({ actor, params }) => {
  const p = await getPlanImage(actor, params.siteId, params.planId);
  return new Response(new Uint8Array(p.body), {
    headers: { "content-type": p.contentType, "content-disposition": contentDisposition("inline", p.fileName), "x-content-type-options": "nosniff" },
  });
});
