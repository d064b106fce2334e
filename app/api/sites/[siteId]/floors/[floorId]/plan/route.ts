import { NextResponse, type NextRequest } from "next/server";
import { z } from "zod";
import { ApiError } from "@/lib/server/errors";
import { idParam, readBodyLimited, route } from "@/lib/server/route";
import { uploadPlan } from "@/lib/server/plans";
import { MAX_PLAN_BYTES } from "@/lib/plan/plan-image";

const params = z.object({ siteId: idParam, floorId: idParam });
// The drawing plus multipart framing.
const MAX_FORM_BYTES = MAX_PLAN_BYTES + 64 * 1024;
const tooLarge = () => new ApiError(413, `The plan is too large: the limit is ${MAX_PLAN_BYTES / 1024 / 1024} MiB.`);

async function readForm(req: NextRequest): Promise<FormData> {
  const type = req.headers.get("content-type") ?? "";
  if (!/^multipart\/form-data\b/i.test(type)) throw new ApiError(415, "Send the plan as multipart/form-data with a field named file.");
  const bytes = await readBodyLimited(req, MAX_FORM_BYTES, tooLarge);
  try {
    return await new Response(bytes as BodyInit, { headers: { "content-type": type } }).formData();
  } catch {
    throw new ApiError(400, "The upload form could not be read (malformed multipart/form-data).");
  }
}

// PUT /api/sites/:siteId/floors/:floorId/plan — upload or replace the floor's plan (PNG or JPEG by its bytes, at most 20 MiB); 201 when new, 200 when replaced (placed devices kept)
export const PUT = route({ permission: "schedule:write", params }, async ({ actor, params, req }) => {
  const form = await readForm(req);
  const file = form.get("file");
  if (!(file instanceof File)) throw new ApiError(422, "Some fields are not valid.", [{ path: "file", message: "attach the plan in a field named file" }]);
  const r = await uploadPlan(actor, params.siteId, params.floorId, { fileName: file.name, bytes: new Uint8Array(await file.arrayBuffer()) });
  return NextResponse.json(r, { status: r.replaced ? 200 : 201 });
});
