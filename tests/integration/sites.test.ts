import { describe, expect, it, beforeAll } from "vitest";
import { testDb, makeOrganisation } from "./support";
import { createSite, getSite, listSites, updateSite } from "@/lib/server/sites";
import { AuditEntry, Site } from "@/models";
import { ApiError } from "@/lib/server/errors";

beforeAll(() => {
  testDb();
});

describe("sites in MariaDB", () => {
  it("creates a site with areas and rooms in one transaction, with an audit entry", async () => {
    const { actors } = await makeOrganisation();
    const site = await createSite(actors.designer, { name: "Test depot", address: "1 Nowhere Road", description: "", areas: [{ name: "Ground", rooms: ["Office", "Yard"] }] });
    expect(site.areas).toHaveLength(1);
    expect(site.areas[0].rooms.map((r) => r.name)).toEqual(["Office", "Yard"]);
    const entries = await AuditEntry.count({ where: { entityType: "site", entityId: String(site.id), action: "site.create" } });
    expect(entries).toBe(1);
  });

  it("never shows one organisation's site to another: 404, indistinguishable from a missing id", async () => {
    const a = await makeOrganisation("A");
    const b = await makeOrganisation("B");
    const site = await createSite(a.actors.designer, { name: "A's site", address: "", description: "", areas: [] });
    await expect(getSite(b.actors.admin, site.id)).rejects.toMatchObject({ status: 404 });
    await expect(getSite(b.actors.admin, 2 ** 31 - 1)).rejects.toMatchObject({ status: 404 });
    expect((await listSites(b.actors.admin)).map((s) => s.id)).not.toContain(site.id);
    await expect(updateSite(b.actors.admin, site.id, { name: "taken over" })).rejects.toBeInstanceOf(ApiError);
    expect((await Site.findByPk(site.id))?.name).toBe("A's site");
  });

  it("rolls back everything when a later row fails", async () => {
    const { actors } = await makeOrganisation();
    const before = await Site.count();
    const tooLong = "x".repeat(300); // rooms.name is VARCHAR(200): the insert fails after the site row
    await expect(createSite(actors.designer, { name: "Half written", address: "", description: "", areas: [{ name: "G", rooms: [tooLong] }] })).rejects.toThrow();
    expect(await Site.count()).toBe(before);
  });

  it("refuses an installer from another organisation, and a member who is not an installer", async () => {
    const a = await makeOrganisation("A");
    const b = await makeOrganisation("B");
    const site = await createSite(a.actors.designer, { name: "S", address: "", description: "", areas: [] });
    await expect(updateSite(a.actors.admin, site.id, { installerUserIds: [b.actors.installer.userId] })).rejects.toMatchObject({ status: 422 });
    await expect(updateSite(a.actors.admin, site.id, { installerUserIds: [a.actors.designer.userId] })).rejects.toMatchObject({ status: 422 });
    expect((await getSite(a.actors.admin, site.id)).installers).toEqual([]);
    const ok = await updateSite(a.actors.admin, site.id, { installerUserIds: [a.actors.installer.userId] });
    expect(ok.installers.map((i) => i.userId)).toEqual([a.actors.installer.userId]);
  });
});
