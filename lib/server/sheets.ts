import "server-only";
import { makeFormat, type FormatSettings } from "@/lib/format/format";
import type { Transaction } from "sequelize";
import { bindModels } from "./db";
import { notFound } from "./errors";
import { catalogFor, ensureCan, loadSchedule } from "./schedules";
import { frozenInputs } from "./snapshots";
import type { Actor } from "./session";
import { Layout, LayoutReview, LayoutRevision, Site } from "@/models";
import { billOfMaterials, type BillOfMaterials } from "@/lib/bom/bill-of-materials";
import { bomCsv, zoneListCsv } from "@/lib/bom/csv";
import type { Catalog } from "@/lib/catalog/schema";
import { layoutDocumentSchema, type LayoutDocument } from "@/lib/layout/schema";
import { effectiveReview, type EffectiveReview } from "@/lib/review/effective-state";
import type { Schedule } from "@/lib/schedule/schema";
import { buildTerminalSheet } from "@/lib/sheet/build-sheet";
import type { TerminalSheet } from "@/lib/sheet/sheet-types";
import type { SheetMeta } from "@/lib/server/pdf/terminal-sheet-pdf";
import { terminalSheetPdfOffLoop } from "@/lib/server/workers/off-loop";
import type { PageSize } from "@/lib/server/pdf/pdf-kit";
import { zoneListPdf } from "@/lib/server/pdf/zone-list-pdf";
import type { ZoneList } from "@/lib/sheet/zone-list";
import { zoneProgrammingCsv } from "@/lib/sheet/zone-list-csv";
import { paperOf } from "@/lib/sheet/sheet-request-schema";

// Terminal sheets, zone lists and bills of materials of a layout revision: by default the approved revision
// (the one to wire), else the current one.

export interface LayoutRef {
  layout: Layout;
  site: Site;
  review: EffectiveReview;
  /** Who sent the layout for review last (null when never). */
  submittedBy: number | null;
}

/** The layout, only if its site belongs to the actor's organisation (404 otherwise), with its review state. */
export async function findLayoutForReview(actor: Actor, layoutId: number, transaction?: Transaction, lock = false): Promise<LayoutRef> {
  bindModels();
  const layout = await Layout.findOne({
    where: { id: layoutId },
    include: [{ model: Site, as: "site", attributes: ["id", "name", "organisationId"], where: { organisationId: actor.organisationId }, required: true }],
    transaction,
    ...(lock && transaction ? { lock: transaction.LOCK.UPDATE } : {}),
  });
  if (!layout) throw notFound("That layout");
  const stored = await LayoutReview.findByPk(layoutId, { transaction, ...(lock && transaction ? { lock: transaction.LOCK.UPDATE } : {}) });
  return { layout, site: (layout as Layout & { site: Site }).site, review: effectiveReview(stored, layout.currentRevision), submittedBy: stored?.submittedBy ?? null };
}

export interface RevisionContext extends LayoutRef {
  revision: number;
  document: LayoutDocument;
  schedule: Schedule;
  catalog: Catalog;
  /** The revision is approved or commissioned and reads the schedule and catalog frozen with it. */
  frozen: { takenAt: string; catalogVersion: number | null } | null;
}

/** An approved or commissioned revision: its inputs are frozen. */
export function isFrozenRevision(review: EffectiveReview, revision: number): boolean {
  return review.approvedRevision === revision || review.commissionedRevision === revision;
}

export async function loadRevision(actor: Actor, ref: LayoutRef, revision: number, transaction?: Transaction): Promise<RevisionContext> {
  const row = await LayoutRevision.findOne({ where: { layoutId: ref.layout.id, revision }, attributes: ["document"], transaction });
  if (!row) throw notFound("That revision");
  const document = layoutDocumentSchema.parse(row.document);
  const frozen = isFrozenRevision(ref.review, revision) ? await frozenInputs(ref.layout.id, revision, transaction) : null;
  if (frozen) return { ...ref, revision, document, schedule: frozen.schedule, catalog: frozen.catalog, frozen: { takenAt: frozen.takenAt, catalogVersion: frozen.catalogVersion } };
  const [schedule, catalog] = await Promise.all([loadSchedule(ref.layout.siteId, transaction), catalogFor(actor.organisationId)]);
  return { ...ref, revision, document, schedule, catalog, frozen: null };
}

export interface SheetOptions {
  /** Default: the approved revision, else the current one. */
  revision?: number;
}

export async function loadSheetContext(actor: Actor, layoutId: number, opts: SheetOptions = {}): Promise<RevisionContext> {
  ensureCan(actor, "sheet:read");
  const ref = await findLayoutForReview(actor, layoutId);
  return loadRevision(actor, ref, opts.revision ?? ref.review.approvedRevision ?? ref.layout.currentRevision);
}

export interface SheetView {
  layoutId: number;
  siteId: number;
  meta: SheetMeta;
  review: EffectiveReview;
  /** The revision shown is the approved one (what to wire). */
  approved: boolean;
  /** Read from the schedule and catalog frozen at approval (null: the live ones). */
  frozen: RevisionContext["frozen"];
  sheet: TerminalSheet;
}

/** The sheet's heading; the date is written as the organisation writes dates (lib/format). */
export function sheetMetaOf(ctx: RevisionContext, settings: FormatSettings): SheetMeta {
  const approved = isFrozenRevision(ctx.review, ctx.revision);
  return {
    siteName: ctx.site.name,
    layoutName: ctx.layout.name,
    revision: ctx.revision,
    generatedAt: makeFormat(settings).date(new Date()),
    approved,
    approvedSolo: approved && ctx.review.approvedSolo && ctx.review.approvedRevision === ctx.revision,
  };
}

export async function getTerminalSheet(actor: Actor, layoutId: number, opts: SheetOptions = {}): Promise<SheetView> {
  const ctx = await loadSheetContext(actor, layoutId, opts);
  return {
    layoutId,
    siteId: ctx.site.id,
    meta: sheetMetaOf(ctx, actor.settings),
    review: ctx.review,
    approved: ctx.review.approvedRevision === ctx.revision,
    frozen: ctx.frozen,
    sheet: buildTerminalSheet(ctx.document, ctx.schedule, ctx.catalog),
  };
}

/** A file name from free text: letters, digits and dashes only. */
export function fileStem(...parts: (string | number)[]): string {
  return (
    parts
      .map((p) => String(p).normalize("NFKD").replace(/[^A-Za-z0-9]+/g, "-").replace(/^-+|-+$/g, "").toLowerCase())
      .filter(Boolean)
      .join("-")
      .slice(0, 80) || "layout"
  );
}

export async function terminalSheetPdfFor(actor: Actor, layoutId: number, opts: SheetOptions & { size?: PageSize } = {}): Promise<{ pdf: Buffer; fileName: string }> {
  const ctx = await loadSheetContext(actor, layoutId, opts);
  const pdf = await terminalSheetPdfOffLoop(ctx.document, ctx.schedule, ctx.catalog, sheetMetaOf(ctx, actor.settings), opts.size ?? "A4");
  return { pdf, fileName: `${fileStem("terminal-sheet", ctx.site.name, ctx.layout.name, `rev-${ctx.revision}`)}.pdf` };
}

export async function zoneListCsvFor(actor: Actor, layoutId: number, opts: SheetOptions = {}): Promise<{ csv: string; fileName: string }> {
  const ctx = await loadSheetContext(actor, layoutId, opts);
  return { csv: zoneListCsv(buildTerminalSheet(ctx.document, ctx.schedule, ctx.catalog)), fileName: `${fileStem("zones", ctx.site.name, ctx.layout.name, `rev-${ctx.revision}`)}.csv` };
}

export async function bomFor(actor: Actor, layoutId: number, opts: SheetOptions = {}): Promise<{ revision: number; bom: BillOfMaterials }> {
  const ctx = await loadSheetContext(actor, layoutId, opts);
  return { revision: ctx.revision, bom: billOfMaterials(ctx.document, ctx.schedule, ctx.catalog) };
}

export async function bomCsvFor(actor: Actor, layoutId: number, opts: SheetOptions = {}): Promise<{ csv: string; fileName: string }> {
  const ctx = await loadSheetContext(actor, layoutId, opts);
  const fmt = makeFormat(actor.settings);
  return { csv: bomCsv(billOfMaterials(ctx.document, ctx.schedule, ctx.catalog), { currency: fmt.settings.currency, plain: fmt.moneyPlain }), fileName: `${fileStem("bom", ctx.site.name, ctx.layout.name, `rev-${ctx.revision}`)}.csv` };
}

export interface ZoneListView {
  layoutId: number;
  siteId: number;
  meta: SheetMeta;
  approved: boolean;
  frozen: RevisionContext["frozen"];
  panelName: string | null;
  list: ZoneList;
  /** Life-safety devices are among the zones: the page and PDF carry the caution. */
  caution: string | null;
}

function zoneListViewOf(ctx: RevisionContext, settings: FormatSettings): ZoneListView {
  const sheet = buildTerminalSheet(ctx.document, ctx.schedule, ctx.catalog);
  return { layoutId: ctx.layout.id, siteId: ctx.site.id, meta: sheetMetaOf(ctx, settings), approved: ctx.review.approvedRevision === ctx.revision, frozen: ctx.frozen, panelName: sheet.panel?.name ?? null, list: sheet.zoneList, caution: sheet.caution };
}

/** The zone list for programming: the approved revision (with its frozen schedule and catalog) unless another is asked for. */
export async function getZoneList(actor: Actor, layoutId: number, opts: SheetOptions = {}): Promise<ZoneListView> {
  return zoneListViewOf(await loadSheetContext(actor, layoutId, opts), actor.settings);
}

export async function zoneListPdfFor(actor: Actor, layoutId: number, opts: SheetOptions & { size?: PageSize } = {}): Promise<{ pdf: Buffer; fileName: string }> {
  const ctx = await loadSheetContext(actor, layoutId, opts);
  const view = zoneListViewOf(ctx, actor.settings);
  const pdf = await zoneListPdf(view.list, { ...view.meta, panelName: view.panelName, caution: view.caution }, opts.size ?? paperOf(actor.settings));
  return { pdf, fileName: `${fileStem("zone-list", ctx.site.name, ctx.layout.name, `rev-${ctx.revision}`)}.pdf` };
}

export async function zoneProgrammingCsvFor(actor: Actor, layoutId: number, opts: SheetOptions = {}): Promise<{ csv: string; fileName: string }> {
  const ctx = await loadSheetContext(actor, layoutId, opts);
  return { csv: zoneProgrammingCsv(zoneListViewOf(ctx, actor.settings).list), fileName: `${fileStem("zone-list", ctx.site.name, ctx.layout.name, `rev-${ctx.revision}`)}.csv` };
}
