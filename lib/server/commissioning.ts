import "server-only";
import { makeFormat } from "@/lib/format/format";
import { randomUUID } from "node:crypto";
import { UniqueConstraintError, type Transaction } from "sequelize";
import { db } from "./db";
import { audit } from "./audit";
import { ApiError, conflict, notFound } from "./errors";
import { ensureCan } from "./schedules";
import { findLayoutForReview, loadRevision, sheetMetaOf, fileStem, type LayoutRef } from "./sheets";
import { storage as defaultStorage, type Storage } from "./storage";
import type { Actor } from "./session";
import { CommissioningPhoto, CommissioningReading, User } from "@/models";
import type { RecordReadingParsed, PhotoFields } from "@/lib/commissioning/commissioning-schema";
import { diagnoseLoopOf, diagnoseReading, usualValuesOf, type MeasuredReading, type ReadingVerdict } from "@/lib/commissioning/diagnose";
import { checkPhotoUpload } from "@/lib/commissioning/photo-checks";
import { adviceOf } from "@/lib/commissioning/advice";
import { commissioningProgress, type CommissioningProgressReport, type RecordedReading } from "@/lib/commissioning/progress";
import type { EffectiveReview } from "@/lib/review/effective-state";
import { buildTerminalSheet } from "@/lib/sheet/build-sheet";
import type { SheetInput, TerminalSheet, TestKey } from "@/lib/sheet/sheet-types";
import type { ReportPhoto } from "@/lib/server/pdf/commissioning-report-pdf";
import { commissioningReportPdfOffLoop } from "@/lib/server/workers/off-loop";
import type { PageSize } from "@/lib/server/pdf/pdf-kit";
import { paperOf } from "@/lib/sheet/sheet-request-schema";

// Commissioning of a layout's approved revision: meter readings judged against the terminal sheet (stored once
// per client id, so a retry after a lost answer stores nothing twice), photos in object storage, progress, the record.

export interface ReadingView extends RecordedReading {
  id: number;
  revision: number;
  diagnosisCodes: string[];
}

export interface PhotoView {
  id: number;
  revision: number;
  boardKey: string | null;
  input: number | null;
  fileName: string;
  contentType: string;
  sizeBytes: number;
  uploadedBy: string | null;
  createdAt: string;
}

function readingView(r: CommissioningReading & { recorder?: User | null }): ReadingView {
  return {
    id: r.id,
    revision: r.revision,
    boardKey: r.boardKey,
    input: r.input,
    test: r.testState as TestKey,
    reading: r.isOpen ? { kind: "open" } : { kind: "ohms", ohms: Number(r.measuredOhms) },
    verdict: r.verdict,
    diagnosis: r.diagnosis,
    diagnosisCodes: r.diagnosisCodes ?? [],
    recordedBy: r.recorder?.name ?? null,
    recordedAt: r.createdAt.toISOString(),
  };
}

const photoView = (p: CommissioningPhoto & { uploader?: User | null }): PhotoView => ({
  id: p.id,
  revision: p.revision,
  boardKey: p.boardKey,
  input: p.input,
  fileName: p.fileName,
  contentType: p.contentType,
  sizeBytes: p.sizeBytes,
  uploadedBy: p.uploader?.name ?? null,
  createdAt: p.createdAt.toISOString(),
});

/** The revision being commissioned: the approved one. */
function commissioningRevision(review: EffectiveReview): number | null {
  return review.approvedRevision;
}

async function sheetOf(actor: Actor, ref: LayoutRef, revision: number, transaction?: Transaction): Promise<{ sheet: TerminalSheet; ctx: Awaited<ReturnType<typeof loadRevision>> }> {
  const ctx = await loadRevision(actor, ref, revision, transaction);
  return { sheet: buildTerminalSheet(ctx.document, ctx.schedule, ctx.catalog), ctx };
}

async function readingsOf(layoutId: number, revision: number, transaction?: Transaction): Promise<ReadingView[]> {
  const rows = await CommissioningReading.findAll({ where: { layoutId, revision }, include: [{ model: User, as: "recorder", attributes: ["name"] }], order: [["id", "ASC"]], transaction });
  return rows.map(readingView);
}

/** Progress on the approved revision (every loop untested when there is none). */
export async function progressOf(actor: Actor, ref: LayoutRef, transaction?: Transaction): Promise<CommissioningProgressReport> {
  const rev = commissioningRevision(ref.review);
  if (rev === null) return { loops: [], totals: { loops: 0, passed: 0, failed: 0, incomplete: 0, untested: 0, cannotTest: 0 }, readingsIgnored: 0 };
  const { sheet } = await sheetOf(actor, ref, rev, transaction);
  return commissioningProgress(sheet, await readingsOf(ref.layout.id, rev, transaction));
}

function assertRecordable(ref: LayoutRef): number {
  const rev = commissioningRevision(ref.review);
  if (rev === null) throw new ApiError(409, "Only an approved layout is commissioned: this one has no approved revision yet.");
  if (ref.review.commissionedRevision === rev) throw new ApiError(409, `Revision ${rev} is already commissioned; its record is closed.`);
  return rev;
}

export interface RecordResult {
  reading: ReadingView;
  verdict: ReadingVerdict;
  /** False when the same client id was stored before: the earlier reading is returned unchanged. */
  created: boolean;
}

function verdictOfStored(r: ReadingView, row: SheetInput | undefined): ReadingVerdict {
  if (!row) return { test: r.test, verdict: r.verdict, readingText: "", expectedText: "", matches: [], diagnoses: [], summary: r.diagnosis ?? "" };
  return diagnoseReading(diagnoseLoopOf(row), r.test, r.reading);
}

/** Record one meter reading on the approved revision; judged against its terminal sheet. */
export async function recordReading(actor: Actor, layoutId: number, input: RecordReadingParsed): Promise<RecordResult> {
  ensureCan(actor, "commissioning:record");
  const existing = await CommissioningReading.findOne({ where: { clientId: input.clientId }, include: [{ model: User, as: "recorder", attributes: ["name"] }] });
  if (existing) return replay(actor, layoutId, existing);
  try {
    return await db().transaction(async (transaction) => {
      const ref = await findLayoutForReview(actor, layoutId, transaction);
      const rev = assertRecordable(ref);
      const { sheet, ctx } = await sheetOf(actor, ref, rev, transaction);
      const row = sheet.boards.flatMap((b) => b.rows).find((r): r is SheetInput => !r.spare && r.boardKey === input.boardKey && r.input === input.input);
      if (!row) throw new ApiError(422, `Input ${input.input} of ${input.boardKey} is not a used input of revision ${rev}.`, [{ path: "input", message: "not on the terminal sheet" }]);
      if (!row.expected.some((e) => e.test === input.test))
        throw new ApiError(422, `This loop has no "${input.test}" test; its tests are: ${row.expected.map((e) => e.test).join(", ") || "none (it cannot be analysed)"}.`, [{ path: "test", message: "not a test of this loop" }]);
      const verdict = diagnoseReading(diagnoseLoopOf(row), input.test, input.reading, { usualValues: usualValuesOf(ctx.catalog) });
      const reading: MeasuredReading = input.reading;
      const saved = await CommissioningReading.create(
        {
          layoutId,
          revision: rev,
          boardKey: input.boardKey,
          input: input.input,
          testState: input.test,
          measuredOhms: reading.kind === "ohms" ? reading.ohms : null,
          isOpen: reading.kind === "open",
          verdict: verdict.verdict,
          diagnosis: verdict.verdict === "pass" ? null : verdict.diagnoses.map((d) => d.text).join(" "),
          diagnosisCodes: verdict.diagnoses.map((d) => d.code),
          recordedBy: actor.userId,
          clientId: input.clientId,
        },
        { transaction },
      );
      await audit(
        { organisationId: actor.organisationId, userId: actor.userId, action: "commissioning.reading", entityType: "layout", entityId: layoutId, detail: { readingId: saved.id, revision: rev, boardKey: input.boardKey, input: input.input, test: input.test, verdict: verdict.verdict } },
        transaction,
      );
      const full = await CommissioningReading.findByPk(saved.id, { include: [{ model: User, as: "recorder", attributes: ["name"] }], transaction });
      return { reading: readingView(full!), verdict, created: true };
    });
  } catch (e) {
    // Two tries of one reading raced: the other one stored it.
    if (e instanceof UniqueConstraintError) {
      const again = await CommissioningReading.findOne({ where: { clientId: input.clientId }, include: [{ model: User, as: "recorder", attributes: ["name"] }] });
      if (again) return replay(actor, layoutId, again);
    }
    throw e;
  }
}

async function replay(actor: Actor, layoutId: number, existing: CommissioningReading): Promise<RecordResult> {
  // Another organisation's client id reads as "already used", never as that organisation's reading.
  if (existing.layoutId !== layoutId) throw conflict("That client id belongs to another reading; make a new one for each reading.");
  const ref = await findLayoutForReview(actor, layoutId);
  const view = readingView(existing);
  const { sheet } = await sheetOf(actor, ref, existing.revision);
  const row = sheet.boards.flatMap((b) => b.rows).find((r): r is SheetInput => !r.spare && r.boardKey === existing.boardKey && r.input === existing.input);
  return { reading: view, verdict: verdictOfStored(view, row), created: false };
}

export interface CommissioningView {
  layoutId: number;
  review: EffectiveReview;
  /** The approved revision being commissioned, or null. */
  revision: number | null;
  progress: CommissioningProgressReport;
  readings: ReadingView[];
  photos: PhotoView[];
}

export async function getCommissioning(actor: Actor, layoutId: number): Promise<CommissioningView> {
  ensureCan(actor, "sheet:read");
  const ref = await findLayoutForReview(actor, layoutId);
  const rev = commissioningRevision(ref.review);
  if (rev === null) return { layoutId, review: ref.review, revision: null, progress: await progressOf(actor, ref), readings: [], photos: [] };
  const [progress, readings, photos] = await Promise.all([
    progressOf(actor, ref),
    readingsOf(layoutId, rev),
    CommissioningPhoto.findAll({ where: { layoutId, revision: rev }, include: [{ model: User, as: "uploader", attributes: ["name"] }], order: [["id", "ASC"]] }),
  ]);
  return { layoutId, review: ref.review, revision: rev, progress, readings, photos: photos.map(photoView) };
}

const EXT: Record<string, string> = { "image/jpeg": "jpg", "image/png": "png", "image/webp": "webp" };

/** Check, store in the bucket, then record; a failed record removes the stored object again. */
export async function uploadPhoto(actor: Actor, layoutId: number, file: { fileName: string; bytes: Uint8Array }, fields: PhotoFields = {}, store: Storage = defaultStorage()): Promise<{ photo: PhotoView; created: boolean }> {
  ensureCan(actor, "commissioning:record");
  if (fields.clientId) {
    const prior = await CommissioningPhoto.findOne({ where: { clientId: fields.clientId }, include: [{ model: User, as: "uploader", attributes: ["name"] }] });
    if (prior) {
      if (prior.layoutId !== layoutId) throw conflict("That client id belongs to another photo.");
      await findLayoutForReview(actor, layoutId);
      return { photo: photoView(prior), created: false };
    }
  }
  const check = checkPhotoUpload(file);
  if (!check.ok) throw new ApiError(check.status, check.reason);
  const ref = await findLayoutForReview(actor, layoutId);
  const rev = assertRecordable(ref);
  if ((fields.boardKey === undefined) !== (fields.input === undefined)) throw new ApiError(422, "Give both the board and the input a photo shows, or neither.");
  const key = `org-${actor.organisationId}/layout-${layoutId}/rev-${rev}/${randomUUID()}.${EXT[check.contentType]}`;
  await store.putObject(key, file.bytes, check.contentType);
  try {
    const id = await db().transaction(async (transaction) => {
      await findLayoutForReview(actor, layoutId, transaction);
      const p = await CommissioningPhoto.create(
        { layoutId, revision: rev, boardKey: fields.boardKey ?? null, input: fields.input ?? null, s3Key: key, fileName: check.fileName, contentType: check.contentType, sizeBytes: check.size, uploadedBy: actor.userId, clientId: fields.clientId ?? null },
        { transaction },
      );
      await audit({ organisationId: actor.organisationId, userId: actor.userId, action: "commissioning.photo", entityType: "layout", entityId: layoutId, detail: { photoId: p.id, revision: rev, fileName: check.fileName, sizeBytes: check.size } }, transaction);
      return p.id;
    });
    const p = await CommissioningPhoto.findByPk(id, { include: [{ model: User, as: "uploader", attributes: ["name"] }] });
    return { photo: photoView(p!), created: true };
  } catch (e) {
    await store.deleteObject(key).catch(() => undefined);
    if (e instanceof UniqueConstraintError && fields.clientId) {
      const prior = await CommissioningPhoto.findOne({ where: { clientId: fields.clientId }, include: [{ model: User, as: "uploader", attributes: ["name"] }] });
      if (prior && prior.layoutId === layoutId) return { photo: photoView(prior), created: false };
    }
    throw e;
  }
}

export async function getPhoto(actor: Actor, layoutId: number, photoId: number, store: Storage = defaultStorage()): Promise<{ body: Buffer; contentType: string; fileName: string }> {
  ensureCan(actor, "sheet:read");
  await findLayoutForReview(actor, layoutId);
  const p = await CommissioningPhoto.findOne({ where: { id: photoId, layoutId } });
  if (!p) throw notFound("That photo");
  const obj = await store.getObject(p.s3Key);
  if (!obj) throw notFound("That photo's file");
  return { body: obj.body, contentType: p.contentType, fileName: p.fileName };
}

export async function commissioningReportPdfFor(actor: Actor, layoutId: number, requested?: PageSize): Promise<{ pdf: Buffer; fileName: string }> {
  const size = requested ?? paperOf(actor.settings);
  ensureCan(actor, "sheet:read");
  const ref = await findLayoutForReview(actor, layoutId);
  const rev = commissioningRevision(ref.review);
  if (rev === null) throw new ApiError(409, "There is no commissioning record: the layout has no approved revision yet.");
  const { sheet, ctx } = await sheetOf(actor, ref, rev);
  const [readings, photos] = await Promise.all([readingsOf(layoutId, rev), CommissioningPhoto.findAll({ where: { layoutId, revision: rev }, include: [{ model: User, as: "uploader", attributes: ["name"] }], order: [["id", "ASC"]] })]);
  const fmt = makeFormat(actor.settings);
  const reportPhotos: ReportPhoto[] = photos.map((p) => {
    const v = photoView(p);
    return { boardKey: v.boardKey ?? "", input: v.input, fileName: v.fileName, sizeBytes: v.sizeBytes, takenBy: v.uploadedBy, takenAt: fmt.dateTime(v.createdAt) };
  });
  const rows = sheet.boards.flatMap((b) => b.rows).filter((r): r is SheetInput => !r.spare);
  const usualValues = usualValuesOf(ctx.catalog);
  const advised = readings.map((r) => {
    const row = rows.find((x) => x.boardKey === r.boardKey && x.input === r.input);
    return row && row.expected.some((e) => e.test === r.test) ? { ...r, advice: adviceOf(diagnoseReading(diagnoseLoopOf(row), r.test, r.reading, { usualValues })) } : r;
  });
  const pdf = await commissioningReportPdfOffLoop(commissioningProgress(sheet, advised), { ...sheetMetaOf(ctx, actor.settings), caution: sheet.caution }, reportPhotos, size);
  return { pdf, fileName: `${fileStem("commissioning", ctx.site.name, ctx.layout.name, `rev-${rev}`)}.pdf` };
}
