import { z } from "zod";
import { ApiError } from "@/lib/server/errors";
import { idParam, route, zodIssues } from "@/lib/server/route";
import { compareSiteLayouts } from "@/lib/server/review";
import { compareRequestSchema } from "@/lib/review/review-schema";

const params = z.object({ siteId: idParam });
const query = z.strictObject({ ids: z.string().max(200) });

// GET /api/sites/:siteId/compare?ids=1,2 — two to six of the site's layouts side by side: cost, inputs, supplies, supervision coverage, findings, shared-input trade-offs
export const GET = route({ permission: "layout:read", params, query }, async ({ actor, params, query }) => {
  const ids = query.ids.split(",").map((s) => s.trim()).filter(Boolean).map(Number);
  const parsed = compareRequestSchema.safeParse({ layoutIds: ids });
  if (!parsed.success) throw new ApiError(422, "Some fields are not valid.", zodIssues(parsed.error).map((i) => ({ ...i, path: "ids" })));
  return compareSiteLayouts(actor, params.siteId, parsed.data.layoutIds);
});
