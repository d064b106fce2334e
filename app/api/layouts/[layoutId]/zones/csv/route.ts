import { attachmentHeader } from "@/lib/http/content-disposition";
import { z } from "zod";
import { idParam, route } from "@/lib/server/route";
import { zoneProgrammingCsvFor } from "@/lib/server/sheets";

const params = z.object({ layoutId: idParam });
const query = z.strictObject({ revision: z.coerce.number().int().positive().max(2 ** 31).optional() });

// GET /api/layouts/:layoutId/zones/csv — the zone list for programming (zone, keypad label, type, area, part-set, options, input, resistors) as RFC 4180 CSV, the approved revision unless ?revision= says otherwise
export const GET = route({ permission: "sheet:read", params, query }, async ({ actor, params, query }) => {
  const { csv, fileName } = await zoneProgrammingCsvFor(actor, params.layoutId, { revision: query.revision });
  return new Response(csv, { headers: { "content-type": "text/csv; charset=utf-8", "content-disposition": attachmentHeader(fileName) } });
});
