import { z } from "zod";
import { idParam, route } from "@/lib/server/route";
import { bulkEditDetectors, createDetector, deleteDetectors, listSchedule } from "@/lib/server/schedules";
import { bulkEditPatchSchema, createDetectorFormSchema } from "@/lib/schedule/schema";
import { deleteDetectorsSchema } from "@/lib/schedule/schedule-request-schema";

const params = z.object({ siteId: idParam });

// GET /api/sites/:siteId/schedule — the site's device schedule in schedule order
export const GET = route({ permission: "site:read", params }, async ({ actor, params }) => ({ detectors: await listSchedule(actor, params.siteId) }));

// POST /api/sites/:siteId/schedule — add one detector (catalog id checked against the organisation's catalog)
export const POST = route({ permission: "schedule:write", params, body: createDetectorFormSchema }, async ({ actor, params, body }) => createDetector(actor, params.siteId, body));

// PATCH /api/sites/:siteId/schedule — bulk edit: one patch for many detectors, all or nothing
export const PATCH = route({ permission: "schedule:write", params, body: bulkEditPatchSchema }, async ({ actor, params, body }) => bulkEditDetectors(actor, params.siteId, body));

// DELETE /api/sites/:siteId/schedule — delete the detectors named in { ids }, all or nothing (409 for detectors on an approved layout unless confirmApproved)
export const DELETE = route({ permission: "schedule:write", params, body: deleteDetectorsSchema }, async ({ actor, params, body }) => deleteDetectors(actor, params.siteId, body.ids, { confirmApproved: body.confirmApproved }));
