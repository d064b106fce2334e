import { test, expect } from "@playwright/test";
import { can, permissionTable, roles, type Role } from "@/lib/auth/permissions";
import { routes } from "@/tests/api-registry/routes";
import { routeKey, type RouteEntry } from "@/tests/api-registry/types";
import { demoMarkers, expectErrorBody, findRivalObjects, send, snapshotTables, setUpApiSuite, type CallerContext } from "./support-api";

// Every route method of the registry, called for real: signed out (401, or the public behaviour), as each
// role of the demo organisation (403 where lib/auth/permissions.ts denies the role, the entry's success
// status where it allows it), and as a member of another organisation against the demo organisation's
// objects (404, indistinguishable from a missing object). A refused request must change nothing.

const suite = setUpApiSuite();

/** A role of the rival organisation that the entry's permission allows (so only the organisation differs). */
const allowedRole = (e: RouteEntry): Role => (e.access === "public" ? "installer" : (permissionTable[e.access] as readonly Role[])[0]);

function expected(e: RouteEntry, c: CallerContext): number {
  if (e.access === "public") return e.success;
  if (c.kind === "signed-out") return 401;
  if (!can(c.role, e.access)) return 403;
  if (c.kind === "rival" && e.orgScoped) return 404;
  return e.success;
}

test.describe("permission matrix", () => {
  for (const entry of routes) {
    test(`${routeKey(entry)} (${entry.access}${entry.orgScoped ? ", organisation's object" : ""})`, async ({ playwright }) => {
      const who = [suite.callers.signedOut, ...roles.map((r) => suite.callers.demo[r]), suite.callers.rival[allowedRole(entry)]];
      for (const caller of who) {
        const spec = await entry.build({ caller, demo: suite.demoIds, fixtures: suite.fixtures });
        const want = expected(entry, caller);
        const what = `${routeKey(entry)} as ${caller.label} (${spec.method} ${spec.url})`;
        const mutating = spec.method !== "GET" && want >= 400;
        const before = mutating ? await snapshotTables(suite.conn) : null;
        const res = await send(playwright, caller.api, spec);
        expect(res.status(), `${what}: ${(await res.text()).slice(0, 300)}`).toBe(want);
        if (want >= 400) {
          await expectErrorBody(res, what);
          if (want === 401) expect((await res.json()).error, what).toMatch(/sign in/i);
          if (want === 403) expect((await res.json()).error, what).toMatch(new RegExp(`Your role \\(${caller.role}\\) cannot`));
        }
        if (before) expect(await snapshotTables(suite.conn), `${what} changed the database`).toEqual(before);
        // another organisation's answers never carry the demo organisation's data
        if (caller.kind === "rival" && want < 400 && entry.access !== "public") {
          const text = await res.text();
          const markers = spec.method === "GET" ? [...demoMarkers, (await suite.fixtures.catalogUpload()).addedEntryId] : demoMarkers;
          for (const m of markers) expect(text.includes(m), `${what} shows "${m}"`).toBe(false);
        }
      }
    });
  }
});

test("a member of another organisation walks the ids 1..N of sites and layouts and sees only its own", async () => {
  const rival = await findRivalObjects(suite.conn);
  const own = suite.callers.rival.designer.api;
  const made = await own.post(`/api/sites/${rival.siteId}/layouts`, { data: { name: "Rival layout", panelId: "panel-large-32" } });
  expect(made.status()).toBe(200);
  expect((await made.json()).layout.id).toBeGreaterThan(0);

  const [{ maxSite }] = await suite.conn.query("SELECT MAX(id) AS maxSite FROM sites");
  const [{ maxLayout }] = await suite.conn.query("SELECT MAX(id) AS maxLayout FROM layouts");
  const ids = async (sql: string) => new Set(((await suite.conn.query(sql, [rival.organisationId])) as { id: number }[]).map((r) => r.id));
  const rivalSiteIds = await ids("SELECT id FROM sites WHERE organisation_id = ?");
  const rivalLayoutIds = await ids("SELECT l.id FROM layouts l JOIN sites s ON s.id = l.site_id WHERE s.organisation_id = ?");
  const otherSiteIds = await ids("SELECT id FROM sites WHERE organisation_id <> ?");
  const otherLayoutIds = await ids("SELECT l.id FROM layouts l JOIN sites s ON s.id = l.site_id WHERE s.organisation_id <> ?");
  expect(otherSiteIds.size).toBeGreaterThan(0);
  expect(otherLayoutIds.size).toBeGreaterThan(0);

  const walker = suite.callers.rival.engineer.api;
  const notFoundBodies = new Map<string, Set<string>>();
  const seen = { own: 0, refused: 0 };
  const check = async (pattern: string, id: number, mine: boolean) => {
    const url = pattern.replace(":id", String(id));
    const res = await walker.get(url);
    const text = await res.text();
    if (mine) {
      expect(res.status(), url).toBe(200);
      seen.own++;
    } else {
      expect(res.status(), `${url}: ${text.slice(0, 200)}`).toBe(404);
      seen.refused++;
      // the same words for another organisation's object and for an id that was never used: no way to tell them apart
      const set = notFoundBodies.get(pattern) ?? new Set();
      set.add(text);
      notFoundBodies.set(pattern, set);
    }
    for (const m of demoMarkers) expect(text.includes(m), `${url} shows "${m}"`).toBe(false);
  };
  for (let id = 1; id <= maxSite + 3; id++) {
    const mine = rivalSiteIds.has(id);
    for (const p of ["/api/sites/:id", "/api/sites/:id/layouts", "/api/sites/:id/schedule", "/api/sites/:id/schedule/export.csv"]) await check(p, id, mine);
  }
  for (let id = 1; id <= maxLayout + 3; id++) {
    const mine = rivalLayoutIds.has(id);
    for (const p of ["/api/layouts/:id", "/api/layouts/:id/revisions", "/api/layouts/:id/revisions/1"]) await check(p, id, mine);
  }
  expect(seen.own).toBe(4 * rivalSiteIds.size + 3 * rivalLayoutIds.size);
  expect(seen.refused).toBeGreaterThanOrEqual(4 * otherSiteIds.size + 3 * otherLayoutIds.size);
  for (const [pattern, bodies] of notFoundBodies) expect([...bodies], `404 bodies of ${pattern}`).toHaveLength(1);

  const list = await (await walker.get("/api/sites")).json();
  expect((list.sites as { id: number }[]).map((s) => s.id).sort((a, b) => a - b)).toEqual([...rivalSiteIds].sort((a, b) => a - b));
});
