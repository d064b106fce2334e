import "server-only";
import { createHash } from "node:crypto";
import type { Transaction } from "sequelize";
import { bindModels, db } from "./db";
import { audit } from "./audit";
import { ApiError, conflict, notFound } from "./errors";
import type { Actor } from "./session";
import { Organisation, OrganisationCatalog, User } from "@/models";
import { shippedCatalog } from "@/lib/catalog/shipped";
import { catalogDiff, effectiveCatalog, findEntry, parseCatalogFile, type CatalogDiff, type CatalogError, type EntryKey, type FoundEntry, type LoadedCatalog } from "@/lib/catalog/loader";
import type { Catalog } from "@/lib/catalog/schema";
import { catalogUploadFormSchema, MAX_UPLOAD_BYTES, type UploadMode } from "@/lib/catalog/upload-schema";
import { plural } from "@/lib/vocabulary/plural";

// An organisation's catalog: the shipped catalog plus the organisation's latest uploaded file
// (lib/catalog/loader.ts effectiveCatalog). Every uploaded version is kept; the latest is in use.

/** Room for the multipart envelope (boundaries, part headers, the mode field) around the file. */
const MAX_FORM_BYTES = MAX_UPLOAD_BYTES + 16 * 1024;

// ---------------------------------------------------------------------------------------------
// The uploaded file: name, type and content checks before the YAML loader sees it.

/** An uploaded file that passed the content checks: YAML text, a clean name, its size and SHA-256. */
export interface UploadFile {
  fileName: string;
  /** Decoded UTF-8 text (a leading byte-order mark dropped); what is stored and downloaded. */
  text: string;
  sizeBytes: number;
  /** SHA-256 of `text` as UTF-8, hex. */
  sha256: string;
}

const yamlTypes = new Set(["text/yaml", "application/yaml", "application/x-yaml", "text/x-yaml"]);
// Browsers send these (or nothing) for a .yaml file on systems that do not know the type.
const genericTypes = new Set(["text/plain", "application/octet-stream", ""]);

/** Leading bytes of common binary formats, to refuse them with a plain name rather than a YAML error. */
const magicNumbers: { bytes: number[]; what: string }[] = [
  { bytes: [0x50, 0x4b, 0x03, 0x04], what: "a ZIP archive (or an office document)" },
  { bytes: [0x50, 0x4b, 0x05, 0x06], what: "a ZIP archive" },
  { bytes: [0x50, 0x4b, 0x07, 0x08], what: "a ZIP archive" },
  { bytes: [0x25, 0x50, 0x44, 0x46], what: "a PDF document" },
  { bytes: [0x89, 0x50, 0x4e, 0x47], what: "a PNG image" },
  { bytes: [0xff, 0xd8, 0xff], what: "a JPEG image" },
  { bytes: [0x47, 0x49, 0x46, 0x38], what: "a GIF image" },
  { bytes: [0x1f, 0x8b], what: "a gzip archive" },
  { bytes: [0x37, 0x7a, 0xbc, 0xaf, 0x27, 0x1c], what: "a 7-Zip archive" },
  { bytes: [0x7f, 0x45, 0x4c, 0x46], what: "a program (ELF)" },
];

const startsWith = (data: Uint8Array, prefix: number[]) => data.length >= prefix.length && prefix.every((b, i) => data[i] === b);

/**
 * The file's own name without any directory part (a client may send `../../x.yaml`, `/etc/x.yaml` or
 * `C:\fakepath\x.yaml`); refused unless what is left is a plain `.yaml`/`.yml` name. The name is only
 * shown and offered back on download, never used as a path, but it is kept clean for both.
 */
export function cleanFileName(raw: string): string {
  const base = raw.split(/[/\\]/).pop()?.trim() ?? "";
  if (!base) throw new ApiError(422, "The file has no name.", [{ path: "file", message: "the file name is empty" }]);
  if (/[\u0000-\u001f\u007f]/.test(base)) throw new ApiError(422, "The file name contains control characters.", [{ path: "file", message: "the file name contains control characters" }]);
  if (!/\.ya?ml$/i.test(base)) throw new ApiError(415, `"${base.slice(0, 120)}" is not a YAML file: the name must end in .yaml or .yml.`);
  if (base.length > 120 || !/^[\p{L}\p{N}][\p{L}\p{N} ._()+-]*$/u.test(base))
    throw new ApiError(422, "Rename the file to letters, digits, spaces, dots, dashes and underscores (at most 120 characters), ending in .yaml.", [
      { path: "file", message: "the file name has characters that are not allowed" },
    ]);
  return base;
}

/** Checks an uploaded file's name, declared type, size and bytes; refuses anything that is not YAML text. */
export function checkUploadFile(input: { name: string; type: string; bytes: Uint8Array }): UploadFile {
  const fileName = cleanFileName(input.name);
  const mediaType = input.type.split(";")[0].trim().toLowerCase();
  const charset = /;\s*charset="?([^";]+)"?/i.exec(input.type)?.[1]?.toLowerCase();
  if (!yamlTypes.has(mediaType) && !genericTypes.has(mediaType))
    throw new ApiError(415, `The file was sent as ${mediaType}; a catalog file is YAML text (text/yaml, application/yaml or text/plain).`);
  if (charset && !["utf-8", "utf8", "us-ascii"].includes(charset)) throw new ApiError(415, `The file is declared as ${charset}; save it as UTF-8 text.`);
  const { bytes } = input;
  if (bytes.length > MAX_UPLOAD_BYTES) throw tooLarge();
  const magic = magicNumbers.find((m) => startsWith(bytes, m.bytes));
  if (magic) throw new ApiError(415, `The file is ${magic.what}, not YAML text. Upload the .yaml file itself.`);
  const nul = bytes.indexOf(0);
  if (nul >= 0) throw new ApiError(415, `The file contains a NUL byte (at byte ${nul + 1}), so it is not a text file. Save it as UTF-8 text.`);
  let text: string;
  try {
    text = new TextDecoder("utf-8", { fatal: true }).decode(bytes); // drops a leading byte-order mark
  } catch {
    throw new ApiError(415, "The file is not valid UTF-8 text. Save it as UTF-8.");
  }
  return { fileName, text, sizeBytes: bytes.length, sha256: sha256Hex(text) };
}

const sha256Hex = (text: string) => createHash("sha256").update(text, "utf8").digest("hex");
const tooLarge = () => new ApiError(413, `The file is too large: a catalog file may be at most ${MAX_UPLOAD_BYTES / 1024} KiB.`);

export type CatalogUploadForm = { mode: UploadMode; baseVersion?: number; file: UploadFile };

/** Reads at most `limit` bytes of a request body; 413 beyond. */
async function readBody(req: Request, limit: number): Promise<Uint8Array> {
  const declared = Number(req.headers.get("content-length") ?? 0);
  if (declared > limit) throw tooLarge();
  if (!req.body) return new Uint8Array();
  const reader = req.body.getReader();
  const chunks: Uint8Array[] = [];
  let total = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    total += value.length;
    if (total > limit) {
      await reader.cancel();
      throw tooLarge();
    }
    chunks.push(value);
  }
  const out = new Uint8Array(total);
  let at = 0;
  for (const c of chunks) {
    out.set(c, at);
    at += c.length;
  }
  return out;
}

/**
 * Parses the multipart upload form (the shared route helper only reads JSON bodies): the body size is
 * capped before parsing, the fields go through `catalogUploadFormSchema`, the file through `checkUploadFile`.
 * `?preview=1` in the query asks for a preview whatever the form says.
 */
export async function readCatalogUploadForm(req: Request, query: { preview?: string } = {}): Promise<CatalogUploadForm> {
  const type = req.headers.get("content-type") ?? "";
  if (!/^multipart\/form-data\b/i.test(type)) throw new ApiError(415, "Send the catalog file as multipart/form-data with a field named file.");
  const bytes = await readBody(req, MAX_FORM_BYTES);
  let form: FormData;
  try {
    form = await new Response(bytes as BodyInit, { headers: { "content-type": type } }).formData();
  } catch {
    throw new ApiError(400, "The upload form could not be read (malformed multipart/form-data).");
  }
  const parsed = catalogUploadFormSchema.safeParse({ mode: form.get("mode") ?? undefined, baseVersion: form.get("baseVersion") || undefined, file: form.get("file") ?? undefined });
  if (!parsed.success)
    throw new ApiError(
      422,
      "Some fields are not valid.",
      parsed.error.issues.map((i) => ({ path: i.path.map(String).join(".") || "(form)", message: i.message })),
    );
  const { file, baseVersion } = parsed.data;
  if (file.size > MAX_UPLOAD_BYTES) throw tooLarge();
  const checked = checkUploadFile({ name: file.name, type: file.type, bytes: new Uint8Array(await file.arrayBuffer()) });
  const mode = query.preview === "1" || query.preview === "true" ? "preview" : parsed.data.mode;
  return { mode, baseVersion, file: checked };
}

// ---------------------------------------------------------------------------------------------
// Versions in the database.

export interface CatalogUpload {
  id: number;
  version: number;
  fileName: string;
  sizeBytes: number;
  sha256: string;
  uploadedBy: { userId: number; name: string } | null;
  /** ISO 8601, UTC. */
  createdAt: string;
}

async function describeUploads(rows: OrganisationCatalog[]): Promise<CatalogUpload[]> {
  const ids = [...new Set(rows.map((r) => r.uploadedBy).filter((x): x is number => x != null))];
  const names = new Map(ids.length ? (await User.findAll({ where: { id: ids }, attributes: ["id", "name"] })).map((u) => [u.id, u.name]) : []);
  return rows.map((r) => ({
    id: r.id,
    version: r.version,
    fileName: r.fileName,
    sizeBytes: r.sizeBytes,
    sha256: r.sha256,
    uploadedBy: r.uploadedBy != null ? { userId: r.uploadedBy, name: names.get(r.uploadedBy) ?? "a former member" } : null,
    createdAt: r.createdAt.toISOString(),
  }));
}

const summaryAttributes = ["id", "organisationId", "version", "fileName", "sizeBytes", "sha256", "uploadedBy", "createdAt"];

/** Every stored version of the organisation's catalog file, newest first (without the text). */
export async function listUploads(organisationId: number): Promise<CatalogUpload[]> {
  bindModels();
  const rows = await OrganisationCatalog.findAll({ where: { organisationId }, attributes: summaryAttributes, order: [["version", "DESC"]] });
  return describeUploads(rows);
}

/** The text of one stored version; 404 for another organisation's version, indistinguishable from a missing one. */
export async function uploadText(organisationId: number, uploadId: number): Promise<{ fileName: string; version: number; text: string; sha256: string }> {
  bindModels();
  const row = await OrganisationCatalog.findOne({ where: { id: uploadId, organisationId } });
  if (!row) throw notFound("That catalog version");
  return { fileName: row.fileName, version: row.version, text: row.yamlText, sha256: row.sha256 };
}

// ---------------------------------------------------------------------------------------------
// The effective catalog.

/** The catalog in use for an organisation, and where its entries come from. */
export interface EffectiveCatalogInfo {
  catalog: Catalog;
  /** The stored version in use; null when the organisation has uploaded nothing (or its latest no longer validates). */
  upload: CatalogUpload | null;
  /** Entries the upload adds, and shipped entries it replaces. */
  added: EntryKey[];
  overridden: EntryKey[];
  /**
   * The latest version no longer validates together with the shipped catalog (the shipped files changed
   * since it was stored). The shipped catalog alone is in use until a corrected file is uploaded.
   */
  problem: { version: number; errors: CatalogError[] } | null;
}

interface CacheEntry {
  key: string;
  shipped: Catalog;
  info: EffectiveCatalogInfo;
}

// Parsed results per organisation, keyed by the latest version's id and SHA-256. This cache lives in
// one server process: every call still reads the latest version's id and hash (one indexed row), so a
// version stored by any instance is picked up on the next call; only the parse is saved.
const effectiveCache = new Map<number, CacheEntry>();
const MAX_CACHED_ORGANISATIONS = 500;

function parseAgainstShipped(shipped: LoadedCatalog, fileName: string, text: string) {
  const parsed = parseCatalogFile(text, fileName);
  if (!parsed.ok) return { ok: false as const, errors: parsed.errors };
  return effectiveCatalog(shipped, parsed.source);
}

const shippedInfo = (shipped: LoadedCatalog, problem: EffectiveCatalogInfo["problem"] = null): EffectiveCatalogInfo => ({
  catalog: shipped.catalog,
  upload: null,
  added: [],
  overridden: [],
  problem,
});

/**
 * The effective catalog with its origins (for the catalog pages and the API). The returned objects are
 * shared between callers through the cache: treat them as read-only.
 */
export async function effectiveCatalogInfo(organisationId: number): Promise<EffectiveCatalogInfo> {
  bindModels();
  const shipped = shippedCatalog();
  const latest = await OrganisationCatalog.findOne({ where: { organisationId }, attributes: summaryAttributes, order: [["version", "DESC"]] });
  const key = latest ? `${latest.id}:${latest.sha256}` : "shipped";
  const hit = effectiveCache.get(organisationId);
  // the shipped catalog's own cache may be cleared (tests, a development server after editing the files)
  if (hit && hit.key === key && hit.shipped === shipped.catalog) return hit.info;

  let info: EffectiveCatalogInfo;
  if (!latest) info = shippedInfo(shipped);
  else {
    const row = await OrganisationCatalog.findByPk(latest.id, { attributes: ["id", "fileName", "yamlText"] });
    const result = parseAgainstShipped(shipped, latest.fileName, row?.yamlText ?? "");
    const [upload] = await describeUploads([latest]);
    info = result.ok
      ? { catalog: result.catalog, upload, added: result.added, overridden: result.overridden, problem: null }
      : shippedInfo(shipped, { version: latest.version, errors: result.errors });
  }
  effectiveCache.delete(organisationId);
  if (effectiveCache.size >= MAX_CACHED_ORGANISATIONS) effectiveCache.delete(effectiveCache.keys().next().value!);
  effectiveCache.set(organisationId, { key, shipped: shipped.catalog, info });
  return info;
}

/**
 * The catalog an organisation's designs use: shipped entries plus its latest uploaded file. For the
 * layout editor and solver. Shared between callers through a cache: treat it as read-only.
 */
export async function effectiveCatalogFor(organisationId: number): Promise<Catalog> {
  return (await effectiveCatalogInfo(organisationId)).catalog;
}

/** Where one entry of the effective catalog comes from. */
export type EntryOrigin = "shipped" | "added" | "overridden";

export function entryOrigin(info: EffectiveCatalogInfo, key: EntryKey): EntryOrigin {
  const same = (k: EntryKey) => k.kind === key.kind && k.id === key.id;
  return info.added.some(same) ? "added" : info.overridden.some(same) ? "overridden" : "shipped";
}

/** One entry of the organisation's effective catalog with its kind and origin; 404 if no entry has that id. */
export async function findCatalogEntry(organisationId: number, entryId: string): Promise<FoundEntry & { origin: EntryOrigin; upload: CatalogUpload | null }> {
  const info = await effectiveCatalogInfo(organisationId);
  const found = findEntry(info.catalog, entryId);
  if (!found) throw notFound("That catalog entry");
  const origin = entryOrigin(info, { kind: found.kind, id: found.entry.id });
  return { ...found, origin, upload: origin === "shipped" ? null : info.upload };
}

// ---------------------------------------------------------------------------------------------
// Preview and store.

export interface UploadPreview {
  ok: boolean;
  fileName: string;
  sizeBytes: number;
  sha256: string;
  /** The version the diff is against (0: the shipped catalog alone). Send it back when storing. */
  baseVersion: number;
  /** Refusals with file, line, column and field path; empty when ok. */
  errors: CatalogError[];
  /** Against the catalog the organisation has now; null when the file is refused. */
  diff: CatalogDiff | null;
  added: EntryKey[];
  overridden: EntryKey[];
  /** The stored version with the very same text, if any. */
  sameAsVersion: number | null;
}

async function latestVersion(organisationId: number, transaction?: Transaction): Promise<number> {
  const max = await OrganisationCatalog.max<number, OrganisationCatalog>("version", { where: { organisationId }, transaction });
  return typeof max === "number" && Number.isFinite(max) ? max : 0;
}

/** Validates a file as the organisation's next catalog and shows what would change. Stores nothing. */
export async function previewUpload(organisationId: number, file: UploadFile): Promise<UploadPreview> {
  const current = await effectiveCatalogInfo(organisationId);
  const baseVersion = await latestVersion(organisationId);
  const same = await OrganisationCatalog.findOne({ where: { organisationId, sha256: file.sha256 }, attributes: ["version"], order: [["version", "DESC"]] });
  const base = { fileName: file.fileName, sizeBytes: file.sizeBytes, sha256: file.sha256, baseVersion, sameAsVersion: same?.version ?? null };
  const result = parseAgainstShipped(shippedCatalog(), file.fileName, file.text);
  if (!result.ok) return { ...base, ok: false, errors: result.errors, diff: null, added: [], overridden: [] };
  return { ...base, ok: true, errors: [], diff: catalogDiff(current.catalog, result.catalog), added: result.added, overridden: result.overridden };
}

/** The refusal of a file that does not validate: 422 with the loader's errors. */
export function refusedFile(errors: CatalogError[], fileName: string): ApiError {
  const n = errors.length;
  return new ApiError(422, `${fileName} was refused: ${plural(n, "problem")} to fix. Nothing was stored.`, undefined, { errors });
}

const keyList = (keys: { kind: string; id: string }[]) => keys.slice(0, 50).map((k) => `${k.kind}:${k.id}`);

/**
 * Validates the file again and stores it as the organisation's next version, in one transaction: the
 * organisation's row is locked so that concurrent uploads get consecutive versions, and the audit entry
 * is written with it. A bad file stores nothing (422 with the errors). With `baseVersion` (from the
 * preview), refuses with 409 if another version was stored since, because the diff shown is then stale.
 */
export async function storeUpload(actor: Actor, file: UploadFile, opts: { baseVersion?: number } = {}): Promise<{ upload: CatalogUpload; diff: CatalogDiff }> {
  const sequelize = db();
  const shipped = shippedCatalog();
  const result = parseAgainstShipped(shipped, file.fileName, file.text);
  if (!result.ok) throw refusedFile(result.errors, file.fileName);

  const { row, diff } = await sequelize.transaction(async (transaction) => {
    const org = await Organisation.findByPk(actor.organisationId, { transaction, lock: transaction.LOCK.UPDATE, attributes: ["id"] });
    if (!org) throw notFound("That organisation");
    const current = await latestVersion(actor.organisationId, transaction);
    if (opts.baseVersion !== undefined && opts.baseVersion !== current)
      throw conflict(`Version ${current} of the catalog was stored after your preview (made against version ${opts.baseVersion}). Check the file again to see the changes against what is in use now.`, { currentVersion: current });
    // the diff against what was in use until now, read under the lock
    const prior = current ? await OrganisationCatalog.findOne({ where: { organisationId: actor.organisationId, version: current }, attributes: ["fileName", "yamlText"], transaction }) : null;
    const priorResult = prior ? parseAgainstShipped(shipped, prior.fileName, prior.yamlText) : null;
    const diff = catalogDiff(priorResult?.ok ? priorResult.catalog : shipped.catalog, result.catalog);
    const version = current + 1;
    const row = await OrganisationCatalog.create(
      { organisationId: actor.organisationId, version, fileName: file.fileName, yamlText: file.text, sizeBytes: file.sizeBytes, sha256: file.sha256, uploadedBy: actor.userId },
      { transaction },
    );
    await audit(
      {
        organisationId: actor.organisationId,
        userId: actor.userId,
        action: "catalog.upload",
        entityType: "organisation_catalog",
        entityId: row.id,
        detail: { version, fileName: file.fileName, sizeBytes: file.sizeBytes, sha256: file.sha256, added: keyList(diff.added), removed: keyList(diff.removed), changed: keyList(diff.changed) },
      },
      transaction,
    );
    return { row, diff };
  });
  const [upload] = await describeUploads([row]);
  return { upload, diff };
}
