import { z } from "zod";
import { route } from "@/lib/server/route";
import { findCatalogEntry } from "@/lib/server/catalogs";
import { idSchema } from "@/lib/catalog/schema";
import { kindLabel } from "@/lib/catalog/kinds";

// GET /api/catalog/:entryId — one entry of the caller's effective catalog with its kind and origin (404 if unknown)
export const GET = route({ permission: "catalog:read", params: z.object({ entryId: idSchema }) }, async ({ actor, params }) => {
  const found = await findCatalogEntry(actor.organisationId, params.entryId);
  return { kind: found.kind, kindLabel: kindLabel[found.kind], origin: found.origin, uploadVersion: found.upload?.version ?? null, entry: found.entry };
});
