import "server-only";
import { col, literal, Op, type Transaction } from "sequelize";
import { db } from "./db";
import { audit } from "./audit";
import { ApiError, conflict, notFound } from "./errors";
import { isWriteConflict } from "./db-errors";
import { findSite } from "./sites";
import { catalogFor, ensureCan, loadSchedule } from "./schedules";
import type { Actor } from "./session";
import { CommissioningPhoto, CommissioningReading, Layout, LayoutReview, LayoutRevision, Site, User } from "@/models";
import { isLifeSafety } from "@/lib/catalog/life-safety";
import type { Catalog } from "@/lib/catalog/schema";
import { boardEntry, indexCatalog } from "@/lib/layout/catalog-index";
import { boardName } from "@/lib/layout/names";
import { layoutDocumentSchema, type LayoutDocument, type SecurityGrade } from "@/lib/layout/schema";
import { standbyProfileForGrade } from "@/lib/solver/grade-rules";
import type { CreateLayoutInput, SaveLayoutInput, SuggestRequest } from "@/lib/layout/layout-request-schema";
import type { Schedule } from "@/lib/schedule/schema";
import { solveLayout } from "@/lib/solver";
import { solveLayoutKept } from "./solver-cache";
import type { ExactSuggestion } from "@/lib/solver/suggest-exact";
import { suggestOffLoop } from "@/lib/server/workers/off-loop";
import type { Severity } from "@/lib/findings";
import { summarizeSolve, type LayoutSolveSummary } from "@/lib/layout/layout-summary";
import { BOARD_KIND_WORDS } from "@/lib/vocabulary/words";

export type { LayoutSolveSummary };

// Layouts and their revisions. Every save is a new revision; the layout row carries a version for optimistic concurrency.

export interface LayoutMeta {
  id: number;
  siteId: number;
  name: string;
  status: string;
  version: number;
  currentRevision: number;
  createdAt: string;
  updatedAt: string;
  summary: LayoutSolveSummary;
  /** ISO time it was archived; archived layouts stay readable and are not changed. */
  archivedAt: string | null;
  /** It has an approved or commissioned revision: it is archived, never deleted. */
  hasApproval: boolean;
}

export interface LayoutView {
  layout: LayoutMeta;
  document: LayoutDocument;
}

export interface RevisionMeta {
  revision: number;
  note: string;
  createdAt: string;
  createdBy: string | null;
  summary: LayoutSolveSummary;
}

/** The server's solve of a document: the solver's findings plus the capacity rule the editor shows too. */
export function solveForSave(doc: LayoutDocument, schedule: Schedule, catalog: Catalog, layoutId?: number): LayoutSolveSummary {
  return summarizeSolve(doc, layoutId === undefined ? solveLayout(doc, schedule, catalog) : solveLayoutKept(layoutId, doc, schedule, catalog));
}

/** What in the document names things that are not in the catalog or the schedule (422 on save). */
export function referenceIssues(doc: LayoutDocument, schedule: Schedule, catalog: Catalog): { path: string; message: string }[] {
  const ix = indexCatalog(catalog);
  const issues: { path: string; message: string }[] = [];
  if (!ix.panels.has(doc.panelId)) issues.push({ path: "document.panelId", message: `control panel ${doc.panelId} is not in your organisation's catalog` });
  doc.boards.forEach((b, i) => {
    if (!boardEntry(ix, b.kind, b.catalogId)) issues.push({ path: `document.boards.${i}.catalogId`, message: `${boardName(doc, b.key)}: no ${BOARD_KIND_WORDS[b.kind]} ${b.catalogId} in the catalog` });
  });
  const ids = new Set(schedule.map((d) => d.id));
  doc.inputs.forEach((inp, i) =>
    inp.detectorIds.forEach((d, j) => {
      if (!ids.has(d)) issues.push({ path: `document.inputs.${i}.detectorIds.${j}`, message: `detector ${d} is not in this site's device schedule` });
    }),
  );
  doc.wireless?.forEach((w, i) =>
    w.detectorIds.forEach((d, j) => {
      if (!ids.has(d)) issues.push({ path: `document.wireless.${i}.detectorIds.${j}`, message: `detector ${d} is not in this site's device schedule` });
    }),
  );
  doc.zones?.forEach((z, i) => {
    if (!ids.has(z.detectorId)) issues.push({ path: `document.zones.${i}.detectorId`, message: `detector ${z.detectorId} is not in this site's device schedule` });
  });
  doc.outputDevices?.forEach((o, i) => {
    const known = o.kind === "sounder" ? ix.sounders.has(o.catalogId) : ix.strobes.has(o.catalogId);
    if (!known) issues.push({ path: `document.outputDevices.${i}.catalogId`, message: `${o.label}: no ${o.kind} ${o.catalogId} in the catalog` });
  });
  return issues;
}

function checkReferences(doc: LayoutDocument, schedule: Schedule, catalog: Catalog) {
  const issues = referenceIssues(doc, schedule, catalog);
  if (issues.length) throw new ApiError(422, "The layout refers to hardware or detectors that do not exist; it was not saved.", issues);
}

type LayoutWithCurrent = Layout & { current?: LayoutRevision; site?: Site; reviewRecord?: LayoutReview | null };

const hasApprovalOf = (r: LayoutReview | null | undefined) => !!r && (r.approvedRevision != null || r.commissionedRevision != null);

function meta(l: Layout, summary: LayoutSolveSummary, hasApproval = false): LayoutMeta {
  return {
    id: l.id,
    siteId: l.siteId,
    name: l.name,
    status: l.status,
    version: l.version,
    currentRevision: l.currentRevision,
    createdAt: l.createdAt.toISOString(),
    updatedAt: l.updatedAt.toISOString(),
    summary,
    archivedAt: l.archivedAt ? l.archivedAt.toISOString() : null,
    hasApproval,
  };
}

const ownSite = (actor: Actor) => ({ model: Site, as: "site", attributes: ["id", "name", "organisationId"], where: { organisationId: actor.organisationId }, required: true });
const currentRevision = (attributes?: string[]) => ({ model: LayoutRevision, as: "current", required: true, ...(attributes ? { attributes } : {}), where: { revision: { [Op.eq]: col("Layout.current_revision") } } });

/** One query: the layout (only if its site is the actor's organisation's) with its current revision. */
async function findLayoutWithCurrent(actor: Actor, layoutId: number, transaction?: Transaction): Promise<LayoutWithCurrent & { current: LayoutRevision; site: Site }> {
  const l = (await Layout.findOne({ where: { id: layoutId }, include: [ownSite(actor), currentRevision()], transaction })) as LayoutWithCurrent | null;
  if (!l || !l.current || !l.site) throw notFound("That layout");
  return l as LayoutWithCurrent & { current: LayoutRevision; site: Site };
}

async function findOwnLayout(actor: Actor, layoutId: number, transaction?: Transaction): Promise<Layout> {
  const l = await Layout.findOne({ where: { id: layoutId }, include: [ownSite(actor)], transaction });
  if (!l) throw notFound("That layout");
  return l;
}

/** The site's layouts, newest first, each with its current revision's summary (two queries). */
export async function listLayouts(actor: Actor, siteId: number): Promise<LayoutMeta[]> {
  await findSite(actor, siteId);
  const rows = (await Layout.findAll({
    where: { siteId },
    include: [currentRevision(["id", "revision", "summary"]), { model: LayoutReview, as: "reviewRecord", required: false, attributes: ["layoutId", "approvedRevision", "commissionedRevision"] }],
    order: [["updatedAt", "DESC"], ["id", "DESC"]],
  })) as LayoutWithCurrent[];
  return rows.map((l) => meta(l, l.current!.summary as LayoutSolveSummary, hasApprovalOf(l.reviewRecord)));
}

export async function getLayout(actor: Actor, layoutId: number): Promise<LayoutView> {
  const l = await findLayoutWithCurrent(actor, layoutId);
  return { layout: meta(l, l.current.summary as LayoutSolveSummary), document: l.current.document as LayoutDocument };
}

export interface EditorData extends LayoutView {
  site: { id: number; name: string };
  schedule: Schedule;
  catalog: Catalog;
}

/** Everything the editor needs, in a bounded number of queries: the layout with its site and current revision, the schedule, the catalog. */
export async function loadLayoutForEditor(actor: Actor, layoutId: number): Promise<EditorData> {
  const l = await findLayoutWithCurrent(actor, layoutId);
  const [schedule, catalog] = await Promise.all([loadSchedule(l.siteId), catalogFor(actor.organisationId)]);
  return {
    layout: meta(l, l.current.summary as LayoutSolveSummary),
    document: l.current.document as LayoutDocument,
    site: { id: l.site.id, name: l.site.name },
    schedule,
    catalog,
  };
}

/** A blank layout on a panel, with the standby profile the schedule calls for. */
/** A layout with nothing placed. With the site's grade, it carries that grade and an intruder system sizes its battery for it. */
export function blankDocument(panelId: string, schedule: Schedule, catalog: Catalog, grade: SecurityGrade | null = null): LayoutDocument {
  const ix = indexCatalog(catalog);
  const fire = schedule.some((d) => {
    const c = ix.detectors.get(d.catalogId);
    return !!c && isLifeSafety(c);
  });
  const power = fire ? { standbyProfileId: "nfpa72-fire", safetyFactor: 1.25 } : { standbyProfileId: grade ? standbyProfileForGrade(grade) : "intruder-grade-2", safetyFactor: 1.2 };
  return { panelId, boards: [], inputs: [], power, busCableM: 0, ...(grade ? { grade } : {}) };
}

async function insertLayout(actor: Actor, siteId: number, name: string, document: LayoutDocument, summary: LayoutSolveSummary, note: string, detail: Record<string, unknown>): Promise<LayoutMeta> {
  return db().transaction(async (transaction) => {
    const l = await Layout.create({ siteId, name, currentRevision: 1, version: 1, createdBy: actor.userId }, { transaction });
    await LayoutRevision.create({ layoutId: l.id, revision: 1, document, summary, note, createdBy: actor.userId }, { transaction });
    await audit({ organisationId: actor.organisationId, userId: actor.userId, action: "layout.create", entityType: "layout", entityId: l.id, detail: { siteId, name, ...detail, counts: summary.counts } }, transaction);
    return meta(l, summary);
  });
}

export async function createLayout(actor: Actor, siteId: number, input: CreateLayoutInput): Promise<LayoutView> {
  ensureCan(actor, "layout:write");
  const site = await findSite(actor, siteId);
  const grade = (site.securityGrade ?? null) as SecurityGrade | null;
  const [schedule, catalog] = await Promise.all([loadSchedule(siteId), catalogFor(actor.organisationId)]);
  let document: LayoutDocument;
  let from: string;
  if ("document" in input) {
    document = input.document;
    from = "document";
  } else if ("panelId" in input) {
    document = blankDocument(input.panelId, schedule, catalog, grade);
    from = "blank";
  } else {
    const s = await suggestOffLoop(schedule, catalog, { allowShared: input.suggestion.allowShared, busCableM: input.suggestion.busCableM, pathway: input.suggestion.pathway, choice: input.suggestion.choice });
    if (!s.found) throw new ApiError(422, `No suggestion: ${s.reason}`);
    document = grade ? { ...s.layout, grade } : s.layout;
    from = input.suggestion.allowShared ? "suggestion-shared" : "suggestion-single";
  }
  checkReferences(document, schedule, catalog);
  const summary = solveForSave(document, schedule, catalog);
  const layout = await insertLayout(actor, siteId, input.name, document, summary, input.note ?? "", { from });
  return { layout, document };
}

/**
 * Save a new revision. The version check and the increment are one UPDATE ... WHERE version = ?;
 * no row changed means someone saved in between: 409 with the current version.
 */
export async function saveLayout(actor: Actor, layoutId: number, input: SaveLayoutInput): Promise<{ layout: LayoutMeta }> {
  ensureCan(actor, "layout:write");
  const l = await findOwnLayout(actor, layoutId);
  assertNotArchived(l);
  const [schedule, catalog] = await Promise.all([loadSchedule(l.siteId), catalogFor(actor.organisationId)]);
  checkReferences(input.document, schedule, catalog);
  const summary = solveForSave(input.document, schedule, catalog, l.id);
  return writeRevision(actor, l, { expectVersion: input.version, document: input.document, summary, note: input.note ?? "", name: input.name, action: "layout.save" });
}

type RevisionWrite = { expectVersion: number; document: LayoutDocument; summary: LayoutSolveSummary; note: string; name?: string; action: string; detail?: Record<string, unknown> };

/**
 * A deadlock, or on a Galera cluster a certification conflict with a write made on another node (both 1213,
 * the transaction rolled back whole), is tried once more; a second one is a 409 with the current version,
 * never a 500. The retry re-checks the version, so a save that lost to another one is refused as stale.
 */
async function writeRevision(actor: Actor, l: Layout, w: RevisionWrite): Promise<{ layout: LayoutMeta }> {
  for (let attempt = 1; ; attempt++) {
    try {
      return await writeRevisionOnce(actor, l, w);
    } catch (e) {
      if (!isWriteConflict(e)) throw e;
      if (attempt === 2) break;
    }
  }
  const now = await Layout.findByPk(l.id, { attributes: ["id", "version"] });
  if (!now) throw notFound("That layout");
  throw conflict(`This layout was being saved by someone else at the same moment, so your save was not stored (it is now version ${now.version}). Reload and save again.`, {
    currentVersion: now.version,
    code: "write-conflict",
  });
}

async function writeRevisionOnce(actor: Actor, l: Layout, w: RevisionWrite): Promise<{ layout: LayoutMeta }> {
  return db().transaction(async (transaction) => {
    const [changed] = await Layout.update(
      { version: literal("version + 1") as unknown as number, currentRevision: literal("current_revision + 1") as unknown as number, ...(w.name ? { name: w.name } : {}) },
      { where: { id: l.id, version: w.expectVersion }, transaction },
    );
    if (changed === 0) {
      const now = await Layout.findByPk(l.id, { attributes: ["id", "version"], transaction });
      if (!now) throw notFound("That layout");
      throw conflict(`This layout was saved by someone else since you opened it (you had version ${w.expectVersion}, it is now version ${now.version}).`, { currentVersion: now.version });
    }
    const fresh = await Layout.findByPk(l.id, { transaction });
    if (!fresh) throw notFound("That layout");
    await LayoutRevision.create({ layoutId: l.id, revision: fresh.currentRevision, document: w.document, summary: w.summary, note: w.note, createdBy: actor.userId }, { transaction });
    await audit(
      { organisationId: actor.organisationId, userId: actor.userId, action: w.action, entityType: "layout", entityId: l.id, detail: { revision: fresh.currentRevision, version: fresh.version, counts: w.summary.counts, ...w.detail } },
      transaction,
    );
    return { layout: meta(fresh, w.summary) };
  });
}

export async function listRevisions(actor: Actor, layoutId: number): Promise<RevisionMeta[]> {
  await findOwnLayout(actor, layoutId);
  const rows = await LayoutRevision.findAll({
    where: { layoutId },
    attributes: ["revision", "note", "summary", "createdAt", "createdBy"],
    include: [{ model: User, as: "creator", attributes: ["name"] }],
    order: [["revision", "DESC"]],
  });
  return rows.map((r) => ({
    revision: r.revision,
    note: r.note,
    createdAt: r.createdAt.toISOString(),
    createdBy: (r as LayoutRevision & { creator?: User | null }).creator?.name ?? null,
    summary: r.summary as LayoutSolveSummary,
  }));
}

export async function getRevision(actor: Actor, layoutId: number, revision: number): Promise<{ revision: RevisionMeta; document: LayoutDocument }> {
  await findOwnLayout(actor, layoutId);
  const r = await LayoutRevision.findOne({ where: { layoutId, revision }, include: [{ model: User, as: "creator", attributes: ["name"] }] });
  if (!r) throw notFound("That revision");
  return {
    revision: { revision: r.revision, note: r.note, createdAt: r.createdAt.toISOString(), createdBy: (r as LayoutRevision & { creator?: User | null }).creator?.name ?? null, summary: r.summary as LayoutSolveSummary },
    document: r.document as LayoutDocument,
  };
}

/** Restore = a new revision holding the old document, checked and solved like any save. */
export async function restoreRevision(actor: Actor, layoutId: number, revision: number, expectVersion?: number): Promise<LayoutView> {
  ensureCan(actor, "layout:write");
  const l = await findOwnLayout(actor, layoutId);
  assertNotArchived(l);
  const old = await LayoutRevision.findOne({ where: { layoutId, revision }, attributes: ["document"] });
  if (!old) throw notFound("That revision");
  const document = layoutDocumentSchema.parse(old.document);
  const [schedule, catalog] = await Promise.all([loadSchedule(l.siteId), catalogFor(actor.organisationId)]);
  const issues = referenceIssues(document, schedule, catalog);
  if (issues.length) throw new ApiError(422, `Revision ${revision} refers to hardware or detectors that no longer exist, so it cannot be restored as it is.`, issues);
  const summary = solveForSave(document, schedule, catalog, l.id);
  const { layout } = await writeRevision(actor, l, { expectVersion: expectVersion ?? l.version, document, summary, note: `Restored revision ${revision}`, action: "layout.restore", detail: { restoredFrom: revision } });
  return { layout, document };
}

function assertNotArchived(l: Layout) {
  if (l.archivedAt) throw conflict(`“${l.name}” is archived: restore it from the site's layouts before changing it.`, { code: "archived" });
}

/**
 * Delete a layout that never had an approved revision and has no commissioning record. An approved or
 * commissioned layout, or one with readings or photos, is refused (409): archive it instead, so nothing recorded is lost.
 */
export async function deleteLayout(actor: Actor, layoutId: number): Promise<{ deleted: true }> {
  ensureCan(actor, "layout:write");
  await db().transaction(async (transaction) => {
    const l = await findOwnLayout(actor, layoutId, transaction);
    await Layout.findByPk(layoutId, { transaction, lock: transaction.LOCK.UPDATE, attributes: ["id"] });
    const review = await LayoutReview.findByPk(layoutId, { transaction, lock: transaction.LOCK.UPDATE });
    if (hasApprovalOf(review)) {
      const what = review!.commissionedRevision != null ? `commissioned (revision ${review!.commissionedRevision})` : `approved (revision ${review!.approvedRevision})`;
      throw conflict(`“${l.name}” is ${what}: an approved or commissioned layout is never deleted, so its terminal sheet and commissioning record stay. Archive it instead.`, { code: "approved-layout" });
    }
    const [readings, photos] = await Promise.all([CommissioningReading.count({ where: { layoutId }, transaction }), CommissioningPhoto.count({ where: { layoutId }, transaction })]);
    if (readings + photos > 0) throw conflict(`“${l.name}” has commissioning records (${readings} readings, ${photos} photos): it is never deleted. Archive it instead.`, { code: "has-records" });
    await LayoutRevision.destroy({ where: { layoutId }, transaction });
    await l.destroy({ transaction });
    await audit({ organisationId: actor.organisationId, userId: actor.userId, action: "layout.delete", entityType: "layout", entityId: layoutId, detail: { siteId: l.siteId, name: l.name, lastRevision: l.currentRevision } }, transaction);
  });
  return { deleted: true };
}

/**
 * A new draft revision from the current one, re-solved against the live schedule: what the designer does when
 * the schedule has changed since approval. Detectors deleted from the schedule leave their inputs.
 */
export async function redraftFromSchedule(actor: Actor, layoutId: number, expectVersion?: number): Promise<LayoutView & { dropped: string[] }> {
  ensureCan(actor, "layout:write");
  const l = await findLayoutWithCurrent(actor, layoutId);
  assertNotArchived(l);
  const review = await LayoutReview.findByPk(layoutId, { attributes: ["layoutId", "approvedRevision", "commissionedRevision"] });
  if (!hasApprovalOf(review)) throw conflict(`“${l.name}” has no approved revision: a draft already reads the live schedule.`, { code: "no-approval" });
  const [schedule, catalog] = await Promise.all([loadSchedule(l.siteId), catalogFor(actor.organisationId)]);
  const live = new Set(schedule.map((d) => d.id));
  const current = layoutDocumentSchema.parse(l.current.document);
  const dropped = current.inputs.flatMap((i) => i.detectorIds.filter((d) => !live.has(d)));
  const document: LayoutDocument = { ...current, inputs: current.inputs.map((i) => ({ ...i, detectorIds: i.detectorIds.filter((d) => live.has(d)) })).filter((i) => i.detectorIds.length > 0) };
  checkReferences(document, schedule, catalog);
  const summary = solveForSave(document, schedule, catalog);
  const note = `New draft from the schedule as it is now${dropped.length ? ` (${dropped.length} deleted detector${dropped.length === 1 ? "" : "s"} taken off their inputs)` : ""}`;
  const { layout } = await writeRevision(actor, l, { expectVersion: expectVersion ?? l.version, document, summary, note, action: "layout.redraft", detail: { from: l.currentRevision, dropped } });
  return { layout, document, dropped };
}

/** Archive a layout (it stays readable: its sheet, commissioning record and history), or bring it back. */
export async function setLayoutArchived(actor: Actor, layoutId: number, archived: boolean): Promise<{ layout: LayoutMeta }> {
  ensureCan(actor, "layout:write");
  await db().transaction(async (transaction) => {
    const l = await findOwnLayout(actor, layoutId, transaction);
    if (!!l.archivedAt === archived) return;
    await Layout.update({ archivedAt: archived ? new Date() : null, archivedBy: archived ? actor.userId : null }, { where: { id: layoutId }, transaction, silent: true });
    await audit({ organisationId: actor.organisationId, userId: actor.userId, action: archived ? "layout.archive" : "layout.unarchive", entityType: "layout", entityId: layoutId, detail: { siteId: l.siteId, name: l.name } }, transaction);
  });
  const l = (await Layout.findOne({ where: { id: layoutId }, include: [currentRevision(["id", "revision", "summary"]), { model: LayoutReview, as: "reviewRecord", required: false }] })) as LayoutWithCurrent;
  return { layout: meta(l, l.current!.summary as LayoutSolveSummary, hasApprovalOf(l.reviewRecord)) };
}

export interface SuggestionView {
  allowShared: boolean;
  /** The pathway asked for the life-safety inputs (class-b unless the request asked for class-a). */
  pathway: "class-a" | "class-b";
  found: boolean;
  reason: string | null;
  cost: number | null;
  parts: { kind: string; catalogId: string; name: string; count: number; unitPrice: number }[];
  boards: number;
  inputsUsed: number;
  inputsTotal: number;
  sharedInputs: number;
  counts: Record<Severity, number> | null;
  document: LayoutDocument | null;
  /** How the answer was reached: the exact model (proven optimal, or the gap a time limit left) or, if the model failed, the older search. */
  method: "exact-model" | "search-fallback";
  optimal: boolean;
  /** Relative gap to the proven bound when a time limit stopped the model; null when proven or unknown. */
  gap: number | null;
  /** In plain words, why the older search answered instead of the model. */
  fallbackReason: string | null;
  /** The lowest price of any layout that carries the schedule; above it only when more supervision was asked for within a margin. */
  cheapestCost: number | null;
}

function suggestionView(allowShared: boolean, pathway: SuggestionView["pathway"], s: ExactSuggestion): SuggestionView {
  const proof = { method: s.proof.method, optimal: s.proof.optimal, gap: s.proof.optimal || !Number.isFinite(s.proof.gap) ? null : s.proof.gap, fallbackReason: s.proof.fallbackReason ?? null, cheapestCost: s.proof.cheapestCost ?? null };
  if (!s.found) return { allowShared, pathway, found: false, reason: s.reason, cost: null, parts: [], boards: 0, inputsUsed: 0, inputsTotal: 0, sharedInputs: 0, counts: null, document: null, ...proof };
  return {
    ...proof,
    allowShared,
    pathway,
    found: true,
    reason: null,
    cost: s.cost,
    parts: s.parts,
    boards: s.layout.boards.length,
    inputsUsed: s.result.totals.inputsUsed,
    inputsTotal: s.result.totals.inputsTotal,
    sharedInputs: s.sharedInputs,
    counts: s.result.counts,
    document: s.layout,
  };
}

/** The cheapest hardware for the site's schedule both ways: one detector per input, and shared inputs allowed. */
export async function suggestForSite(actor: Actor, siteId: number, opts: SuggestRequest = {}): Promise<{ suggestions: SuggestionView[] }> {
  await findSite(actor, siteId);
  const [schedule, catalog] = await Promise.all([loadSchedule(siteId), catalogFor(actor.organisationId)]);
  if (schedule.length === 0) throw new ApiError(422, "The device schedule is empty: add detectors before asking for hardware.");
  const base = { busCableM: opts?.busCableM, power: opts?.power, pathway: opts?.pathway, choice: opts?.choice, outputDevices: opts?.outputDevices };
  const suggestions = await Promise.all([false, true].map(async (allowShared) => suggestionView(allowShared, opts?.pathway ?? "class-b", await suggestOffLoop(schedule, catalog, { ...base, allowShared }))));
  return { suggestions };
}
