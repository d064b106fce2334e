import { NextResponse, type NextRequest } from "next/server";
import { z } from "zod";
import { ApiError } from "@/lib/server/errors";
import { idParam, readBodyLimited, route, zodIssues } from "@/lib/server/route";
import { uploadPhoto } from "@/lib/server/commissioning";
import { photoFieldsSchema } from "@/lib/commissioning/commissioning-schema";
import { MAX_PHOTO_BYTES } from "@/lib/commissioning/photo-checks";

const params = z.object({ layoutId: idParam });
// The photo plus the form's few text fields and multipart framing.
const MAX_FORM_BYTES = MAX_PHOTO_BYTES + 64 * 1024;
const tooLarge = () => new ApiError(413, `The photo is too large: the limit is ${MAX_PHOTO_BYTES / 1024 / 1024} MiB.`);

async function readForm(req: NextRequest): Promise<FormData> {
  const type = req.headers.get("content-type") ?? "";
  if (!/^multipart\/form-data\b/i.test(type)) throw new ApiError(415, "Send the photo as multipart/form-data with a field named file.");
  // read as a stream and cut off at the limit: a chunked upload declares no length
  const bytes = await readBodyLimited(req, MAX_FORM_BYTES, tooLarge);
  try {
    return await new Response(bytes as BodyInit, { headers: { "content-type": type } }).formData();
  } catch {
    throw new ApiError(400, "The upload form could not be read (malformed multipart/form-data).");
  }
}

// POST /api/layouts/:layoutId/photos — a photo of the terminations (JPEG, PNG or WebP by its bytes, at most 8 MiB), for a loop (boardKey and input) or the whole layout; 201 (200 when the clientId was seen before)
export const POST = route({ permission: "commissioning:record", params }, async ({ actor, params, req }) => {
  const form = await readForm(req);
  const file = form.get("file");
  if (!(file instanceof File)) throw new ApiError(422, "Some fields are not valid.", [{ path: "file", message: "attach the photo in a field named file" }]);
  const text = (k: string) => {
    const v = form.get(k);
    return typeof v === "string" && v !== "" ? v : undefined;
  };
  const fields = photoFieldsSchema.safeParse({ boardKey: text("boardKey"), input: text("input"), clientId: text("clientId") });
  if (!fields.success) throw new ApiError(422, "Some fields are not valid.", zodIssues(fields.error));
  const r = await uploadPhoto(actor, params.layoutId, { fileName: file.name, bytes: new Uint8Array(await file.arrayBuffer()) }, fields.data);
  return NextResponse.json(r, { status: r.created ? 201 : 200 });
});
