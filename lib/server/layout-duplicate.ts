import "server-only";
import { db } from "./db";
import { audit } from "./audit";
import { ApiError, notFound } from "./errors";
import { catalogFor, ensureCan, loadSchedule } from "./schedules";
import { referenceIssues, solveForSave } from "./layouts";
import type { Actor } from "./session";
import { Layout, LayoutRevision, Site } from "@/models";
import { layoutDocumentSchema } from "@/lib/layout/schema";
import { copyName, type DuplicateLayoutInput } from "@/lib/layout/duplicate-schema";

// "Start from what exists": a layout's current design as a new draft layout of the same site, with a history of its own
// (revision 1); the original, its revisions, review and commissioning are untouched.

export interface DuplicatedLayout {
  id: number;
  siteId: number;
  name: string;
  from: { layoutId: number; revision: number };
}

export async function duplicateLayout(actor: Actor, layoutId: number, input: DuplicateLayoutInput): Promise<DuplicatedLayout> {
  ensureCan(actor, "layout:write");
  const source = await Layout.findOne({ where: { id: layoutId }, include: [{ model: Site, as: "site", attributes: ["id"], where: { organisationId: actor.organisationId }, required: true }] });
  if (!source) throw notFound("That layout");
  const rev = await LayoutRevision.findOne({ where: { layoutId, revision: source.currentRevision }, attributes: ["document"] });
  if (!rev) throw notFound("That layout's current revision");
  const document = layoutDocumentSchema.parse(rev.document);
  const [schedule, catalog] = await Promise.all([loadSchedule(source.siteId), catalogFor(actor.organisationId)]);
  const issues = referenceIssues(document, schedule, catalog);
  if (issues.length) throw new ApiError(422, `${source.name} refers to hardware or detectors that no longer exist, so it cannot be duplicated as it is; nothing was made.`, issues);
  const summary = solveForSave(document, schedule, catalog);
  const name = input.name ?? copyName(source.name);
  const from = { layoutId, revision: source.currentRevision };
  const id = await db().transaction(async (transaction) => {
    const l = await Layout.create({ siteId: source.siteId, name, currentRevision: 1, version: 1, createdBy: actor.userId }, { transaction });
    await LayoutRevision.create({ layoutId: l.id, revision: 1, document, summary, note: `Duplicated from ${source.name}, revision ${from.revision}`.slice(0, 500), createdBy: actor.userId }, { transaction });
    await audit({ organisationId: actor.organisationId, userId: actor.userId, action: "layout.duplicate", entityType: "layout", entityId: l.id, detail: { siteId: source.siteId, name, from } }, transaction);
    return l.id;
  });
  return { id, siteId: source.siteId, name, from };
}
