import { z } from "zod";
import { idParam, route } from "@/lib/server/route";
import { getPhoto } from "@/lib/server/commissioning";

const params = z.object({ layoutId: idParam, photoId: idParam });

// GET /api/layouts/:layoutId/photos/:photoId — one commissioning photo, as stored
export const GET = route({ permission: "sheet:read", params }, async ({ actor, params }) => {
  const p = await getPhoto(actor, params.layoutId, params.photoId);
  // RFC 6266: an ASCII fallback plus the UTF-8 name (the stored name is sanitised but may hold any letter)
  const ascii = p.fileName.replace(/[^\x20-\x7e]|["\\]/g, "_");
  return new Response(new Uint8Array(p.body), {
    headers: { "content-type": p.contentType, "content-disposition": `inline; filename="${ascii}"; filename*=UTF-8''${encodeURIComponent(p.fileName).replace(/['()*]/g, (c) => `%${c.charCodeAt(0).toString(16).toUpperCase()}`)}`, "x-content-type-options": "nosniff", "cache-control": "private, max-age=3600" },
  });
});
