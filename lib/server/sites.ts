import "server-only";
import { bindModels, db } from "./db";
import { audit } from "./audit";
import { notFound, ApiError } from "./errors";
import { Area, Membership, Room, Site, User } from "@/models";
import type { Actor } from "./session";
import type { SiteInput } from "@/lib/sites/site-schema";
import type { z } from "zod";
import type { siteUpdateSchema } from "@/lib/sites/site-schema";

export interface SiteSummary {
  id: number;
  name: string;
  address: string;
  description: string;
  installerUserId: number | null;
  updatedAt: string;
}
export interface SiteDetail extends SiteSummary {
  areas: { id: number; name: string; rooms: { id: number; name: string }[] }[];
}

const summary = (s: Site): SiteSummary => ({ id: s.id, name: s.name, address: s.address, description: s.description, installerUserId: s.installerUserId, updatedAt: s.updatedAt.toISOString() });

export async function listSites(actor: Actor): Promise<SiteSummary[]> {
  bindModels();
  const sites = await Site.findAll({ where: { organisationId: actor.organisationId }, order: [["name", "ASC"]] });
  return sites.map(summary);
}

/** A site of the actor's organisation, or 404: another organisation's ids are indistinguishable from missing ones. */
export async function findSite(actor: Actor, siteId: number): Promise<Site> {
  bindModels();
  const site = await Site.findOne({ where: { id: siteId, organisationId: actor.organisationId } });
  if (!site) throw notFound("That site");
  return site;
}

export async function getSite(actor: Actor, siteId: number): Promise<SiteDetail> {
  const site = await findSite(actor, siteId);
  const areas = await Area.findAll({ where: { siteId }, include: [{ model: Room, as: "rooms" }], order: [["position", "ASC"], ["id", "ASC"], [{ model: Room, as: "rooms" }, "id", "ASC"]] });
  return {
    ...summary(site),
    areas: areas.map((a) => ({ id: a.id, name: a.name, rooms: ((a as Area & { rooms: Room[] }).rooms ?? []).map((r) => ({ id: r.id, name: r.name })) })),
  };
}

export async function createSite(actor: Actor, input: SiteInput): Promise<SiteDetail> {
  const sequelize = db();
  const id = await sequelize.transaction(async (transaction) => {
    const site = await Site.create({ organisationId: actor.organisationId, name: input.name, address: input.address, description: input.description, installerUserId: null }, { transaction });
    for (const [position, a] of input.areas.entries()) {
      const area = await Area.create({ siteId: site.id, name: a.name, position }, { transaction });
      if (a.rooms.length) await Room.bulkCreate(a.rooms.map((name) => ({ areaId: area.id, name })), { transaction });
    }
    await audit({ organisationId: actor.organisationId, userId: actor.userId, action: "site.create", entityType: "site", entityId: site.id, detail: { name: input.name } }, transaction);
    return site.id;
  });
  return getSite(actor, id);
}

export async function updateSite(actor: Actor, siteId: number, patch: z.infer<typeof siteUpdateSchema>): Promise<SiteDetail> {
  const sequelize = db();
  await sequelize.transaction(async (transaction) => {
    const site = await Site.findOne({ where: { id: siteId, organisationId: actor.organisationId }, transaction, lock: transaction.LOCK.UPDATE });
    if (!site) throw notFound("That site");
    if (patch.installerUserId != null) {
      const m = await Membership.findOne({ where: { organisationId: actor.organisationId, userId: patch.installerUserId }, include: [{ model: User }], transaction });
      if (!m) throw new ApiError(422, "The assigned installer must be a member of this organisation.", [{ path: "installerUserId", message: "not a member" }]);
    }
    await site.update(patch, { transaction });
    await audit({ organisationId: actor.organisationId, userId: actor.userId, action: "site.update", entityType: "site", entityId: site.id, detail: patch }, transaction);
  });
  return getSite(actor, siteId);
}
