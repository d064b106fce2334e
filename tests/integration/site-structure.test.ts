import { beforeAll, describe, expect, it } from "vitest";
import { testDb, makeOrganisation } from "./support";
import { reviewFixture } from "./review-fixtures";
import { createSite, getSite, listSites, setSiteArchived, updateSite } from "@/lib/server/sites";
import { addRoom, saveStructure } from "@/lib/server/site-structure";
import { copySite } from "@/lib/server/site-copy";
import { duplicateLayout } from "@/lib/server/layout-duplicate";
import { layoutInstaller } from "@/lib/server/send-sheet";
import { confirmImport, createDetector, listSchedule, previewImport } from "@/lib/server/schedules";
import { getLayout, listRevisions } from "@/lib/server/layouts";
import { treeFromSite, treeToRequest } from "@/lib/sites/structure-edit";
import { AuditEntry, Membership, Room, User } from "@/models";

beforeAll(() => {
  testDb();
});

const twoFloors = {
  name: "Depot",
  address: "1 Yard Lane",
  contactName: "Site manager",
  contactEmail: "manager@depot.example",
  floors: [
    { name: "Ground floor", areas: [{ name: "Offices", rooms: [{ name: "Reception" }, { name: "Kitchen" }] }] },
    { name: "First floor", areas: [{ name: "Stores", rooms: [{ name: "Stock room" }] }] },
  ],
};
const detector = (area: string, room: string, label = `${area} ${room}`) => ({ label, catalogId: "contact-door-surface", area, room, cableM: 10, gauge: { awg: 22 }, supervision: "double-eol" as const });
const audits = (action: string, entityId: number) => AuditEntry.count({ where: { action, entityId: String(entityId) } });

describe("site structure", () => {
  it("creates floors with areas and rooms in order, and edits them: add, rename, reorder, remove", async () => {
    const { actors } = await makeOrganisation();
    const site = await createSite(actors.designer, twoFloors);
    expect(site.floors.map((f) => f.name)).toEqual(["Ground floor", "First floor"]);
    expect(site.areas.map((a) => a.rooms.map((r) => r.name))).toEqual([["Reception", "Kitchen"], ["Stock room"]]);
    expect(site.contactEmail).toBe("manager@depot.example");

    const next = treeToRequest(treeFromSite(site.floors)).reverse();
    next[1].areas[0].rooms.reverse();
    next[1].areas[0].rooms.push({ name: "Server room" });
    next[0].name = "Upper floor";
    next[0].areas[0].rooms = [];
    const saved = await saveStructure(actors.designer, site.id, next);
    expect(saved.floors.map((f) => f.name)).toEqual(["Upper floor", "Ground floor"]);
    expect(saved.floors[1].areas[0].rooms.map((r) => r.name)).toEqual(["Kitchen", "Reception", "Server room"]);
    expect(saved.floors[0].areas[0].rooms).toEqual([]);
    expect(saved.floors[1].id).toBe(site.floors[0].id);
    expect(await audits("site.structure", site.id)).toBe(1);
  });

  it("refuses removing a room detectors use, naming how many, and changes nothing", async () => {
    const { actors } = await makeOrganisation();
    const site = await createSite(actors.designer, twoFloors);
    await createDetector(actors.designer, site.id, detector("Offices", "Kitchen", "Back door"));
    await createDetector(actors.designer, site.id, detector("Offices", "Kitchen", "Kitchen window"));
    const next = treeToRequest(treeFromSite(site.floors));
    next[0].areas[0].rooms = next[0].areas[0].rooms.filter((r) => r.name !== "Kitchen");
    next[0].name = "Renamed too";
    await expect(saveStructure(actors.designer, site.id, next)).rejects.toMatchObject({ status: 409, message: expect.stringMatching(/room Kitchen in Offices is used by 2 detectors/) });
    const after = await getSite(actors.designer, site.id);
    expect(after.floors).toEqual(site.floors);
    expect(await audits("site.structure", site.id)).toBe(0);
  });

  it("carries detectors along a renamed area and room", async () => {
    const { actors } = await makeOrganisation();
    const site = await createSite(actors.designer, twoFloors);
    await createDetector(actors.designer, site.id, detector("Offices", "Reception", "Front door"));
    const next = treeToRequest(treeFromSite(site.floors));
    next[0].areas[0].name = "Front office";
    next[0].areas[0].rooms[0].name = "Lobby";
    await saveStructure(actors.designer, site.id, next);
    expect((await listSchedule(actors.designer, site.id)).map((d) => [d.area, d.room])).toEqual([["Front office", "Lobby"]]);
  });

  it("refuses ids of another site's structure (422) and a duplicate room name (422 from the schema)", async () => {
    const { actors } = await makeOrganisation();
    const a = await createSite(actors.designer, twoFloors);
    const b = await createSite(actors.designer, { ...twoFloors, name: "Other" });
    const stolen = treeToRequest(treeFromSite(a.floors));
    stolen[0].id = b.floors[0].id;
    await expect(saveStructure(actors.designer, a.id, stolen)).rejects.toMatchObject({ status: 422 });
    expect((await getSite(actors.designer, b.id)).floors).toEqual(b.floors);
    await expect(addRoom(actors.designer, a.id, { areaId: a.areas[0].id, name: "kitchen" })).rejects.toMatchObject({ status: 409 });
    await expect(addRoom(actors.designer, a.id, { areaId: b.areas[0].id, name: "New" })).rejects.toMatchObject({ status: 422 });
    const added = await addRoom(actors.designer, a.id, { areaId: a.areas[0].id, name: "Meeting room" });
    expect(added.areas[0].rooms.map((r) => r.name)).toEqual(["Reception", "Kitchen", "Meeting room"]);
    await expect(saveStructure(actors.installer, a.id, stolen)).rejects.toMatchObject({ status: 403 });
  });
});

describe("installers and archiving", () => {
  it("assigns several installers, and the sheet goes to them", async () => {
    const f = await reviewFixture("Installers");
    expect(await layoutInstaller(f.actors.engineer, f.layout.id)).toBeNull();
    const second = await User.create({ email: `second-installer-${f.site.id}@example.test`, name: "Second Installer", passwordHash: null });
    await Membership.create({ organisationId: f.actors.admin.organisationId, userId: second.id, role: "installer" });
    await updateSite(f.actors.designer, f.site.id, { installerUserIds: [f.actors.installer.userId, second.id] });
    const assigned = (await getSite(f.actors.admin, f.site.id)).installers;
    expect(assigned.map((i) => i.userId).sort()).toEqual([f.actors.installer.userId, second.id].sort());
    const to = await layoutInstaller(f.actors.engineer, f.layout.id);
    expect(to?.email.split(", ").sort()).toEqual(assigned.map((i) => i.email).sort());
    // an installer who changes role stops receiving the site's sheets
    await Membership.update({ role: "designer" }, { where: { userId: second.id } });
    expect((await layoutInstaller(f.actors.engineer, f.layout.id))?.email).toBe(assigned.find((i) => i.userId === f.actors.installer.userId)!.email);
    expect(await audits("site.update", f.site.id)).toBe(1);
  });

  it("archives and restores a site; the list hides archived sites unless asked; roles without the permission are refused", async () => {
    const { actors } = await makeOrganisation();
    const site = await createSite(actors.designer, { name: "Old job" });
    await expect(setSiteArchived(actors.designer, site.id, true)).rejects.toMatchObject({ status: 403 });
    expect((await getSite(actors.admin, site.id)).archivedAt).toBeNull();
    await setSiteArchived(actors.engineer, site.id, true);
    expect((await listSites(actors.designer)).map((s) => s.id)).not.toContain(site.id);
    expect((await listSites(actors.designer, { archived: "only" })).map((s) => s.id)).toEqual([site.id]);
    await expect(setSiteArchived(actors.engineer, site.id, true)).rejects.toMatchObject({ status: 409 });
    await setSiteArchived(actors.admin, site.id, false);
    expect((await listSites(actors.designer)).map((s) => s.id)).toContain(site.id);
    expect(await audits("site.archive", site.id)).toBe(1);
    expect(await audits("site.restore", site.id)).toBe(1);
  });
});

describe("starting from what exists", () => {
  it("duplicates a layout as a new draft with its own history, leaving the original as it was", async () => {
    const f = await reviewFixture("Duplicate");
    const before = await getLayout(f.actors.designer, f.layout.id);
    const copy = await duplicateLayout(f.actors.designer, f.layout.id, {});
    expect(copy.name).toBe("Copy of Option A");
    const view = await getLayout(f.actors.designer, copy.id);
    expect(view.layout.status).toBe("draft");
    expect(view.document).toEqual(before.document);
    expect((await listRevisions(f.actors.designer, copy.id)).map((r) => r.revision)).toEqual([1]);
    expect(await getLayout(f.actors.designer, f.layout.id)).toEqual(before);
    expect(await audits("layout.duplicate", copy.id)).toBe(1);
    await expect(duplicateLayout(f.actors.installer, f.layout.id, {})).rejects.toMatchObject({ status: 403 });
    const other = await makeOrganisation("Other");
    await expect(duplicateLayout(other.actors.designer, f.layout.id, {})).rejects.toMatchObject({ status: 404 });
  });

  it("copies a site's structure and schedule into a new site", async () => {
    const { actors } = await makeOrganisation();
    const site = await createSite(actors.designer, twoFloors);
    await createDetector(actors.designer, site.id, detector("Offices", "Kitchen"));
    await createDetector(actors.designer, site.id, detector("Stores", "Stock room"));
    const copy = await copySite(actors.designer, site.id, { name: "Depot, phase 2", address: "" });
    expect(copy.id).not.toBe(site.id);
    expect(copy.contactName).toBe("Site manager");
    const shape = (s: typeof site) => s.floors.map((f) => [f.name, f.areas.map((a) => [a.name, a.rooms.map((r) => r.name)])]);
    expect(shape(copy)).toEqual(shape(site));
    const strip = (ds: Awaited<ReturnType<typeof listSchedule>>) => ds.map(({ id: _id, ...d }) => d);
    expect(strip(await listSchedule(actors.designer, copy.id))).toEqual(strip(await listSchedule(actors.designer, site.id)));
    expect(copy.floors[0].id).not.toBe(site.floors[0].id);
    expect(await audits("site.copy", copy.id)).toBe(1);
  });
});

describe("CSV import against the structure", () => {
  const header = "label,type,area,room,cable_m,gauge,supervision";

  it("lists unknown rooms instead of storing them, and adds them only when asked", async () => {
    const { actors } = await makeOrganisation();
    const site = await createSite(actors.designer, twoFloors);
    const csv = [header, "Front door,contact-door-surface,offices,RECEPTION,12,22 AWG,", "Back door,contact-door-surface,Offices,Kitchn,20,22 AWG,", "Roof hatch,contact-door-surface,Roof,Hatch,40,22 AWG,"].join("\n");
    const p = await previewImport(actors.designer, site.id, csv);
    expect(p.errors).toEqual([]);
    expect(p.unknownPlaces).toEqual([
      { area: "Offices", room: "Kitchn", rows: [3] },
      { area: "Roof", room: null, rows: [4] },
      { area: "Roof", room: "Hatch", rows: [4] },
    ]);
    const roomsBefore = await Room.count();
    await expect(confirmImport(actors.designer, site.id, csv)).rejects.toMatchObject({ status: 409, extra: { unknownPlaces: p.unknownPlaces } });
    expect(await listSchedule(actors.designer, site.id)).toEqual([]);
    expect(await Room.count()).toBe(roomsBefore);

    const r = await confirmImport(actors.designer, site.id, csv, "typo.csv", true);
    expect(r.imported).toBe(3);
    // names the site has are stored in its own spelling
    expect(r.detectors.map((d) => [d.area, d.room])).toEqual([["Offices", "Reception"], ["Offices", "Kitchn"], ["Roof", "Hatch"]]);
    const after = await getSite(actors.designer, site.id);
    expect(after.floors.at(-1)!.areas.map((a) => a.name)).toEqual(["Stores", "Roof"]);
    expect(after.areas.find((a) => a.name === "Offices")!.rooms.map((r) => r.name)).toEqual(["Reception", "Kitchen", "Kitchn"]);
    expect(await audits("site.places.add", site.id)).toBe(1);
  });

  it("refuses a life-safety detector marked as sharing an input, with its row number, storing nothing", async () => {
    const { actors } = await makeOrganisation();
    const site = await createSite(actors.designer, twoFloors);
    const csv = [header, "Front door,contact-door-surface,Offices,Reception,12,22 AWG,shared-ok", "Store smoke,smoke-4wire-no,Stores,Stock room,20,22 AWG,shared-ok"].join("\n");
    // a fire detector never shares an input: common practice, no published source; local fire codes decide
    const err = await confirmImport(actors.designer, site.id, csv, undefined, true).catch((e: unknown) => e);
    expect(err).toMatchObject({ status: 422, issues: [{ path: "row 3, supervision", message: expect.stringMatching(/life-safety/) }] });
    expect(await listSchedule(actors.designer, site.id)).toEqual([]);
  });
});
