import { beforeAll, describe, expect, it } from "vitest";
import type { Sequelize } from "sequelize";
import { testDb, makeOrganisation } from "./support";
import { createSite } from "@/lib/server/sites";
import { confirmImport, listSchedule } from "@/lib/server/schedules";
import { createLayout, getLayout, listLayouts, loadLayoutForEditor } from "@/lib/server/layouts";
import { effectiveCatalogInfo } from "@/lib/server/catalogs";
import type { Actor } from "@/lib/server/session";
import { largeLayoutDocument, scheduleCsvOf } from "@/tests/api-registry/large-layout";

// Loading a layout takes the same small number of SQL statements whatever its size: no query per detector,
// input or board. Counted by wrapping the Sequelize instance's query(), which every model call goes through.

let sequelize: Sequelize;

beforeAll(() => {
  sequelize = testDb();
});

async function counted<T>(fn: () => Promise<T>): Promise<{ result: T; count: number; statements: string[] }> {
  const original = sequelize.query;
  const statements: string[] = [];
  sequelize.query = function (this: Sequelize, ...args: Parameters<Sequelize["query"]>) {
    const sql = args[0];
    statements.push(typeof sql === "string" ? sql : (sql as { query: string }).query);
    return original.apply(this, args);
  } as Sequelize["query"];
  try {
    return { result: await fn(), count: statements.length, statements };
  } finally {
    sequelize.query = original;
  }
}

async function layoutOf(actor: Actor, detectors: number) {
  const site = await createSite(actor, { name: `Query count, ${detectors} detectors`, address: "", description: "", areas: [] });
  await confirmImport(actor, site.id, scheduleCsvOf(detectors), undefined, true);
  const ids = (await listSchedule(actor, site.id)).map((d) => d.id);
  const { layout } = await createLayout(actor, site.id, { name: `${detectors} detectors`, document: largeLayoutDocument(ids) });
  return { siteId: site.id, layoutId: layout.id };
}

describe("queries per layout load", () => {
  it("GET /api/layouts/:id's and the editor page's loaders take as many queries for 500 detectors as for 10", async () => {
    const { actors } = await makeOrganisation("Query count");
    const actor = actors.designer;
    const small = await layoutOf(actor, 10);
    const large = await layoutOf(actor, 500);
    await effectiveCatalogInfo(actor.organisationId); // the parsed catalog is cached per process; both loads below find it warm

    const api10 = await counted(() => getLayout(actor, small.layoutId));
    const api500 = await counted(() => getLayout(actor, large.layoutId));
    const editor10 = await counted(() => loadLayoutForEditor(actor, small.layoutId));
    const editor500 = await counted(() => loadLayoutForEditor(actor, large.layoutId));
    const list10 = await counted(() => listLayouts(actor, small.siteId));
    const list500 = await counted(() => listLayouts(actor, large.siteId));
    console.log(
      `query count: getLayout ${api10.count} (10 detectors) / ${api500.count} (500); loadLayoutForEditor ${editor10.count} / ${editor500.count}; listLayouts ${list10.count} / ${list500.count}\n` +
        editor500.statements.map((s) => `  ${s.slice(0, 140)}`).join("\n"),
    );

    // the loads really read the big layout
    expect(api500.result.document.inputs).toHaveLength(500);
    expect(editor500.result.schedule).toHaveLength(500);
    expect(editor10.result.schedule).toHaveLength(10);

    expect(api500.count).toBe(api10.count);
    expect(editor500.count).toBe(editor10.count);
    expect(list500.count).toBe(list10.count);
    // and small: one query for the layout with its site and current revision, then the schedule and the catalog's
    // latest-version check (measured 1, 3 and 2; the bounds leave room for a lookup or two, not for one per row)
    expect(api500.count).toBeLessThanOrEqual(3);
    expect(editor500.count).toBeLessThanOrEqual(6);
    expect(list500.count).toBeLessThanOrEqual(4);
  });
});
