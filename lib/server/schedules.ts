import "server-only";
import { Op, type Transaction } from "sequelize";
import { db } from "./db";
import { audit } from "./audit";
import { ApiError, notFound } from "./errors";
import { findSite, loadStructure } from "./sites";
import { addPlaces } from "./site-structure";
import { checkPlace, describePlace, matchPlace, unknownPlaces, type KnownArea, type UnknownPlace } from "@/lib/sites/places";
import { effectiveCatalogFor } from "./catalogs";
import type { Actor } from "./session";
import { Layout, LayoutReview, LayoutRevision, ScheduleDetectorRecord } from "@/models";
import { can, refusal, type Permission } from "@/lib/auth/permissions";
import type { Catalog } from "@/lib/catalog/schema";
import { parseScheduleCsv, serializeScheduleCsv, type CsvRowError } from "@/lib/schedule/csv";
import type { BulkEditPatch, CreateDetectorForm, ScheduleCableGauge, ScheduleDetector, ScheduleRow, UpdateDetectorForm } from "@/lib/schedule/schema";
import { plural } from "@/lib/vocabulary/plural";

// A site's device schedule in MariaDB. Everyone in the organisation reads it; "schedule:write" changes it.

/** The catalog an organisation designs with: the shipped entries plus its uploaded file. Read-only (shared through a cache). */
export async function catalogFor(organisationId: number): Promise<Catalog> {
  return effectiveCatalogFor(organisationId);
}

/** The server layer checks permissions too, so a caller that skipped the route wrapper is still refused. */
export function ensureCan(actor: Actor, permission: Permission) {
  if (!can(actor.role, permission)) throw new ApiError(403, refusal(actor.role, permission));
}

export function toScheduleDetector(r: ScheduleDetectorRecord): ScheduleDetector {
  const gauge: ScheduleCableGauge = r.gaugeAwg != null ? { awg: r.gaugeAwg } : { mm2: Number(r.gaugeMm2) };
  return { id: String(r.id), label: r.label, catalogId: r.catalogId, area: r.area, room: r.room, cableM: Number(r.cableM), gauge, supervision: r.supervision };
}

function gaugeColumns(g: ScheduleCableGauge): { gaugeAwg: number | null; gaugeMm2: number | null } {
  return "awg" in g ? { gaugeAwg: g.awg, gaugeMm2: null } : { gaugeAwg: null, gaugeMm2: g.mm2 };
}

function rowColumns(row: Partial<ScheduleRow>) {
  const { gauge, ...rest } = row;
  return { ...rest, ...(gauge ? gaugeColumns(gauge) : {}) };
}

/** The schedule of a site already known to be the caller's, in schedule order (one query). */
export async function loadSchedule(siteId: number, transaction?: Transaction): Promise<ScheduleDetector[]> {
  const rows = await ScheduleDetectorRecord.findAll({ where: { siteId }, order: [["position", "ASC"], ["id", "ASC"]], transaction });
  return rows.map(toScheduleDetector);
}

export async function listSchedule(actor: Actor, siteId: number): Promise<ScheduleDetector[]> {
  await findSite(actor, siteId);
  return loadSchedule(siteId);
}

function checkCatalogIds(catalog: Catalog, ids: { path: string; catalogId: string }[]) {
  // wireless detectors are in the schedule too: a receiver learns them instead of an input
  const known = new Set([...catalog.detectors, ...(catalog.wirelessDetectors ?? [])].map((d) => d.id));
  const issues = ids.filter((x) => !known.has(x.catalogId)).map((x) => ({ path: x.path, message: `${x.catalogId} is not a detector in your organisation's catalog` }));
  if (issues.length) throw new ApiError(422, "Some fields are not valid.", issues);
}

/**
 * A detector's area and room must be places of the site's structure (a CSV import offers to add unknown ones; one
 * detector is refused with 422 naming the field). Gives the names in the site's own spelling.
 */
async function placeInStructure(siteId: number, area: string, room: string, transaction: Transaction, pathPrefix = ""): Promise<{ area: string; room: string }> {
  const floors = await loadStructure(siteId, transaction);
  const r = checkPlace(floors.flatMap((f) => f.areas), area, room);
  if (!r.ok) throw new ApiError(422, `${r.issue.message} Nothing was saved.`, [{ path: `${pathPrefix}${r.issue.path}`, message: r.issue.message }]);
  return { area: r.area, room: r.room };
}

async function nextPosition(siteId: number, transaction: Transaction): Promise<number> {
  const max = (await ScheduleDetectorRecord.max("position", { where: { siteId }, transaction })) as number | null;
  return max == null ? 0 : max + 1;
}

export async function createDetector(actor: Actor, siteId: number, input: CreateDetectorForm): Promise<ScheduleDetector> {
  ensureCan(actor, "schedule:write");
  await findSite(actor, siteId);
  checkCatalogIds(await catalogFor(actor.organisationId), [{ path: "catalogId", catalogId: input.catalogId }]);
  const rec = await db().transaction(async (transaction) => {
    const place = await placeInStructure(siteId, input.area, input.room, transaction);
    const position = await nextPosition(siteId, transaction);
    const r = await ScheduleDetectorRecord.create({ siteId, position, ...rowColumns({ ...input, ...place }) } as ScheduleDetectorRecord, { transaction });
    await audit({ organisationId: actor.organisationId, userId: actor.userId, action: "schedule.create", entityType: "schedule_detector", entityId: r.id, detail: { siteId, label: input.label, catalogId: input.catalogId } }, transaction);
    return r;
  });
  return toScheduleDetector(rec);
}

export async function updateDetector(actor: Actor, siteId: number, detectorId: number, patch: UpdateDetectorForm): Promise<ScheduleDetector> {
  ensureCan(actor, "schedule:write");
  await findSite(actor, siteId);
  if (patch.catalogId) checkCatalogIds(await catalogFor(actor.organisationId), [{ path: "catalogId", catalogId: patch.catalogId }]);
  const rec = await db().transaction(async (transaction) => {
    const r = await ScheduleDetectorRecord.findOne({ where: { id: detectorId, siteId }, transaction, lock: transaction.LOCK.UPDATE });
    if (!r) throw notFound("That detector");
    // checked when the place changes: a room alone in the detector's own area, an area alone with its own room; an
    // edit that keeps the place (a cable length) is never refused for a place the structure lost meanwhile
    const [area, room] = [patch.area ?? r.area, patch.room ?? r.room];
    const place = area !== r.area || room !== r.room ? await placeInStructure(siteId, area, room, transaction) : {};
    // a length typed over a measured one is the designer's own figure again
    const typed = patch.cableM !== undefined && patch.cableM !== Number(r.cableM) ? { cableBasis: "typed" as const } : {};
    await r.update({ ...rowColumns({ ...patch, ...place }), ...typed }, { transaction });
    await audit({ organisationId: actor.organisationId, userId: actor.userId, action: "schedule.update", entityType: "schedule_detector", entityId: r.id, detail: { siteId, patch } }, transaction);
    return r;
  });
  return toScheduleDetector(rec);
}

/** Detector ids in API bodies are the schedule's string ids; here they are row ids of this site. */
function rowIds(ids: string[]): number[] {
  const out = ids.map((s) => (/^\d{1,10}$/.test(s) ? Number(s) : NaN));
  const bad = ids.filter((_, i) => !Number.isSafeInteger(out[i]) || out[i] <= 0);
  if (bad.length) throw new ApiError(422, "Some fields are not valid.", [{ path: "ids", message: `not detector ids of this schedule: ${bad.slice(0, 5).join(", ")}` }]);
  return [...new Set(out)];
}

/**
 * A bulk patch that sets an area or a room is checked for every selected row (an area alone keeps each row's room);
 * refused whole when any row would name a place the site lacks, with the rows named. Gives the site's spelling.
 */
async function bulkPlace(siteId: number, rows: ScheduleDetectorRecord[], patch: BulkEditPatch["patch"], transaction: Transaction): Promise<{ area?: string; room?: string }> {
  const areas = (await loadStructure(siteId, transaction)).flatMap((f) => f.areas);
  const refused = new Map<string, { path: string; message: string; labels: string[] }>();
  let place: { area: string; room: string } | null = null;
  for (const r of rows) {
    const c = checkPlace(areas, patch.area ?? r.area, patch.room ?? r.room);
    if (c.ok) place ??= c;
    else refused.set(c.issue.message, { path: `patch.${c.issue.path}`, message: c.issue.message, labels: [...(refused.get(c.issue.message)?.labels ?? []), r.label] });
  }
  if (refused.size) {
    const issues = [...refused.values()].map((x) => ({ path: x.path, message: `${x.message} (${x.labels.join(", ")})` }));
    throw new ApiError(422, `${issues.map((i) => i.message).join(" ")} Nothing was changed.`, issues);
  }
  return { ...(patch.area !== undefined && place ? { area: place.area } : {}), ...(patch.room !== undefined && place ? { room: place.room } : {}) };
}

/** One patch applied to many rows in one transaction; refused whole when any id is not in this site's schedule. */
export async function bulkEditDetectors(actor: Actor, siteId: number, edit: BulkEditPatch): Promise<{ updated: number }> {
  ensureCan(actor, "schedule:write");
  await findSite(actor, siteId);
  if (edit.patch.catalogId) checkCatalogIds(await catalogFor(actor.organisationId), [{ path: "patch.catalogId", catalogId: edit.patch.catalogId }]);
  const ids = rowIds(edit.ids);
  return db().transaction(async (transaction) => {
    const rows = await ScheduleDetectorRecord.findAll({ where: { id: { [Op.in]: ids }, siteId }, attributes: ["id", "label", "area", "room"], transaction });
    if (rows.length !== ids.length) throw new ApiError(404, `${ids.length - rows.length} of the selected detectors are not in this schedule; nothing was changed.`);
    const patch = edit.patch.area !== undefined || edit.patch.room !== undefined ? { ...edit.patch, ...(await bulkPlace(siteId, rows, edit.patch, transaction)) } : edit.patch;
    await ScheduleDetectorRecord.update({ ...rowColumns(patch), ...(patch.cableM !== undefined ? { cableBasis: "typed" as const } : {}) }, { where: { id: { [Op.in]: ids }, siteId }, transaction });
    await audit({ organisationId: actor.organisationId, userId: actor.userId, action: "schedule.bulk-update", entityType: "site", entityId: siteId, detail: { ids, patch: edit.patch } }, transaction);
    return { updated: ids.length };
  });
}

export interface ApprovedUse {
  layoutId: number;
  name: string;
  revision: number;
  state: "approved" | "commissioned";
  detectors: string[];
}

/** Approved or commissioned layouts of the site whose frozen revision places any of these detectors. */
async function approvedUsesOf(siteId: number, rows: { id: number; label: string }[], transaction: Transaction): Promise<ApprovedUse[]> {
  const layouts = await Layout.findAll({ where: { siteId }, attributes: ["id", "name"], include: [{ model: LayoutReview, as: "reviewRecord", required: true, attributes: ["layoutId", "approvedRevision", "commissionedRevision"] }], transaction });
  const uses: ApprovedUse[] = [];
  for (const l of layouts as (Layout & { reviewRecord: LayoutReview })[]) {
    const r = l.reviewRecord;
    const revision = r.commissionedRevision ?? r.approvedRevision;
    if (revision == null) continue;
    const rev = await LayoutRevision.findOne({ where: { layoutId: l.id, revision }, attributes: ["document"], transaction });
    const placed = new Set(((rev?.document as { inputs?: { detectorIds: string[] }[] } | undefined)?.inputs ?? []).flatMap((i) => i.detectorIds));
    const hit = rows.filter((d) => placed.has(String(d.id)));
    if (hit.length) uses.push({ layoutId: l.id, name: l.name, revision, state: r.commissionedRevision != null ? "commissioned" : "approved", detectors: hit.map((d) => d.label) });
  }
  return uses;
}

/**
 * Delete detectors, all or nothing. A detector on an approved or commissioned layout is deleted only when the
 * caller confirms it (409 naming the layouts otherwise): the approved revision keeps its frozen copy of the
 * schedule, so nothing approved changes, and the layout shows that the schedule has changed since approval.
 */
export async function deleteDetectors(actor: Actor, siteId: number, idList: string[], opts: { confirmApproved?: boolean } = {}): Promise<{ deleted: number; approvedLayouts: ApprovedUse[] }> {
  ensureCan(actor, "schedule:write");
  await findSite(actor, siteId);
  const ids = rowIds(idList);
  return db().transaction(async (transaction) => {
    const rows = await ScheduleDetectorRecord.findAll({ where: { id: { [Op.in]: ids }, siteId }, attributes: ["id", "label"], transaction });
    if (rows.length !== ids.length) throw new ApiError(404, `${ids.length - rows.length} of the selected detectors are not in this schedule; nothing was deleted.`);
    const uses = await approvedUsesOf(siteId, rows, transaction);
    if (uses.length && !opts.confirmApproved)
      throw new ApiError(
        409,
        `${uses.map((u) => `${u.detectors.join(", ")} ${u.detectors.length === 1 ? "is" : "are"} on the ${u.state} layout “${u.name}” (revision ${u.revision})`).join("; ")}. Deleting changes nothing approved: its terminal sheet and commissioning keep the schedule as it was approved, and the layout will show that the schedule has changed since approval. Nothing was deleted; confirm to delete.`,
        undefined,
        { code: "used-by-approved", approvedLayouts: uses },
      );
    await ScheduleDetectorRecord.destroy({ where: { id: { [Op.in]: ids }, siteId }, transaction });
    await audit(
      { organisationId: actor.organisationId, userId: actor.userId, action: "schedule.delete", entityType: "site", entityId: siteId, detail: { detectors: rows.map((r) => ({ id: r.id, label: r.label })), ...(uses.length ? { approvedLayouts: uses } : {}) } },
      transaction,
    );
    return { deleted: rows.length, approvedLayouts: uses };
  });
}

export interface ImportPreview {
  /** Rows that would be stored, each with its record number in the file (the header is row 1). */
  rows: { row: number; detector: ScheduleRow }[];
  errors: CsvRowError[];
  /** Records in the file besides the header and blank lines. */
  records: number;
  /** Areas and rooms the file names that the site does not have: added only when the import is confirmed with addUnknownPlaces. */
  unknownPlaces: UnknownPlace[];
}

function preview(csv: string, catalog: Catalog, areas: KnownArea[]): ImportPreview {
  // a NUL byte means a binary file behind a .csv name; refused as a whole, like a catalog upload
  const nul = csv.indexOf("\u0000");
  if (nul >= 0) return { rows: [], errors: [{ row: csv.slice(0, nul).split("\n").length, column: null, message: "the file contains a NUL byte, so it is not a text file: save it as UTF-8 CSV" }], records: 0, unknownPlaces: [] };
  const parsed = parseScheduleCsv(csv, catalog);
  // names the site already has are stored in the site's own spelling
  const rows = parsed.rows.map((detector, i) => {
    const m = matchPlace(areas, detector.area, detector.room);
    return { row: parsed.rowNumbers[i], detector: { ...detector, area: m.area, room: m.room } };
  });
  const badRows = new Set(parsed.errors.filter((e) => e.row > 1).map((e) => e.row));
  const unknown = unknownPlaces(areas, rows.map((r) => ({ row: r.row, area: r.detector.area, room: r.detector.room })));
  return { rows, errors: parsed.errors, records: rows.length + badRows.size, unknownPlaces: unknown };
}

async function previewFor(actor: Actor, siteId: number, csv: string) {
  await findSite(actor, siteId);
  const [catalog, floors] = await Promise.all([catalogFor(actor.organisationId), loadStructure(siteId)]);
  return { floors, p: preview(csv, catalog, floors.flatMap((f) => f.areas)) };
}

/** Parse and check a CSV file; nothing is stored. */
export async function previewImport(actor: Actor, siteId: number, csv: string): Promise<ImportPreview> {
  ensureCan(actor, "schedule:write");
  return (await previewFor(actor, siteId, csv)).p;
}

/**
 * Store every row of the file after the site's existing rows, in one transaction; a file with any error stores nothing (422).
 * A file naming areas or rooms the site lacks is refused (409, listing them) unless `addUnknownPlaces` is set: then they are
 * added to the site's structure in the same transaction.
 */
export async function confirmImport(actor: Actor, siteId: number, csv: string, fileName?: string, addUnknownPlaces = false): Promise<{ imported: number; detectors: ScheduleDetector[]; addedPlaces: UnknownPlace[] }> {
  ensureCan(actor, "schedule:write");
  const { floors, p } = await previewFor(actor, siteId, csv);
  if (p.errors.length)
    throw new ApiError(
      422,
      `The file has ${plural(p.errors.length, "problem")}; nothing was imported. Correct the rows and import again.`,
      p.errors.slice(0, 200).map((e) => ({ path: `row ${e.row}${e.column ? `, ${e.column}` : ""}`, message: e.message })),
      { errors: p.errors },
    );
  if (p.rows.length === 0) throw new ApiError(422, "The file has no detector rows; nothing was imported.");
  if (p.unknownPlaces.length && !addUnknownPlaces)
    throw new ApiError(
      409,
      `The file names ${p.unknownPlaces.length} area${p.unknownPlaces.length === 1 ? "" : "s"} or room${p.unknownPlaces.length === 1 ? "" : "s"} this site does not have: ${p.unknownPlaces.map(describePlace).join(", ")}. Add them to the site, or correct the file; nothing was imported.`,
      p.unknownPlaces.map((u) => ({ path: `rows ${u.rows.join(", ")}`, message: `${describePlace(u)} is not in the site's structure` })),
      { unknownPlaces: p.unknownPlaces },
    );
  const created = await db().transaction(async (transaction) => {
    if (p.unknownPlaces.length) {
      await addPlaces(siteId, floors, p.unknownPlaces, transaction);
      await audit({ organisationId: actor.organisationId, userId: actor.userId, action: "site.places.add", entityType: "site", entityId: siteId, detail: { fromImport: fileName ?? null, places: p.unknownPlaces.map(({ area, room }) => ({ area, room })) } }, transaction);
    }
    const base = await nextPosition(siteId, transaction);
    const recs = await ScheduleDetectorRecord.bulkCreate(
      p.rows.map((r, i) => ({ siteId, position: base + i, ...rowColumns(r.detector) }) as ScheduleDetectorRecord),
      { transaction },
    );
    await audit({ organisationId: actor.organisationId, userId: actor.userId, action: "schedule.import", entityType: "site", entityId: siteId, detail: { fileName: fileName ?? null, rows: recs.length } }, transaction);
    return recs.length;
  });
  return { imported: created, detectors: await loadSchedule(siteId), addedPlaces: p.unknownPlaces };
}

export async function exportScheduleCsv(actor: Actor, siteId: number): Promise<{ csv: string; fileName: string }> {
  const site = await findSite(actor, siteId);
  const rows = await loadSchedule(siteId);
  const slug = site.name.toLowerCase().replace(/[^a-z0-9]+/g, "-").replace(/^-|-$/g, "") || `site-${siteId}`;
  return { csv: serializeScheduleCsv(rows), fileName: `${slug}-device-schedule.csv` };
}
