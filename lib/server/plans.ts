import "server-only";
import { randomUUID } from "node:crypto";
import { Op, UniqueConstraintError, type Transaction } from "sequelize";
import { db } from "./db";
import { audit } from "./audit";
import { ApiError, conflict, notFound } from "./errors";
import { ensureCan } from "./schedules";
import { findSite } from "./sites";
import { storage as defaultStorage, type Storage } from "./storage";
import type { Actor } from "./session";
import { Floor, FloorPlan, PlanItem, PlanRoute, ScheduleDetectorRecord } from "@/models";
import { checkPlanImage } from "@/lib/plan/plan-image";
import { calibrateScale } from "@/lib/plan/scale";
import { defaultAllowances, measuredRunLength, type RouteAllowances, type RunLength } from "@/lib/plan/run-length";
import { boardKinds, type CalibrateInput, type PlaceItemInput, type SaveRouteInput, type StoredRouteLeg } from "@/lib/plan/plan-schema";
import type { PlanPoint } from "@/lib/plan/geometry";

// Floor plans of a site: the drawing per floor in object storage, its scale, what is placed on it, and cable
// routes whose measured length becomes the schedule detector's cable run, in the same transaction.

export interface PlanItemView {
  id: number;
  planId: number;
  kind: PlanItem["kind"];
  /** The schedule's detector id (a string, as the schedule's ids are), for detectors. */
  detectorId: string | null;
  label: string;
  x: number;
  y: number;
}

export interface PlanView {
  id: number;
  floorId: number;
  fileName: string;
  contentType: string;
  widthPx: number;
  heightPx: number;
  metresPerPixel: number | null;
  calibration: FloorPlan["calibration"];
  items: PlanItemView[];
}

export interface RouteView {
  id: number;
  fromItemId: number;
  toItemId: number;
  legs: StoredRouteLeg[];
  allowances: RouteAllowances;
  run: RunLength;
}

const itemView = (i: PlanItem): PlanItemView => ({ id: i.id, planId: i.planId, kind: i.kind, detectorId: i.detectorId === null ? null : String(i.detectorId), label: i.label, x: i.x, y: i.y });
const planView = (p: FloorPlan, items: PlanItem[]): PlanView => ({
  id: p.id,
  floorId: p.floorId,
  fileName: p.fileName,
  contentType: p.contentType,
  widthPx: p.widthPx,
  heightPx: p.heightPx,
  metresPerPixel: p.metresPerPixel,
  calibration: p.calibration,
  items: items.filter((i) => i.planId === p.id).map(itemView),
});
const allowancesOf = (r: PlanRoute): RouteAllowances => ({ deviceSlackM: r.deviceSlackM, boardSlackM: r.boardSlackM, riseM: r.riseM });

function measure(legs: readonly StoredRouteLeg[], allowances: RouteAllowances, plans: ReadonlyMap<number, FloorPlan>): RunLength {
  return measuredRunLength(
    legs.map((l) => {
      const mpp = plans.get(l.planId)?.metresPerPixel ?? null;
      return { points: l.points, scale: mpp === null ? null : { metresPerPixel: mpp } };
    }),
    allowances,
  );
}

async function findPlan(siteId: number, planId: number, transaction?: Transaction): Promise<FloorPlan> {
  const p = await FloorPlan.findOne({ where: { id: planId, siteId }, transaction });
  if (!p) throw notFound("That plan");
  return p;
}

/** Every plan of the site with its items, and every route with its run as measured now (three queries). */
export async function listPlans(actor: Actor, siteId: number): Promise<{ plans: PlanView[]; routes: RouteView[] }> {
  ensureCan(actor, "site:read");
  await findSite(actor, siteId);
  const plans = await FloorPlan.findAll({ where: { siteId }, order: [["id", "ASC"]] });
  const [items, routes] = await Promise.all([
    plans.length ? PlanItem.findAll({ where: { planId: { [Op.in]: plans.map((p) => p.id) } }, order: [["id", "ASC"]] }) : [],
    PlanRoute.findAll({ where: { siteId }, order: [["id", "ASC"]] }),
  ]);
  const byId = new Map(plans.map((p) => [p.id, p]));
  return {
    plans: plans.map((p) => planView(p, items)),
    routes: routes.map((r) => ({ id: r.id, fromItemId: r.fromItemId, toItemId: r.toItemId, legs: r.legs, allowances: allowancesOf(r), run: measure(r.legs, allowancesOf(r), byId) })),
  };
}

/**
 * Upload or replace the plan of one floor. A replacement keeps what was placed on it; it keeps the scale only when
 * the new drawing has the same size in pixels (otherwise the old scale would measure wrongly).
 */
export async function uploadPlan(actor: Actor, siteId: number, floorId: number, file: { fileName: string; bytes: Uint8Array }, store: Storage = defaultStorage()): Promise<{ plan: PlanView; replaced: boolean; scaleKept: boolean }> {
  ensureCan(actor, "schedule:write");
  const check = checkPlanImage(file);
  if (!check.ok) throw new ApiError(check.status, check.reason);
  await findSite(actor, siteId);
  if (!(await Floor.findOne({ where: { id: floorId, siteId } }))) throw notFound("That floor");
  const key = `org-${actor.organisationId}/site-${siteId}/plans/${randomUUID()}.${check.contentType === "image/png" ? "png" : "jpg"}`;
  await store.putObject(key, file.bytes, check.contentType);
  let oldKey: string | null = null;
  try {
    const result = await db().transaction(async (transaction) => {
      const prior = await FloorPlan.findOne({ where: { siteId, floorId }, transaction, lock: transaction.LOCK.UPDATE });
      const columns = { s3Key: key, fileName: check.fileName, contentType: check.contentType, sizeBytes: check.size, widthPx: check.width, heightPx: check.height, uploadedBy: actor.userId };
      let plan: FloorPlan;
      let scaleKept = false;
      if (prior) {
        oldKey = prior.s3Key;
        scaleKept = prior.widthPx === check.width && prior.heightPx === check.height && prior.metresPerPixel !== null;
        plan = await prior.update({ ...columns, ...(scaleKept ? {} : { metresPerPixel: null, calibration: null }) }, { transaction });
      } else {
        plan = await FloorPlan.create({ siteId, floorId, ...columns, metresPerPixel: null, calibration: null }, { transaction });
      }
      await audit({ organisationId: actor.organisationId, userId: actor.userId, action: prior ? "plan.replace" : "plan.upload", entityType: "site", entityId: siteId, detail: { planId: plan.id, floorId, fileName: check.fileName, sizeBytes: check.size, scaleKept } }, transaction);
      const items = await PlanItem.findAll({ where: { planId: plan.id }, order: [["id", "ASC"]], transaction });
      return { plan: planView(plan, items), replaced: !!prior, scaleKept };
    });
    if (oldKey) await store.deleteObject(oldKey).catch(() => undefined);
    return result;
  } catch (e) {
    await store.deleteObject(key).catch(() => undefined);
    throw e;
  }
}

export async function getPlanImage(actor: Actor, siteId: number, planId: number, store: Storage = defaultStorage()): Promise<{ body: Buffer; contentType: string; fileName: string }> {
  ensureCan(actor, "site:read");
  await findSite(actor, siteId);
  const p = await findPlan(siteId, planId);
  const obj = await store.getObject(p.s3Key);
  if (!obj) throw notFound("That plan's file");
  return { body: obj.body, contentType: p.contentType, fileName: p.fileName };
}

/** Routes crossing any of `planIds` measured again, each detector's cable run written from its route. */
async function remeasureRoutes(siteId: number, planIds: readonly number[], transaction: Transaction): Promise<number> {
  const routes = await PlanRoute.findAll({ where: { siteId }, transaction });
  const touched = routes.filter((r) => r.legs.some((l) => planIds.includes(l.planId)));
  if (!touched.length) return 0;
  const plans = new Map((await FloorPlan.findAll({ where: { siteId }, transaction })).map((p) => [p.id, p]));
  let updated = 0;
  for (const r of touched) updated += await writeRun(r, measure(r.legs, allowancesOf(r), plans), transaction);
  return updated;
}

/** The route's measured run into its detector's cable length; 0 when the device is no detector or cannot be measured. */
async function writeRun(route: PlanRoute, run: RunLength, transaction: Transaction): Promise<number> {
  if (!run.ok) return 0;
  const from = await PlanItem.findByPk(route.fromItemId, { transaction });
  if (!from || from.detectorId === null) return 0;
  const [n] = await ScheduleDetectorRecord.update({ cableM: run.totalM, cableBasis: "measured-on-plan" }, { where: { id: from.detectorId, siteId: route.siteId }, transaction });
  return n;
}

/** Calibrate a plan from two points and the real distance in the organisation's unit; its routes are re-measured. */
export async function calibratePlan(actor: Actor, siteId: number, planId: number, input: CalibrateInput): Promise<{ plan: PlanView; remeasured: number }> {
  ensureCan(actor, "schedule:write");
  await findSite(actor, siteId);
  const units = actor.settings.units;
  const cal = calibrateScale(input.a, input.b, input.distance, units);
  if (!cal.ok) throw new ApiError(422, "Some fields are not valid.", [{ path: "distance", message: cal.reason }]);
  return db().transaction(async (transaction) => {
    const plan = await FloorPlan.findOne({ where: { id: planId, siteId }, transaction, lock: transaction.LOCK.UPDATE });
    if (!plan) throw notFound("That plan");
    for (const [k, p] of [["a", input.a], ["b", input.b]] as const) checkOnPlan(plan, p, k);
    await plan.update({ metresPerPixel: cal.scale.metresPerPixel, calibration: { ...input, units } }, { transaction });
    const remeasured = await remeasureRoutes(siteId, [plan.id], transaction);
    await audit({ organisationId: actor.organisationId, userId: actor.userId, action: "plan.calibrate", entityType: "site", entityId: siteId, detail: { planId, metresPerPixel: cal.scale.metresPerPixel, remeasured } }, transaction);
    const items = await PlanItem.findAll({ where: { planId }, order: [["id", "ASC"]], transaction });
    return { plan: planView(plan, items), remeasured };
  });
}

function checkOnPlan(plan: FloorPlan, p: PlanPoint, path: string) {
  if (p.x > plan.widthPx || p.y > plan.heightPx) throw new ApiError(422, "Some fields are not valid.", [{ path, message: `Keep the point on the plan (${plan.widthPx} × ${plan.heightPx} pixels)` }]);
}

/** Place a detector of the site's schedule (once per site) or another device on a plan. */
export async function placeItem(actor: Actor, siteId: number, planId: number, input: PlaceItemInput): Promise<PlanItemView> {
  ensureCan(actor, "schedule:write");
  await findSite(actor, siteId);
  try {
    return await db().transaction(async (transaction) => {
      const plan = await findPlan(siteId, planId, transaction);
      checkOnPlan(plan, input, "x");
      let detectorId: number | null = null;
      if (input.kind === "detector") {
        const d = await ScheduleDetectorRecord.findOne({ where: { id: input.detectorId, siteId }, attributes: ["id"], transaction });
        if (!d) throw new ApiError(422, "Some fields are not valid.", [{ path: "detectorId", message: "Choose a detector of this site's schedule" }]);
        detectorId = d.id;
      }
      const item = await PlanItem.create({ planId, kind: input.kind, detectorId, label: input.kind === "detector" ? "" : input.label, x: input.x, y: input.y }, { transaction });
      await audit({ organisationId: actor.organisationId, userId: actor.userId, action: "plan.place", entityType: "site", entityId: siteId, detail: { planId, itemId: item.id, kind: input.kind, detectorId } }, transaction);
      return itemView(item);
    });
  } catch (e) {
    if (e instanceof UniqueConstraintError) throw conflict("That detector is already placed on a plan of this site: move it instead.");
    throw e;
  }
}

/** Move a placed device. Drawn routes keep their own points, so no run changes here. */
export async function moveItem(actor: Actor, siteId: number, itemId: number, to: PlanPoint): Promise<PlanItemView> {
  ensureCan(actor, "schedule:write");
  await findSite(actor, siteId);
  return db().transaction(async (transaction) => {
    const item = await PlanItem.findOne({ where: { id: itemId }, include: [{ model: FloorPlan, as: "plan", where: { siteId }, required: true }], transaction, lock: transaction.LOCK.UPDATE });
    if (!item) throw notFound("That placed device");
    checkOnPlan((item as PlanItem & { plan: FloorPlan }).plan, to, "x");
    await item.update({ x: to.x, y: to.y }, { transaction });
    await audit({ organisationId: actor.organisationId, userId: actor.userId, action: "plan.move", entityType: "site", entityId: siteId, detail: { itemId, x: to.x, y: to.y } }, transaction);
    return itemView(item);
  });
}

const invalid = (path: string, message: string) => new ApiError(422, "Some fields are not valid.", [{ path, message }]);

/**
 * Save the route of a device's cable to its board (one per device; saving again replaces it). Its legs run from
 * the device's floor to the board's; the measured run is written to the detector's cable length in the same
 * transaction and marked as measured on plan.
 */
export async function saveRoute(actor: Actor, siteId: number, input: SaveRouteInput): Promise<RouteView> {
  ensureCan(actor, "schedule:write");
  await findSite(actor, siteId);
  return db().transaction(async (transaction) => {
    const plans = new Map((await FloorPlan.findAll({ where: { siteId }, transaction })).map((p) => [p.id, p]));
    const items = await PlanItem.findAll({ where: { id: { [Op.in]: [input.fromItemId, input.toItemId] }, planId: { [Op.in]: [...plans.keys(), 0] } }, transaction });
    const from = items.find((i) => i.id === input.fromItemId);
    const to = items.find((i) => i.id === input.toItemId);
    if (!from) throw invalid("fromItemId", "Choose a device placed on a plan of this site");
    if (!to || !boardKinds.includes(to.kind)) throw invalid("toItemId", "Choose the panel or an expansion board placed on a plan of this site");
    if (boardKinds.includes(from.kind) || from.kind === "riser") throw invalid("fromItemId", "A route starts at a device, not at a board or a riser");
    input.legs.forEach((leg, i) => {
      const plan = plans.get(leg.planId);
      if (!plan) throw invalid(`legs.${i}.planId`, "Choose a plan of this site");
      leg.points.forEach((p, j) => checkOnPlan(plan, p, `legs.${i}.points.${j}`));
    });
    if (input.legs[0].planId !== from.planId) throw invalid("legs.0.planId", "The route starts on the device's floor");
    if (input.legs[input.legs.length - 1].planId !== to.planId) throw invalid(`legs.${input.legs.length - 1}.planId`, "The route ends on the board's floor");
    const allowances = input.allowances ?? defaultAllowances(input.legs.length - 1);
    const run = measure(input.legs, allowances, plans);
    if (!run.ok) throw invalid("legs", run.reason);
    const columns = { siteId, fromItemId: from.id, toItemId: to.id, legs: input.legs, ...allowances };
    const prior = await PlanRoute.findOne({ where: { fromItemId: from.id }, transaction, lock: transaction.LOCK.UPDATE });
    const route = prior ? await prior.update(columns, { transaction }) : await PlanRoute.create(columns, { transaction });
    await writeRun(route, run, transaction);
    await audit({ organisationId: actor.organisationId, userId: actor.userId, action: "plan.route", entityType: "site", entityId: siteId, detail: { routeId: route.id, fromItemId: from.id, toItemId: to.id, totalM: run.totalM } }, transaction);
    return { id: route.id, fromItemId: route.fromItemId, toItemId: route.toItemId, legs: route.legs, allowances, run };
  });
}
