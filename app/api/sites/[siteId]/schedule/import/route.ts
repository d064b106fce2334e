import { z } from "zod";
import { idParam, route } from "@/lib/server/route";
import { confirmImport, previewImport } from "@/lib/server/schedules";
import { importRequestSchema, MAX_IMPORT_BYTES } from "@/lib/schedule/schedule-request-schema";

const params = z.object({ siteId: idParam });

// POST /api/sites/:siteId/schedule/import — { mode: "preview" } checks a CSV and stores nothing; { mode: "confirm" } stores it in one transaction (422 and nothing stored on any bad row; 409 listing unknown areas and rooms unless addUnknownPlaces)
export const POST = route({ permission: "schedule:write", params, body: importRequestSchema, maxBodyBytes: MAX_IMPORT_BYTES * 2 }, async ({ actor, params, body }) =>
  body.mode === "preview" ? previewImport(actor, params.siteId, body.csv) : confirmImport(actor, params.siteId, body.csv, body.fileName, body.addUnknownPlaces),
);
