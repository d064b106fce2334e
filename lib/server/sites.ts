import "server-only";
import { Op, type Transaction } from "sequelize";
import { bindModels, db } from "./db";
import { audit } from "./audit";
import { notFound, ApiError } from "./errors";
import { Area, Floor, Membership, Room, Site, SiteInstaller, User } from "@/models";
import type { Actor } from "./session";
import { can, refusal } from "@/lib/auth/permissions";
import { siteInputSchema, type FloorNode, type SiteInput, type SiteUpdate } from "@/lib/sites/site-schema";
import type { z } from "zod";

export type SiteInputDraft = z.input<typeof siteInputSchema>;

export interface SiteSummary {
  id: number;
  name: string;
  address: string;
  description: string;
  archivedAt: string | null;
  updatedAt: string;
}
export interface SiteInstallerView {
  userId: number;
  name: string;
  email: string;
}
export interface SiteAreaView {
  id: number;
  name: string;
  floorId: number;
  rooms: { id: number; name: string }[];
}
export interface SiteFloorView {
  id: number;
  name: string;
  areas: SiteAreaView[];
}
export interface SiteDetail extends SiteSummary {
  contactName: string;
  contactPhone: string;
  contactEmail: string;
  notes: string;
  /** EN 50131-1 security grade, 1 to 4; null when not chosen. */
  securityGrade: 1 | 2 | 3 | 4 | null;
  installers: SiteInstallerView[];
  floors: SiteFloorView[];
  /** Every area of every floor, in floor order: what a detector's area is chosen from. */
  areas: SiteAreaView[];
}

const summary = (s: Site): SiteSummary => ({ id: s.id, name: s.name, address: s.address, description: s.description, archivedAt: s.archivedAt ? s.archivedAt.toISOString() : null, updatedAt: s.updatedAt.toISOString() });

export async function listSites(actor: Actor, opts: { archived?: "include" | "only" | "exclude" } = {}): Promise<SiteSummary[]> {
  bindModels();
  const archived = opts.archived ?? "exclude";
  const where = { organisationId: actor.organisationId, ...(archived === "exclude" ? { archivedAt: null } : archived === "only" ? { archivedAt: { [Op.ne]: null } } : {}) };
  const sites = await Site.findAll({ where, order: [["name", "ASC"], ["id", "ASC"]] });
  return sites.map(summary);
}

/** A site of the actor's organisation, or 404: another organisation's ids are indistinguishable from missing ones. */
export async function findSite(actor: Actor, siteId: number, transaction?: Transaction): Promise<Site> {
  bindModels();
  const site = await Site.findOne({ where: { id: siteId, organisationId: actor.organisationId }, transaction });
  if (!site) throw notFound("That site");
  return site;
}

/** The floors of a site with their areas and rooms, in order (three queries). */
export async function loadStructure(siteId: number, transaction?: Transaction): Promise<SiteFloorView[]> {
  const floors = await Floor.findAll({ where: { siteId }, order: [["position", "ASC"], ["id", "ASC"]], transaction });
  const areas = await Area.findAll({ where: { siteId }, order: [["position", "ASC"], ["id", "ASC"]], transaction });
  const rooms = areas.length ? await Room.findAll({ where: { areaId: { [Op.in]: areas.map((a) => a.id) } }, order: [["position", "ASC"], ["id", "ASC"]], transaction }) : [];
  return floors.map((f) => ({
    id: f.id,
    name: f.name,
    areas: areas.filter((a) => a.floorId === f.id).map((a) => ({ id: a.id, name: a.name, floorId: f.id, rooms: rooms.filter((r) => r.areaId === a.id).map((r) => ({ id: r.id, name: r.name })) })),
  }));
}

/** Members assigned to install the site who are still installers of the organisation. */
export async function siteInstallers(organisationId: number, siteId: number, transaction?: Transaction): Promise<SiteInstallerView[]> {
  bindModels();
  const rows = await SiteInstaller.findAll({ where: { siteId }, include: [{ model: User, as: "user", attributes: ["id", "name", "email"] }], order: [["id", "ASC"]], transaction });
  if (!rows.length) return [];
  const still = await Membership.findAll({ where: { organisationId, role: "installer", userId: { [Op.in]: rows.map((r) => r.userId) } }, attributes: ["userId"], transaction });
  const ok = new Set(still.map((m) => m.userId));
  return rows.flatMap((r) => {
    const u = (r as SiteInstaller & { user?: User }).user;
    return u && ok.has(u.id) ? [{ userId: u.id, name: u.name, email: u.email }] : [];
  });
}

export async function getSite(actor: Actor, siteId: number): Promise<SiteDetail> {
  const site = await findSite(actor, siteId);
  const [floors, installers] = await Promise.all([loadStructure(siteId), siteInstallers(actor.organisationId, siteId)]);
  return {
    ...summary(site),
    contactName: site.contactName,
    contactPhone: site.contactPhone,
    contactEmail: site.contactEmail,
    notes: site.notes ?? "",
    securityGrade: (site.securityGrade ?? null) as SiteDetail["securityGrade"],
    installers,
    floors,
    areas: floors.flatMap((f) => f.areas),
  };
}

/** Insert floors with their areas and rooms, in the order given. */
export async function insertStructure(siteId: number, floors: FloorNode[], transaction: Transaction) {
  for (const [fi, f] of floors.entries()) {
    const floor = await Floor.create({ siteId, name: f.name, position: fi }, { transaction });
    for (const [ai, a] of f.areas.entries()) {
      const area = await Area.create({ siteId, floorId: floor.id, name: a.name, position: ai }, { transaction });
      if (a.rooms.length) await Room.bulkCreate(a.rooms.map((r, ri) => ({ areaId: area.id, name: r.name, position: ri })), { transaction });
    }
  }
}

/** The older flat list of areas: each becomes a floor of the same name holding one area (as the migration did). */
const floorsOf = (input: SiteInput): FloorNode[] =>
  input.floors ?? (input.areas ?? []).map((a) => ({ name: a.name, areas: [{ name: a.name, rooms: a.rooms.map((r) => ({ name: r })) }] }));

/** `raw` is parsed here as well as in the handler, so server callers get the defaults too. */
export async function createSite(actor: Actor, raw: SiteInputDraft): Promise<SiteDetail> {
  const input = siteInputSchema.parse(raw);
  const sequelize = db();
  const id = await sequelize.transaction(async (transaction) => {
    const site = await Site.create(
      { organisationId: actor.organisationId, name: input.name, address: input.address, description: input.description, contactName: input.contactName, contactPhone: input.contactPhone, contactEmail: input.contactEmail, notes: input.notes, securityGrade: input.securityGrade ?? null },
      { transaction },
    );
    await insertStructure(site.id, floorsOf(input), transaction);
    await audit({ organisationId: actor.organisationId, userId: actor.userId, action: "site.create", entityType: "site", entityId: site.id, detail: { name: input.name } }, transaction);
    return site.id;
  });
  return getSite(actor, id);
}

/** Installers must be members of the organisation with the installer role. */
async function checkInstallers(actor: Actor, userIds: number[], transaction: Transaction) {
  const unique = [...new Set(userIds)];
  const members = await Membership.findAll({ where: { organisationId: actor.organisationId, userId: { [Op.in]: unique } }, attributes: ["userId", "role"], transaction });
  const roleOf = new Map(members.map((m) => [m.userId, m.role]));
  const issues = unique.flatMap((u, i) => {
    const role = roleOf.get(u);
    if (role === "installer") return [];
    return [{ path: `installerUserIds.${i}`, message: role ? "this member is not an installer; change their role on the members page first" : "not a member of this organisation" }];
  });
  if (issues.length) throw new ApiError(422, "Only installers of this organisation can be assigned to a site; nothing was changed.", issues);
  return unique;
}

export async function updateSite(actor: Actor, siteId: number, patch: SiteUpdate): Promise<SiteDetail> {
  const sequelize = db();
  await sequelize.transaction(async (transaction) => {
    const site = await Site.findOne({ where: { id: siteId, organisationId: actor.organisationId }, transaction, lock: transaction.LOCK.UPDATE });
    if (!site) throw notFound("That site");
    const { installerUserIds, ...details } = patch;
    if (installerUserIds) {
      const ids = await checkInstallers(actor, installerUserIds, transaction);
      await SiteInstaller.destroy({ where: { siteId, userId: { [Op.notIn]: ids.length ? ids : [0] } }, transaction });
      const have = new Set((await SiteInstaller.findAll({ where: { siteId }, attributes: ["userId"], transaction })).map((r) => r.userId));
      const add = ids.filter((u) => !have.has(u));
      if (add.length) await SiteInstaller.bulkCreate(add.map((userId) => ({ siteId, userId })), { transaction });
    }
    if (Object.keys(details).length) await site.update(details, { transaction });
    await audit({ organisationId: actor.organisationId, userId: actor.userId, action: "site.update", entityType: "site", entityId: site.id, detail: patch }, transaction);
  });
  return getSite(actor, siteId);
}

/** Archive (hide from the list, keep everything) or restore. Refused to roles without "site:archive". */
export async function setSiteArchived(actor: Actor, siteId: number, archived: boolean): Promise<SiteDetail> {
  if (!can(actor.role, "site:archive")) throw new ApiError(403, refusal(actor.role, "site:archive"));
  await db().transaction(async (transaction) => {
    const site = await Site.findOne({ where: { id: siteId, organisationId: actor.organisationId }, transaction, lock: transaction.LOCK.UPDATE });
    if (!site) throw notFound("That site");
    if (!!site.archivedAt === archived) throw new ApiError(409, archived ? `${site.name} is already archived.` : `${site.name} is not archived.`);
    await site.update({ archivedAt: archived ? new Date() : null }, { transaction });
    await audit({ organisationId: actor.organisationId, userId: actor.userId, action: archived ? "site.archive" : "site.restore", entityType: "site", entityId: site.id, detail: { name: site.name } }, transaction);
  });
  return getSite(actor, siteId);
}

/** Members of the organisation with the installer role: whom a site can be assigned to. */
export async function listInstallerMembers(actor: Actor): Promise<SiteInstallerView[]> {
  bindModels();
  const rows = await Membership.findAll({ where: { organisationId: actor.organisationId, role: "installer" }, include: [{ model: User, attributes: ["id", "name", "email"] }] });
  return rows
    .flatMap((m) => {
      const u = (m as Membership & { User?: User }).User;
      return u ? [{ userId: u.id, name: u.name, email: u.email }] : [];
    })
    .sort((a, b) => a.name.localeCompare(b.name));
}
