import { afterEach, beforeAll, describe, expect, it, vi } from "vitest";
import { testDb, makeOrganisation } from "./support";
import { createSite, getSite } from "@/lib/server/sites";
import { confirmImport, listSchedule } from "@/lib/server/schedules";
import { createLayout, deleteLayout, getLayout, saveLayout } from "@/lib/server/layouts";
import { ApiError } from "@/lib/server/errors";
import { AuditEntry, Layout, LayoutRevision, ScheduleDetectorRecord, Site } from "@/models";
import type { LayoutDocument } from "@/lib/layout/schema";
import { largeLayoutDocument, scheduleCsvOf } from "@/tests/api-registry/large-layout";

// Many clients saving one layout at once through lib/server/layouts.ts against MariaDB: each save is a new
// revision or a 409, never lost and never doubled; and multi-row writes are all or nothing.

beforeAll(() => {
  testDb();
});

afterEach(() => {
  vi.restoreAllMocks();
});

async function fixture(detectors = 6) {
  const o = await makeOrganisation("Concurrency");
  const site = await createSite(o.actors.designer, { name: "Concurrency site", address: "", description: "", areas: [] });
  await confirmImport(o.actors.designer, site.id, scheduleCsvOf(detectors), undefined, true);
  const ids = (await listSchedule(o.actors.designer, site.id)).map((d) => d.id);
  const doc = (busCableM: number): LayoutDocument => largeLayoutDocument(ids, busCableM);
  const { layout } = await createLayout(o.actors.designer, site.id, { name: "Shared layout", document: doc(0) });
  return { ...o, site, ids, doc, layoutId: layout.id };
}

type Outcome = { client: number; round: number; busCableM: number; readVersion: number; accepted: boolean; version?: number; revision?: number };

function outcomeOf(reason: unknown): "409" {
  if (reason instanceof ApiError && reason.status === 409) return "409";
  throw reason; // anything else (a deadlock, a 500) fails the test
}

describe("concurrent saves of one layout", () => {
  it("20 clients saving the version they all read: exactly one new revision, 19 refusals with 409", async () => {
    const { actors, layoutId, doc } = await fixture();
    const clients = 20;
    const results = await Promise.allSettled(Array.from({ length: clients }, (_, i) => saveLayout(i % 2 ? actors.designer : actors.engineer, layoutId, { version: 1, document: doc(1000 + i) })));
    const accepted = results.flatMap((r, i) => (r.status === "fulfilled" ? [{ i, v: r.value }] : []));
    for (const r of results) if (r.status === "rejected") expect(outcomeOf(r.reason)).toBe("409");
    expect(accepted).toHaveLength(1);
    expect(await LayoutRevision.count({ where: { layoutId } })).toBe(2);
    const now = await getLayout(actors.installer, layoutId);
    expect(now.layout).toMatchObject({ version: 2, currentRevision: 2 });
    expect(now.document).toEqual(doc(1000 + accepted[0].i));
  });

  it("20 clients each reading and saving 5 times: revisions = 1 + accepted saves, each accepted document stored once, the last one current", async () => {
    const { actors, layoutId, doc } = await fixture();
    const clients = 20;
    const rounds = 5;
    const outcomes: Outcome[] = [];
    await Promise.all(
      Array.from({ length: clients }, async (_, client) => {
        const actor = [actors.admin, actors.designer, actors.engineer][client % 3];
        for (let round = 0; round < rounds; round++) {
          await new Promise((r) => setTimeout(r, Math.random() * 40)); // the clients drift apart
          const read = await getLayout(actor, layoutId);
          const readVersion = read.layout.version;
          const busCableM = client * 100 + round + 1; // a document no other save has
          try {
            const { layout } = await saveLayout(actor, layoutId, { version: read.layout.version, document: doc(busCableM) });
            outcomes.push({ client, round, busCableM, readVersion, accepted: true, version: layout.version, revision: layout.currentRevision });
          } catch (e) {
            outcomeOf(e);
            outcomes.push({ client, round, busCableM, readVersion, accepted: false });
          }
        }
      }),
    );
    const accepted = outcomes.filter((o) => o.accepted);
    console.log(`concurrency: ${outcomes.length} saves, ${accepted.length} accepted, ${outcomes.length - accepted.length} refused with 409`);
    expect(outcomes).toHaveLength(clients * rounds);
    // an accepted save moved the version on by one; a refused one was beaten by the save that made the next version
    for (const a of accepted) expect(a.version).toBe(a.readVersion + 1);
    const made = new Set(accepted.map((a) => a.version));
    for (const r of outcomes.filter((o) => !o.accepted)) expect(made.has(r.readVersion + 1), `refusal of client ${r.client} at version ${r.readVersion}`).toBe(true);

    const revisions = await LayoutRevision.findAll({ where: { layoutId }, order: [["revision", "ASC"]] });
    expect(revisions).toHaveLength(1 + accepted.length);
    expect(revisions.map((r) => r.revision)).toEqual(Array.from({ length: 1 + accepted.length }, (_, i) => i + 1));
    // each accepted save sits at the revision it was told, with its own document
    for (const a of accepted) expect((revisions[a.revision! - 1].document as LayoutDocument).busCableM, `client ${a.client} round ${a.round}`).toBe(a.busCableM);
    expect(new Set(accepted.map((a) => a.version)).size).toBe(accepted.length);

    const last = accepted.reduce((x, y) => (y.version! > x.version! ? y : x));
    const now = await getLayout(actors.installer, layoutId);
    expect(now.layout).toMatchObject({ version: 1 + accepted.length, currentRevision: 1 + accepted.length });
    expect(now.document).toEqual(doc(last.busCableM));
    expect(await AuditEntry.count({ where: { entityType: "layout", entityId: String(layoutId), action: "layout.save" } })).toBe(accepted.length);
  });
});

describe("multi-row writes are all or nothing", () => {
  const failAudit = () => vi.spyOn(AuditEntry, "create").mockRejectedValueOnce(new Error("injected failure after the other rows of the change were written"));

  it("a layout whose audit entry fails leaves no layout and no revision", async () => {
    const { actors, site, doc } = await fixture();
    const layouts = await Layout.count({ where: { siteId: site.id } });
    const revisions = await LayoutRevision.count();
    failAudit();
    await expect(createLayout(actors.designer, site.id, { name: "Doomed", document: doc(5) })).rejects.toThrow(/injected failure/);
    expect(await Layout.count({ where: { siteId: site.id } })).toBe(layouts);
    expect(await LayoutRevision.count()).toBe(revisions);
  });

  it("a save whose audit entry fails keeps the version and adds no revision", async () => {
    const { actors, layoutId, doc } = await fixture();
    failAudit();
    await expect(saveLayout(actors.designer, layoutId, { version: 1, document: doc(7) })).rejects.toThrow(/injected failure/);
    expect((await Layout.findByPk(layoutId))?.version).toBe(1);
    expect(await LayoutRevision.count({ where: { layoutId } })).toBe(1);
    // and the next save with the same version goes through
    await expect(saveLayout(actors.designer, layoutId, { version: 1, document: doc(8) })).resolves.toMatchObject({ layout: { version: 2 } });
  });

  it("a deletion whose audit entry fails keeps the layout and its revisions", async () => {
    const { actors, layoutId } = await fixture();
    failAudit();
    await expect(deleteLayout(actors.designer, layoutId)).rejects.toThrow(/injected failure/);
    expect(await Layout.count({ where: { id: layoutId } })).toBe(1);
    expect(await LayoutRevision.count({ where: { layoutId } })).toBe(1);
  });

  it("a schedule import whose audit entry fails stores none of its rows", async () => {
    const { actors, site } = await fixture(3);
    failAudit();
    await expect(confirmImport(actors.designer, site.id, scheduleCsvOf(40), undefined, true)).rejects.toThrow(/injected failure/);
    expect(await ScheduleDetectorRecord.count({ where: { siteId: site.id } })).toBe(3);
  });

  it("a site whose audit entry fails leaves no site, floor or room", async () => {
    const { actors } = await makeOrganisation("Atomic site");
    failAudit();
    await expect(createSite(actors.designer, { name: "Doomed site", address: "", description: "", areas: [{ name: "Ground", rooms: ["Hall", "Office"] }] })).rejects.toThrow(/injected failure/);
    expect(await Site.count({ where: { organisationId: actors.designer.organisationId } })).toBe(0);
    const ok = await createSite(actors.designer, { name: "Kept site", address: "", description: "", areas: [{ name: "Ground", rooms: ["Hall"] }] });
    expect((await getSite(actors.designer, ok.id)).areas).toHaveLength(1);
  });
});
