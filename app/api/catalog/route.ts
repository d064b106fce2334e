import { route } from "@/lib/server/route";
import { effectiveCatalogInfo } from "@/lib/server/catalogs";

// GET /api/catalog — the caller's organisation's effective catalog (shipped plus its latest upload) and where entries come from
export const GET = route({ permission: "catalog:read" }, async ({ actor }) => effectiveCatalogInfo(actor.organisationId));
