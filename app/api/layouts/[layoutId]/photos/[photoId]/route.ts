import { contentDisposition } from "@/lib/http/content-disposition";
import { z } from "zod";
import { idParam, route } from "@/lib/server/route";
import { getPhoto } from "@/lib/server/commissioning";

const params = z.object({ layoutId: idParam, photoId: idParam });

// GET /api/layouts/:layoutId/photos/:photoId — one commissioning photo, as stored
export const GET = route({ permission: "sheet:read", params }, async ({ actor, params }) => {
  const p = await getPhoto(actor, params.layoutId, params.photoId);
  return new Response(new Uint8Array(p.body), {
    headers: { "content-type": p.contentType, "content-disposition": contentDisposition("inline", p.fileName), "x-content-type-options": "nosniff" },
  });
});
