import { attachmentHeader } from "@/lib/http/content-disposition";
import { z } from "zod";
import { ApiError } from "@/lib/server/errors";
import { idParam, route } from "@/lib/server/route";
import { commissioningReportPdfFor, getCommissioning } from "@/lib/server/commissioning";
import { paperSizeQuery } from "@/lib/sheet/sheet-request-schema";
import { plural } from "@/lib/vocabulary/plural";

const params = z.object({ layoutId: idParam });
const query = z.strictObject({ size: paperSizeQuery });

// GET /api/layouts/:layoutId/commissioning/report — the commissioning record PDF (?size=A4 or LETTER), once every loop of the approved revision has passed (409 before)
export const GET = route({ permission: "sheet:read", params, query }, async ({ actor, params, query }) => {
  const { progress, revision } = await getCommissioning(actor, params.layoutId);
  if (revision === null) throw new ApiError(409, "There is no commissioning record: the layout has no approved revision yet.");
  const left = progress.totals.loops - progress.totals.passed;
  if (progress.totals.loops === 0 || left > 0)
    throw new ApiError(409, `The commissioning record is ready when every loop has passed: ${left} of ${plural(progress.totals.loops, "loop")} still to pass.`, undefined, { totals: progress.totals });
  const { pdf, fileName } = await commissioningReportPdfFor(actor, params.layoutId, query.size);
  return new Response(new Uint8Array(pdf), { headers: { "content-type": "application/pdf", "content-disposition": attachmentHeader(fileName), "cache-control": "private, no-store" } });
});
