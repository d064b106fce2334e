import "server-only";
import { db } from "./db";
import { audit } from "./audit";
import { ensureCan } from "./schedules";
import { findSite, getSite, insertStructure, loadStructure, type SiteDetail } from "./sites";
import type { Actor } from "./session";
import { ScheduleDetectorRecord, Site } from "@/models";
import type { SiteCopyInput } from "@/lib/sites/site-schema";

// "Start from what exists": a new site with another site's details, floors, areas, rooms and device schedule.
// Layouts, installers, reviews and commissioning stay with the original.

export async function copySite(actor: Actor, fromSiteId: number, input: SiteCopyInput): Promise<SiteDetail> {
  ensureCan(actor, "site:write");
  ensureCan(actor, "schedule:write");
  const from = await findSite(actor, fromSiteId);
  const id = await db().transaction(async (transaction) => {
    const floors = await loadStructure(fromSiteId, transaction);
    const rows = await ScheduleDetectorRecord.findAll({ where: { siteId: fromSiteId }, order: [["position", "ASC"], ["id", "ASC"]], transaction });
    const site = await Site.create(
      { organisationId: actor.organisationId, name: input.name, address: input.address, description: from.description, contactName: from.contactName, contactPhone: from.contactPhone, contactEmail: from.contactEmail, notes: from.notes },
      { transaction },
    );
    await insertStructure(site.id, floors.map((f) => ({ name: f.name, areas: f.areas.map((a) => ({ name: a.name, rooms: a.rooms.map((r) => ({ name: r.name })) })) })), transaction);
    if (rows.length)
      await ScheduleDetectorRecord.bulkCreate(
        rows.map((r, position) => ({ siteId: site.id, position, label: r.label, catalogId: r.catalogId, area: r.area, room: r.room, cableM: r.cableM, gaugeAwg: r.gaugeAwg, gaugeMm2: r.gaugeMm2, supervision: r.supervision })),
        { transaction },
      );
    await audit({ organisationId: actor.organisationId, userId: actor.userId, action: "site.copy", entityType: "site", entityId: site.id, detail: { name: input.name, fromSiteId, detectors: rows.length } }, transaction);
    return site.id;
  });
  return getSite(actor, id);
}
