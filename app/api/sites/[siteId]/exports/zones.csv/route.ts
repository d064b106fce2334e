import { attachmentHeader } from "@/lib/http/content-disposition";
import { z } from "zod";
import { notFound } from "@/lib/server/errors";
import { idParam, route } from "@/lib/server/route";
import { findLayoutForReview, zoneListCsvFor } from "@/lib/server/sheets";

const params = z.object({ siteId: idParam });
const query = z.strictObject({ layoutId: idParam, revision: z.coerce.number().int().positive().max(2 ** 31).optional() });

// GET /api/sites/:siteId/exports/zones.csv?layoutId= — the zone list for the monitoring centre (zone, label, area, room, device type, board, input, report types) as RFC 4180 CSV, from the approved revision unless ?revision= says otherwise
export const GET = route({ permission: "sheet:read", params, query }, async ({ actor, params, query }) => {
  const { layout } = await findLayoutForReview(actor, query.layoutId);
  if (layout.siteId !== params.siteId) throw notFound("That layout");
  const { csv, fileName } = await zoneListCsvFor(actor, query.layoutId, { revision: query.revision });
  return new Response(csv, { headers: { "content-type": "text/csv; charset=utf-8", "content-disposition": attachmentHeader(fileName) } });
});
