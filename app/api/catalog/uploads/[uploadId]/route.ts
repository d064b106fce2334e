import { attachmentHeader } from "@/lib/http/content-disposition";
import { z } from "zod";
import { idParam, route } from "@/lib/server/route";
import { uploadText } from "@/lib/server/catalogs";

// GET /api/catalog/uploads/:uploadId — download one stored version as YAML (404 for another organisation's)
export const GET = route({ permission: "catalog:read", params: z.object({ uploadId: idParam }) }, async ({ actor, params }) => {
  const file = await uploadText(actor.organisationId, params.uploadId);
  return new Response(file.text, {
    headers: {
      "content-type": "text/yaml; charset=utf-8",
      "content-disposition": attachmentHeader(file.fileName),
      "cache-control": "private, no-store",
      etag: `"${file.sha256}"`,
    },
  });
});
