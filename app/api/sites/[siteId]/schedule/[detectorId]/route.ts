import { z } from "zod";
import { idParam, route } from "@/lib/server/route";
import { deleteDetectors, updateDetector } from "@/lib/server/schedules";
import { updateDetectorFormSchema } from "@/lib/schedule/schema";
import { deleteDetectorQuerySchema } from "@/lib/schedule/schedule-request-schema";

const params = z.object({ siteId: idParam, detectorId: idParam });

// PATCH /api/sites/:siteId/schedule/:detectorId — change one detector
export const PATCH = route({ permission: "schedule:write", params, body: updateDetectorFormSchema }, async ({ actor, params, body }) => updateDetector(actor, params.siteId, params.detectorId, body));

// DELETE /api/sites/:siteId/schedule/:detectorId — delete one detector (409 when an approved layout places it, unless ?confirmApproved=1)
export const DELETE = route({ permission: "schedule:write", params, query: deleteDetectorQuerySchema }, async ({ actor, params, query }) =>
  deleteDetectors(actor, params.siteId, [String(params.detectorId)], { confirmApproved: query.confirmApproved === "1" || query.confirmApproved === "true" }),
);
