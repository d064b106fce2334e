import { z } from "zod";
import { idParam, route } from "@/lib/server/route";
import { deleteLayout, saveLayout } from "@/lib/server/layouts";
import { etagMatches, readStoredLayout } from "@/lib/server/layout-read";
import { saveLayoutSchema } from "@/lib/layout/layout-request-schema";

const params = z.object({ layoutId: idParam });

// GET /api/layouts/:layoutId — the layout and its current revision's document, as stored; ETag, 304 on If-None-Match
export const GET = route({ permission: "layout:read", params }, async ({ actor, params, req }) => {
  const { etag, body } = await readStoredLayout(actor, params.layoutId);
  if (etagMatches(req.headers.get("if-none-match"), etag)) return new Response(null, { status: 304, headers: { etag } });
  return new Response(body, { status: 200, headers: { "content-type": "application/json", etag } });
});

// PUT /api/layouts/:layoutId — save a revision (409 { error, currentVersion } on a stale version, 422 on unknown references)
export const PUT = route({ permission: "layout:write", params, body: saveLayoutSchema }, async ({ actor, params, body }) => saveLayout(actor, params.layoutId, body));

// DELETE /api/layouts/:layoutId — delete a draft layout and its revisions (409 for an approved or commissioned one: archive it)
export const DELETE = route({ permission: "layout:write", params }, async ({ actor, params }) => deleteLayout(actor, params.layoutId));
