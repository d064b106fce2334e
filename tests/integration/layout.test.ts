import { describe, expect, it, beforeAll } from "vitest";
import { testDb, makeOrganisation } from "./support";
import { createSite } from "@/lib/server/sites";
import { confirmImport, listSchedule } from "@/lib/server/schedules";
import { createLayout, deleteLayout, getLayout, listLayouts, listRevisions, loadLayoutForEditor, restoreRevision, saveLayout, suggestForSite } from "@/lib/server/layouts";
import { AuditEntry, Layout, LayoutRevision } from "@/models";
import type { LayoutDocument } from "@/lib/layout/schema";
import { errorResponse } from "@/lib/server/route";

beforeAll(() => {
  testDb();
});

const csv = [
  "label,type,area,room,cable_m,gauge,supervision",
  "Front door,contact-door-surface,Ground,Hall,12,22 AWG,shared-ok",
  "Back door,contact-door-recessed,Ground,Hall,30,22 AWG,shared-ok",
  "Hall motion,motion-wall,Ground,Hall,18,22 AWG,single-eol",
].join("\n");

async function fixture() {
  const o = await makeOrganisation("Layouts");
  const site = await createSite(o.actors.designer, { name: "Layout site", address: "", description: "", areas: [] });
  await confirmImport(o.actors.designer, site.id, csv, undefined, true);
  const schedule = await listSchedule(o.actors.designer, site.id);
  const doc = (n: number): LayoutDocument => ({
    panelId: "panel-large-32",
    boards: [],
    inputs: schedule.slice(0, n).map((d, i) => ({ boardKey: "panel", input: i + 1, detectorIds: [d.id], scheme: "single-eol", placement: "at-detector" })),
    power: { standbyProfileId: "intruder-grade-2", safetyFactor: 1.2 },
    busCableM: 20,
  });
  return { ...o, site, schedule, doc };
}

describe("layouts and revisions in MariaDB", () => {
  it("creates revision 1, saves revisions 2 and 3 with the version bumped in the same transaction, and lists them", async () => {
    const { actors, site, doc } = await fixture();
    const { layout } = await createLayout(actors.designer, site.id, { name: "Option A", document: doc(1) });
    expect(layout).toMatchObject({ version: 1, currentRevision: 1, status: "draft" });
    expect(layout.summary.unplaced).toBe(2);
    const s2 = await saveLayout(actors.designer, layout.id, { version: 1, document: doc(2) });
    expect(s2.layout).toMatchObject({ version: 2, currentRevision: 2 });
    const s3 = await saveLayout(actors.engineer, layout.id, { version: 2, document: doc(3), note: "all placed" });
    expect(s3.layout.summary).toMatchObject({ unplaced: 0, inputsUsed: 3, detectorsPlaced: 3 });
    const revs = await listRevisions(actors.installer, layout.id);
    expect(revs.map((r) => r.revision)).toEqual([3, 2, 1]);
    expect(revs[0]).toMatchObject({ note: "all placed", createdBy: "Test engineer" });
    expect((await getLayout(actors.installer, layout.id)).document.inputs).toHaveLength(3);
    expect(await AuditEntry.count({ where: { entityType: "layout", entityId: String(layout.id) } })).toBe(3);
  });

  it("answers a stale version with 409 and the current version, storing nothing", async () => {
    const { actors, site, doc } = await fixture();
    const { layout } = await createLayout(actors.designer, site.id, { name: "Race", document: doc(1) });
    await saveLayout(actors.designer, layout.id, { version: 1, document: doc(2) });
    const stale = saveLayout(actors.engineer, layout.id, { version: 1, document: doc(3) });
    await expect(stale).rejects.toMatchObject({ status: 409, extra: { currentVersion: 2 } });
    const res = errorResponse(await stale.catch((e) => e));
    expect(res.status).toBe(409);
    expect(await res.json()).toMatchObject({ error: expect.stringMatching(/saved by someone else/), currentVersion: 2 });
    expect(await LayoutRevision.count({ where: { layoutId: layout.id } })).toBe(2);
    expect((await Layout.findByPk(layout.id))?.version).toBe(2);
  });

  it("lets exactly one of two simultaneous saves of the same version through", async () => {
    const { actors, site, doc } = await fixture();
    const { layout } = await createLayout(actors.designer, site.id, { name: "Simultaneous", document: doc(1) });
    const results = await Promise.allSettled([saveLayout(actors.designer, layout.id, { version: 1, document: doc(2) }), saveLayout(actors.engineer, layout.id, { version: 1, document: doc(3) })]);
    expect(results.filter((r) => r.status === "fulfilled")).toHaveLength(1);
    expect(results.filter((r) => r.status === "rejected").map((r) => (r as PromiseRejectedResult).reason.status)).toEqual([409]);
    expect(await LayoutRevision.count({ where: { layoutId: layout.id } })).toBe(2);
  });

  it("restores an old revision as a new revision with the old document", async () => {
    const { actors, site, doc } = await fixture();
    const { layout } = await createLayout(actors.designer, site.id, { name: "History", document: doc(1) });
    await saveLayout(actors.designer, layout.id, { version: 1, document: doc(3) });
    const restored = await restoreRevision(actors.designer, layout.id, 1, 2);
    expect(restored.layout).toMatchObject({ version: 3, currentRevision: 3 });
    expect(restored.document).toEqual(doc(1));
    expect((await getLayout(actors.designer, layout.id)).document).toEqual(doc(1));
    const revs = await listRevisions(actors.designer, layout.id);
    expect(revs).toHaveLength(3);
    expect(revs[0].note).toBe("Restored revision 1");
    await expect(restoreRevision(actors.designer, layout.id, 2, 2)).rejects.toMatchObject({ status: 409 });
    await expect(restoreRevision(actors.designer, layout.id, 9)).rejects.toMatchObject({ status: 404 });
    expect(await AuditEntry.count({ where: { entityType: "layout", entityId: String(layout.id), action: "layout.restore" } })).toBe(1);
  });

  it("refuses documents naming hardware or detectors that do not exist (422), storing nothing", async () => {
    const { actors, site, doc } = await fixture();
    const { layout } = await createLayout(actors.designer, site.id, { name: "Refs", document: doc(1) });
    const other = await fixture();
    const badPanel = { ...doc(1), panelId: "panel-nonexistent" };
    const foreignDetector: LayoutDocument = { ...doc(1), inputs: [{ boardKey: "panel", input: 1, detectorIds: [other.schedule[0].id], scheme: "single-eol", placement: "at-detector" }] };
    const badBoard: LayoutDocument = { ...doc(1), boards: [{ key: "b1", kind: "expansion", catalogId: "board-none", busAddress: 1 }] };
    for (const document of [badPanel, foreignDetector, badBoard]) await expect(saveLayout(actors.designer, layout.id, { version: 1, document })).rejects.toMatchObject({ status: 422 });
    await expect(createLayout(actors.designer, site.id, { name: "Bad", document: badPanel })).rejects.toMatchObject({ status: 422, issues: [{ path: "document.panelId" }] });
    expect(await LayoutRevision.count({ where: { layoutId: layout.id } })).toBe(1);
  });

  it("hides another organisation's layouts (404) and refuses installers at the server layer (403)", async () => {
    const a = await fixture();
    const b = await fixture();
    const { layout } = await createLayout(a.actors.designer, a.site.id, { name: "Mine", document: a.doc(1) });
    await expect(getLayout(b.actors.admin, layout.id)).rejects.toMatchObject({ status: 404 });
    await expect(loadLayoutForEditor(b.actors.admin, layout.id)).rejects.toMatchObject({ status: 404 });
    await expect(saveLayout(b.actors.designer, layout.id, { version: 1, document: a.doc(2) })).rejects.toMatchObject({ status: 404 });
    await expect(listRevisions(b.actors.designer, layout.id)).rejects.toMatchObject({ status: 404 });
    await expect(restoreRevision(b.actors.designer, layout.id, 1)).rejects.toMatchObject({ status: 404 });
    await expect(deleteLayout(b.actors.admin, layout.id)).rejects.toMatchObject({ status: 404 });
    await expect(listLayouts(b.actors.admin, a.site.id)).rejects.toMatchObject({ status: 404 });
    await expect(createLayout(b.actors.designer, a.site.id, { name: "Theirs", document: a.doc(1) })).rejects.toMatchObject({ status: 404 });

    await expect(saveLayout(a.actors.installer, layout.id, { version: 1, document: a.doc(2) })).rejects.toMatchObject({ status: 403 });
    await expect(createLayout(a.actors.installer, a.site.id, { name: "No", document: a.doc(1) })).rejects.toMatchObject({ status: 403 });
    await expect(restoreRevision(a.actors.installer, layout.id, 1)).rejects.toMatchObject({ status: 403 });
    await expect(deleteLayout(a.actors.installer, layout.id)).rejects.toMatchObject({ status: 403 });
    expect((await loadLayoutForEditor(a.actors.installer, layout.id)).document).toEqual(a.doc(1));
    expect(await LayoutRevision.count({ where: { layoutId: layout.id } })).toBe(1);
  });

  it("loads the editor's data in a bounded number of queries, however many revisions there are", async () => {
    const { actors, site, doc } = await fixture();
    const { layout } = await createLayout(actors.designer, site.id, { name: "Counted", document: doc(1) });
    for (let v = 1; v <= 4; v++) await saveLayout(actors.designer, layout.id, { version: v, document: doc(1 + (v % 3)) });
    // Sequelize reads options.logging on every query; the type does not declare the field.
    const sequelize = testDb() as unknown as { options: { logging: unknown } };
    const sqls: string[] = [];
    const before = sequelize.options.logging;
    sequelize.options.logging = (sql: string) => void sqls.push(sql);
    try {
      const data = await loadLayoutForEditor(actors.designer, layout.id);
      expect(data.layout.currentRevision).toBe(5);
      expect(data.schedule).toHaveLength(3);
      expect(data.catalog.panels.length).toBeGreaterThan(0);
    } finally {
      sequelize.options.logging = before;
    }
    // the session lookup is the caller's; here: the layout with its site and current revision, the schedule, the organisation's latest catalog upload (none: the shipped files)
    expect(sqls.length).toBeGreaterThan(0);
    expect(sqls.length).toBeLessThanOrEqual(3);
  });

  it("lists layouts with their summaries, deletes with an audit entry", async () => {
    const { actors, site, doc } = await fixture();
    const a = await createLayout(actors.designer, site.id, { name: "One", document: doc(3) });
    await createLayout(actors.designer, site.id, { name: "Blank", panelId: "panel-compact-8" });
    const list = await listLayouts(actors.installer, site.id);
    expect(list.map((l) => l.name).sort()).toEqual(["Blank", "One"]);
    expect(list.find((l) => l.name === "Blank")?.summary).toMatchObject({ panelId: "panel-compact-8", unplaced: 3, inputsUsed: 0 });
    await deleteLayout(actors.designer, a.layout.id);
    expect((await listLayouts(actors.designer, site.id)).map((l) => l.name)).toEqual(["Blank"]);
    expect(await LayoutRevision.count({ where: { layoutId: a.layout.id } })).toBe(0);
    expect(await AuditEntry.count({ where: { action: "layout.delete", entityId: String(a.layout.id) } })).toBe(1);
  });

  it("suggests hardware both ways and creates a layout from a suggestion", async () => {
    const { actors, site } = await fixture();
    const { suggestions } = await suggestForSite(actors.designer, site.id);
    expect(suggestions.map((s) => s.allowShared)).toEqual([false, true]);
    for (const s of suggestions) {
      expect(s.found).toBe(true);
      expect(s.counts?.error).toBe(0);
      expect(s.inputsUsed).toBeGreaterThan(0);
    }
    // two shared-ok door contacts may share an input only in the second
    expect(suggestions[0].sharedInputs).toBe(0);
    const created = await createLayout(actors.designer, site.id, { name: "Suggested", suggestion: { allowShared: true } });
    expect(created.layout.summary.unplaced).toBe(0);
    expect(created.document).toEqual(suggestions[1].document);
  });

  it("passes a Class A request to the suggestion and keeps each input's pathway through save and load", async () => {
    const o = await makeOrganisation("Class A");
    const site = await createSite(o.actors.designer, { name: "Fire site", address: "", description: "", areas: [] });
    await confirmImport(o.actors.designer, site.id, ["label,type,area,room,cable_m,gauge,supervision", "Stair smoke,smoke-4wire-no,Ground,Stair,25,22 AWG,double-eol"].join("\n"), undefined, true);
    const plain = await suggestForSite(o.actors.designer, site.id);
    const { suggestions } = await suggestForSite(o.actors.designer, site.id, { pathway: "class-a" });
    expect(plain.suggestions.map((s) => s.pathway)).toEqual(["class-b", "class-b"]);
    expect(suggestions.map((s) => s.pathway)).toEqual(["class-a", "class-a"]);
    expect(plain.suggestions[0].document?.inputs.every((i) => i.pathway === undefined)).toBe(true);
    expect(suggestions[0].found).toBe(true);
    expect(suggestions[0].counts?.error).toBe(0);
    expect(suggestions[0].document?.inputs.map((i) => i.pathway)).toEqual(["class-a"]);
    const created = await createLayout(o.actors.designer, site.id, { name: "Class A", suggestion: { allowShared: false, pathway: "class-a" } });
    expect(created.document.inputs.map((i) => i.pathway)).toEqual(["class-a"]);
    // the designer turns it back to Class B and saves; the stored document follows
    const doc: LayoutDocument = { ...created.document, inputs: created.document.inputs.map(({ pathway: _p, ...i }) => i) };
    await saveLayout(o.actors.designer, created.layout.id, { version: created.layout.version, document: doc });
    expect((await getLayout(o.actors.designer, created.layout.id)).document.inputs.map((i) => i.pathway)).toEqual([undefined]);
    await saveLayout(o.actors.designer, created.layout.id, { version: created.layout.version + 1, document: created.document });
    expect((await getLayout(o.actors.designer, created.layout.id)).document.inputs.map((i) => i.pathway)).toEqual(["class-a"]);
  });
});
