import "server-only";
import { Op, type Transaction } from "sequelize";
import { db } from "./db";
import { audit } from "./audit";
import { ApiError, notFound } from "./errors";
import { ensureCan } from "./schedules";
import { getSite, loadStructure, type SiteDetail, type SiteFloorView } from "./sites";
import type { Actor } from "./session";
import { Area, Floor, Room, ScheduleDetectorRecord, Site } from "@/models";
import { inUseMessage, placeKey, planStructure } from "@/lib/sites/structure-plan";
import type { AddRoomInput, FloorNode } from "@/lib/sites/site-schema";
import type { UnknownPlace } from "@/lib/sites/places";

// Editing a site's floors, areas and rooms. The schedule names areas and rooms, so a rename carries its
// detectors along and a removal of a place detectors still name is refused.

async function lockSite(actor: Actor, siteId: number, transaction: Transaction): Promise<Site> {
  const site = await Site.findOne({ where: { id: siteId, organisationId: actor.organisationId }, transaction, lock: transaction.LOCK.UPDATE });
  if (!site) throw notFound("That site");
  return site;
}

/** Replace the site's structure with `floors` (ids keep a node, no id adds one, a missing node is removed). */
export async function saveStructure(actor: Actor, siteId: number, floors: FloorNode[]): Promise<SiteDetail> {
  ensureCan(actor, "site:write");
  await db().transaction(async (transaction) => {
    await lockSite(actor, siteId, transaction);
    const now = await loadStructure(siteId, transaction);
    const detectors = await ScheduleDetectorRecord.findAll({ where: { siteId }, attributes: ["id", "area", "room"], transaction });
    const plan = planStructure(now, floors, detectors.map((d) => ({ id: d.id, area: d.area, room: d.room })));
    if (plan.badIds.length) throw new ApiError(422, "Some floors, areas or rooms are not part of this site; nothing was changed.", plan.badIds);
    if (plan.inUse.length) throw new ApiError(409, inUseMessage(plan.inUse), undefined, { inUse: plan.inUse });
    if (plan.removed.rooms.length) await Room.destroy({ where: { id: { [Op.in]: plan.removed.rooms } }, transaction });
    if (plan.removed.areas.length) await Area.destroy({ where: { id: { [Op.in]: plan.removed.areas }, siteId }, transaction });
    if (plan.removed.floors.length) await Floor.destroy({ where: { id: { [Op.in]: plan.removed.floors }, siteId }, transaction });
    for (const [fi, f] of floors.entries()) {
      const floorId = f.id ?? (await Floor.create({ siteId, name: f.name, position: fi }, { transaction })).id;
      if (f.id) await Floor.update({ name: f.name, position: fi }, { where: { id: f.id, siteId }, transaction });
      for (const [ai, a] of f.areas.entries()) {
        const areaId = a.id ?? (await Area.create({ siteId, floorId, name: a.name, position: ai }, { transaction })).id;
        if (a.id) await Area.update({ floorId, name: a.name, position: ai }, { where: { id: a.id, siteId }, transaction });
        for (const [ri, r] of a.rooms.entries()) {
          if (r.id) await Room.update({ areaId, name: r.name, position: ri }, { where: { id: r.id }, transaction });
          else await Room.create({ areaId, name: r.name, position: ri }, { transaction });
        }
      }
    }
    for (const m of plan.moves) await ScheduleDetectorRecord.update({ area: m.area, room: m.room }, { where: { id: m.id, siteId }, transaction });
    await audit(
      {
        organisationId: actor.organisationId,
        userId: actor.userId,
        action: "site.structure",
        entityType: "site",
        entityId: siteId,
        detail: { floors: floors.length, areas: floors.reduce((n, f) => n + f.areas.length, 0), removed: plan.removed, detectorsRenamed: plan.moves.length },
      },
      transaction,
    );
  });
  return getSite(actor, siteId);
}

/** "Add a new room" from the detector form: one room at the end of an area. */
export async function addRoom(actor: Actor, siteId: number, input: AddRoomInput): Promise<SiteDetail> {
  ensureCan(actor, "site:write");
  await db().transaction(async (transaction) => {
    await lockSite(actor, siteId, transaction);
    const area = await Area.findOne({ where: { id: input.areaId, siteId }, transaction });
    if (!area) throw new ApiError(422, "That area is not part of this site.", [{ path: "areaId", message: "not an area of this site" }]);
    const rooms = await Room.findAll({ where: { areaId: area.id }, attributes: ["name", "position"], transaction });
    if (rooms.some((r) => placeKey(r.name) === placeKey(input.name))) throw new ApiError(409, `${area.name} already has a room called ${input.name}.`, [{ path: "name", message: "already in this area" }]);
    const room = await Room.create({ areaId: area.id, name: input.name, position: Math.max(-1, ...rooms.map((r) => r.position)) + 1 }, { transaction });
    await audit({ organisationId: actor.organisationId, userId: actor.userId, action: "site.room.add", entityType: "site", entityId: siteId, detail: { area: area.name, room: input.name, roomId: room.id } }, transaction);
  });
  return getSite(actor, siteId);
}

/** Add the areas and rooms an import named that the site lacks. New areas go on the last floor (a first floor is made if there is none). */
export async function addPlaces(siteId: number, floors: SiteFloorView[], unknown: UnknownPlace[], transaction: Transaction): Promise<void> {
  const areaIds = new Map(floors.flatMap((f) => f.areas).map((a) => [placeKey(a.name), a.id]));
  let floorId = floors.at(-1)?.id;
  let areaPosition = floors.at(-1)?.areas.length ?? 0;
  for (const u of unknown) {
    let areaId = areaIds.get(placeKey(u.area));
    if (areaId === undefined) {
      floorId ??= (await Floor.create({ siteId, name: "Floor 1", position: 0 }, { transaction })).id;
      areaId = (await Area.create({ siteId, floorId, name: u.area, position: areaPosition++ }, { transaction })).id;
      areaIds.set(placeKey(u.area), areaId);
    }
    if (u.room) {
      const last = (await Room.max("position", { where: { areaId }, transaction })) as number | null;
      await Room.create({ areaId, name: u.room, position: last == null ? 0 : last + 1 }, { transaction });
    }
  }
}
