import { z } from "zod";
import { idParam, route } from "@/lib/server/route";
import { uploadText } from "@/lib/server/catalogs";

// GET /api/catalog/uploads/:uploadId — download one stored version as YAML (404 for another organisation's)
export const GET = route({ permission: "catalog:read", params: z.object({ uploadId: idParam }) }, async ({ actor, params }) => {
  const file = await uploadText(actor.organisationId, params.uploadId);
  // the stored name is already clean (letters, digits, space . _ - ( ) +); the ASCII fallback replaces the rest
  const ascii = file.fileName.replace(/[^\x20-\x7e]/g, "_");
  return new Response(file.text, {
    headers: {
      "content-type": "text/yaml; charset=utf-8",
      "content-disposition": `attachment; filename="${ascii}"; filename*=UTF-8''${encodeURIComponent(file.fileName)}`,
      "cache-control": "private, no-store",
      etag: `"${file.sha256}"`,
    },
  });
});
