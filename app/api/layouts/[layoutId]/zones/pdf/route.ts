import { attachmentHeader } from "@/lib/http/content-disposition";
import { z } from "zod";
import { idParam, route } from "@/lib/server/route";
import { zoneListPdfFor } from "@/lib/server/sheets";
import { paperSizeQuery } from "@/lib/sheet/sheet-request-schema";

const params = z.object({ layoutId: idParam });
const query = z.strictObject({ size: paperSizeQuery, revision: z.coerce.number().int().positive().max(2 ** 31).optional() });

// GET /api/layouts/:layoutId/zones/pdf — the zone list for programming as a PDF (?size=A4 or LETTER), the approved revision unless ?revision= says otherwise
export const GET = route({ permission: "sheet:read", params, query }, async ({ actor, params, query }) => {
  const { pdf, fileName } = await zoneListPdfFor(actor, params.layoutId, { size: query.size, revision: query.revision });
  return new Response(new Uint8Array(pdf), { headers: { "content-type": "application/pdf", "content-disposition": attachmentHeader(fileName), "cache-control": "private, no-store" } });
});
