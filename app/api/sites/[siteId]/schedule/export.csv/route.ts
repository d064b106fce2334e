import { attachmentHeader } from "@/lib/http/content-disposition";
import { z } from "zod";
import { idParam, route } from "@/lib/server/route";
import { exportScheduleCsv } from "@/lib/server/schedules";

const params = z.object({ siteId: idParam });

// GET /api/sites/:siteId/schedule/export.csv — the device schedule as RFC 4180 CSV, in the import's columns
export const GET = route({ permission: "site:read", params }, async ({ actor, params }) => {
  const { csv, fileName } = await exportScheduleCsv(actor, params.siteId);
  return new Response(csv, { headers: { "content-type": "text/csv; charset=utf-8", "content-disposition": attachmentHeader(fileName) } });
});
