import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { QueryTypes } from "sequelize";
import { makeOrganisation, testDb } from "./support";
import { Browser, installTestRequestScope, signIn, signOut } from "./auth-flow";
import { Membership } from "@/models";
import * as auth from "@/app/api/auth/[...nextauth]/route";
import * as layoutRoute from "@/app/api/layouts/[layoutId]/route";
import * as sites from "@/app/api/sites/route";
import { createSite } from "@/lib/server/sites";
import { confirmImport, listSchedule } from "@/lib/server/schedules";
import { createLayout, getLayout, saveLayout, setLayoutArchived } from "@/lib/server/layouts";
import { changeRole } from "@/lib/server/members";
import { changePassword } from "@/lib/server/passwords";
import { actorCacheSize } from "@/lib/server/actor-cache";
import { updateOrganisationSettings } from "@/lib/server/organisation-settings";
import { currentActor, type Actor } from "@/lib/server/session";
import type { LayoutDocument } from "@/lib/layout/schema";

installTestRequestScope();

// The test organisation's members all have this password (tests/integration/support.ts).
const PASSWORD = "test-password-1";
// a cache far longer than any test step, so what ends a cached session check here is the clearing, never expiry
const before = process.env.LOOPWRIGHT_ACTOR_CACHE_MS;
beforeAll(() => {
  process.env.LOOPWRIGHT_ACTOR_CACHE_MS = "600000";
  testDb();
});
afterAll(() => {
  if (before === undefined) delete process.env.LOOPWRIGHT_ACTOR_CACHE_MS;
  else process.env.LOOPWRIGHT_ACTOR_CACHE_MS = before;
});

const csv = ["label,type,area,room,cable_m,gauge,supervision", "Front door,contact-door-surface,Ground,Hall,12,22 AWG,shared-ok", "Hall motion,motion-wall,Ground,Hall,18,22 AWG,single-eol"].join("\n");

async function layoutFixture() {
  const o = await makeOrganisation("Cheap reads");
  const site = await createSite(o.actors.designer, { name: "Read site", address: "", description: "", areas: [] });
  await confirmImport(o.actors.designer, site.id, csv, undefined, true);
  const schedule = await listSchedule(o.actors.designer, site.id);
  const document: LayoutDocument = {
    panelId: "panel-large-32",
    boards: [],
    inputs: schedule.map((d, i) => ({ boardKey: "panel", input: i + 1, detectorIds: [d.id], scheme: "single-eol", placement: "at-detector" })),
    power: { standbyProfileId: "intruder-grade-2", safetyFactor: 1.2 },
    busCableM: 20,
  };
  const made = await createLayout(o.actors.designer, site.id, { name: "Read me", document });
  const browser = new Browser();
  expect((await signIn(browser, auth.POST, o.actors.designer.email, PASSWORD)).ok).toBe(true);
  return { ...o, document, layoutId: made.layout.id, browser };
}

/** What the session check makes of this browser's cookie, as every route handler sees it. */
async function whoAmI(b: Browser): Promise<Actor> {
  const res = await b.call(async () => Response.json(await currentActor()), "GET", "/api/whoami");
  const actor = (await res.json()) as Actor | null;
  if (!actor) throw new Error("signed out");
  return actor;
}

const read = (b: Browser, id: number, ifNoneMatch?: string) => {
  if (ifNoneMatch) b.extraHeaders["if-none-match"] = ifNoneMatch;
  else delete b.extraHeaders["if-none-match"];
  return b.call(layoutRoute.GET, "GET", `/api/layouts/${id}`, { params: { layoutId: String(id) } });
};

describe("a layout read sends the stored revision as stored, with an ETag", () => {
  it("answers the same JSON as the model read, the document as the database holds it, and 304 for a matching If-None-Match", async () => {
    const { actors, layoutId, browser, document } = await layoutFixture();
    const res = await read(browser, layoutId);
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toMatch(/^application\/json/);
    const etag = res.headers.get("etag");
    expect(etag).toMatch(/^".+"$/);
    const text = await res.text();
    // byte for byte what the hydrating read answered before
    expect(text).toBe(JSON.stringify(await getLayout(actors.designer, layoutId)));
    const [stored] = await testDb().query<{ d: string }>("SELECT CAST(r.document AS CHAR) AS d FROM layout_revisions r JOIN layouts l ON l.id = r.layout_id AND r.revision = l.current_revision WHERE l.id = ?", {
      replacements: [layoutId],
      type: QueryTypes.SELECT,
    });
    expect(text.endsWith(`"document":${stored.d}}`)).toBe(true);
    expect(JSON.parse(text).document).toEqual(document);

    const again = await read(browser, layoutId, etag!);
    expect(again.status).toBe(304);
    expect(await again.text()).toBe("");
    expect(again.headers.get("etag")).toBe(etag);
    // a list, and the weak form of the same tag, match too (RFC 9110 13.1.2 weak comparison for If-None-Match)
    expect((await read(browser, layoutId, `"other", W/${etag}`)).status).toBe(304);
    expect((await read(browser, layoutId, `"other"`)).status).toBe(200);
  });

  it("a save, an archive and another organisation's request each get a fresh answer, never a 304 for the old tag", async () => {
    const { actors, layoutId, browser, document } = await layoutFixture();
    const first = (await read(browser, layoutId)).headers.get("etag")!;
    await saveLayout(actors.designer, layoutId, { version: 1, document: { ...document, busCableM: 33 } });
    const saved = await read(browser, layoutId, first);
    expect(saved.status).toBe(200);
    const body = (await saved.json()) as { layout: { version: number }; document: LayoutDocument };
    expect(body.layout.version).toBe(2);
    expect(body.document.busCableM).toBe(33);
    const second = saved.headers.get("etag")!;
    expect(second).not.toBe(first);

    // archiving changes no version, but the answer (archivedAt) changes: so does the tag
    await setLayoutArchived(actors.designer, layoutId, true);
    const archived = await read(browser, layoutId, second);
    expect(archived.status).toBe(200);
    expect(((await archived.json()) as { layout: { archivedAt: string | null } }).layout.archivedAt).not.toBeNull();

    const stranger = await makeOrganisation("Cheap reads other");
    const other = new Browser();
    await signIn(other, auth.POST, stranger.actors.designer.email, PASSWORD);
    expect((await read(other, layoutId)).status).toBe(404);
    expect((await read(other, layoutId, second)).status).toBe(404);
  });
});

describe("the cached session check", () => {
  it("is served from the cache between changes (a role set behind the app's back is not seen yet)", async () => {
    const { actors } = await makeOrganisation("Actor cache");
    const engineer = new Browser();
    await signIn(engineer, auth.POST, actors.engineer.email, PASSWORD);
    expect((await whoAmI(engineer)).role).toBe("engineer");
    expect(actorCacheSize()).toBeGreaterThan(0);
    // bypassing the app: nothing clears the cache, so the cached check still answers (the trade the cache makes)
    await Membership.update({ role: "installer" }, { where: { userId: actors.engineer.userId, organisationId: actors.engineer.organisationId } });
    expect((await whoAmI(engineer)).role).toBe("engineer");
  });

  it("a role change through the app ends the member's cached session at once", async () => {
    const { actors } = await makeOrganisation("Actor cache");
    const engineer = new Browser();
    await signIn(engineer, auth.POST, actors.engineer.email, PASSWORD);
    expect((await engineer.call(sites.GET, "GET", "/api/sites")).status).toBe(200);
    expect((await engineer.call(sites.GET, "GET", "/api/sites")).status).toBe(200);
    const m = await Membership.findOne({ where: { userId: actors.engineer.userId, organisationId: actors.engineer.organisationId } });
    await changeRole(actors.admin, m!.id, "installer");
    expect((await engineer.call(sites.GET, "GET", "/api/sites")).status).toBe(401);
  });

  it("a sign-out ends a copied cookie's cached session at once", async () => {
    const { actors } = await makeOrganisation("Actor cache");
    const owner = new Browser();
    await signIn(owner, auth.POST, actors.designer.email, PASSWORD);
    const copy = new Browser();
    for (const [k, v] of owner.jar) copy.jar.set(k, v);
    expect((await copy.call(sites.GET, "GET", "/api/sites")).status).toBe(200);
    expect((await signOut(owner, auth.POST)).status).toBe(200);
    expect((await copy.call(sites.GET, "GET", "/api/sites")).status).toBe(401);
  });

  it("a password change ends the other sessions' cached checks at once", async () => {
    const { actors } = await makeOrganisation("Actor cache");
    const laptop = new Browser();
    await signIn(laptop, auth.POST, actors.installer.email, PASSWORD);
    expect((await laptop.call(sites.GET, "GET", "/api/sites")).status).toBe(200);
    await changePassword(actors.installer, { currentPassword: PASSWORD, newPassword: "copper kettle marsh 42 lantern" });
    expect((await laptop.call(sites.GET, "GET", "/api/sites")).status).toBe(401);
  });

  it("an organisation settings change reaches the next request of every member", async () => {
    const { actors } = await makeOrganisation("Actor cache");
    const designer = new Browser();
    await signIn(designer, auth.POST, actors.designer.email, PASSWORD);
    const was = (await whoAmI(designer)).settings;
    const to = was.currency === "EUR" ? "GBP" : "EUR";
    await updateOrganisationSettings(actors.admin, { name: actors.admin.organisationName, ...was, currency: to });
    expect((await whoAmI(designer)).settings.currency).toBe(to);
  });
});
