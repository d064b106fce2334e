import { NextResponse } from "next/server";
import { route } from "@/lib/server/route";
import { listUploads, previewUpload, readCatalogUploadForm, refusedFile, storeUpload } from "@/lib/server/catalogs";
import { uploadQuerySchema } from "@/lib/catalog/upload-schema";

// GET /api/catalog/uploads — the stored versions of the organisation's catalog file, newest first
export const GET = route({ permission: "catalog:read" }, async ({ actor }) => ({ uploads: await listUploads(actor.organisationId) }));

// POST /api/catalog/uploads — multipart file: mode=preview (or ?preview=1) shows the diff, mode=store keeps it as the next version (422 with errors for a bad file, 409 on a stale preview)
export const POST = route({ permission: "catalog:upload", query: uploadQuerySchema }, async ({ actor, req, query }) => {
  const form = await readCatalogUploadForm(req, query);
  if (form.mode === "preview") {
    const preview = await previewUpload(actor.organisationId, form.file);
    if (!preview.ok) throw refusedFile(preview.errors, preview.fileName);
    return { mode: "preview", preview };
  }
  const stored = await storeUpload(actor, form.file, { baseVersion: form.baseVersion });
  return NextResponse.json({ mode: "store", ...stored }, { status: 201 });
});
