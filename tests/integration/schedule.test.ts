import { describe, expect, it, beforeAll } from "vitest";
import { testDb, makeOrganisation } from "./support";
import { createSite } from "@/lib/server/sites";
import { bulkEditDetectors, confirmImport, createDetector, deleteDetectors, exportScheduleCsv, listSchedule, previewImport, updateDetector } from "@/lib/server/schedules";
import { AuditEntry, ScheduleDetectorRecord } from "@/models";
import { parseScheduleCsv } from "@/lib/schedule/csv";
import { shippedCatalog } from "@/lib/catalog/shipped";

beforeAll(() => {
  testDb();
});

async function siteWithOrg() {
  const o = await makeOrganisation("Schedule");
  const site = await createSite(o.actors.designer, { name: "Test library", address: "", description: "", areas: [{ name: "Ground", rooms: ["Hall"] }, { name: "First floor", rooms: ["Hall", "Landing"] }] });
  return { ...o, site };
}

const good = ["label,type,area,room,cable_m,gauge,supervision", "Front door,contact-door-surface,Ground,Hall,12,22 AWG,double-eol", 'Hall motion,motion-wall,Ground,"Hall, east",18.5,0.5 mm2,', "Back door,contact-door-recessed,Ground,Hall,30,22 AWG,shared-ok"].join("\r\n");

describe("device schedule in MariaDB", () => {
  it("adds, edits and lists detectors in schedule order, auditing each change", async () => {
    const { actors, site } = await siteWithOrg();
    const a = await createDetector(actors.designer, site.id, { label: "Front door", catalogId: "contact-door-surface", area: "Ground", room: "Hall", cableM: 12, gauge: { awg: 22 }, supervision: "double-eol" });
    const b = await createDetector(actors.engineer, site.id, { label: "Hall motion", catalogId: "motion-wall", area: "Ground", room: "Hall", cableM: 18.5, gauge: { mm2: 0.5 }, supervision: "single-eol" });
    expect(a.id).toMatch(/^\d+$/);
    const edited = await updateDetector(actors.designer, site.id, Number(b.id), { cableM: 21, gauge: { awg: 24 } });
    expect(edited).toMatchObject({ label: "Hall motion", cableM: 21, gauge: { awg: 24 } });
    const list = await listSchedule(actors.installer, site.id);
    expect(list.map((d) => d.label)).toEqual(["Front door", "Hall motion"]);
    // the mm² column is cleared when the gauge switches to AWG
    const rec = await ScheduleDetectorRecord.findByPk(Number(b.id));
    expect(rec?.gaugeMm2).toBeNull();
    expect(await AuditEntry.count({ where: { organisationId: actors.designer.organisationId, action: ["schedule.create", "schedule.update"] } })).toBe(3);
  });

  it("refuses a catalog id the organisation's catalog does not have (422), and installers (403)", async () => {
    const { actors, site } = await siteWithOrg();
    await expect(createDetector(actors.designer, site.id, { label: "X", catalogId: "no-such-detector", area: "", room: "", cableM: 5, gauge: { awg: 22 }, supervision: "none" })).rejects.toMatchObject({ status: 422 });
    await expect(createDetector(actors.installer, site.id, { label: "X", catalogId: "motion-wall", area: "", room: "", cableM: 5, gauge: { awg: 22 }, supervision: "none" })).rejects.toMatchObject({ status: 403 });
    expect(await listSchedule(actors.admin, site.id)).toHaveLength(0);
  });

  it("bulk-edits the selected rows only, and refuses the whole edit when one id is not in the schedule", async () => {
    const { actors, site } = await siteWithOrg();
    const ids: string[] = [];
    for (const label of ["D1", "D2", "D3"]) ids.push((await createDetector(actors.designer, site.id, { label, catalogId: "contact-door-surface", area: "Ground", room: "Hall", cableM: 10, gauge: { awg: 22 }, supervision: "double-eol" })).id);
    // a place the site lacks is refused whole, naming the field and the detectors, and changes nothing
    await expect(bulkEditDetectors(actors.designer, site.id, { ids, patch: { area: "Basement", cableM: 5 } })).rejects.toMatchObject({ status: 422, issues: [{ path: "patch.area", message: expect.stringContaining("“Basement” is not an area of this site. Pick one of the site's areas, or add it to the site's structure first. (D1, D2, D3)") }] });
    await expect(bulkEditDetectors(actors.designer, site.id, { ids, patch: { room: "Landing" } })).rejects.toMatchObject({ status: 422, issues: [{ path: "patch.room", message: expect.stringContaining("“Landing” is not a room of Ground") }] });
    expect((await listSchedule(actors.designer, site.id)).map((d) => [d.area, d.room, d.cableM])).toEqual([["Ground", "Hall", 10], ["Ground", "Hall", 10], ["Ground", "Hall", 10]]);
    // an area alone keeps each row's room, which the new area must have; the site's spelling is stored
    expect(await bulkEditDetectors(actors.designer, site.id, { ids: ids.slice(0, 2), patch: { area: "first FLOOR", supervision: "shared-ok" } })).toEqual({ updated: 2 });
    const list = await listSchedule(actors.designer, site.id);
    expect(list.map((d) => [d.label, d.area, d.supervision])).toEqual([
      ["D1", "First floor", "shared-ok"],
      ["D2", "First floor", "shared-ok"],
      ["D3", "Ground", "double-eol"],
    ]);
    const other = await siteWithOrg();
    const foreign = await createDetector(other.actors.designer, other.site.id, { label: "Theirs", catalogId: "motion-wall", area: "", room: "", cableM: 4, gauge: { awg: 22 }, supervision: "none" });
    await expect(bulkEditDetectors(actors.designer, site.id, { ids: [ids[2], foreign.id], patch: { cableM: 99 } })).rejects.toMatchObject({ status: 404 });
    expect((await listSchedule(actors.designer, site.id))[2].cableM).toBe(10);
    expect((await listSchedule(other.actors.designer, other.site.id))[0].cableM).toBe(4);
  });

  it("previews a CSV without storing anything, then stores every row in one transaction on confirm", async () => {
    const { actors, site } = await siteWithOrg();
    const p = await previewImport(actors.designer, site.id, good);
    expect(p.errors).toEqual([]);
    expect(p.rows.map((r) => r.row)).toEqual([2, 3, 4]);
    expect(p.rows[1].detector).toMatchObject({ room: "Hall, east", cableM: 18.5, gauge: { mm2: 0.5 }, supervision: "single-eol" });
    expect(await ScheduleDetectorRecord.count({ where: { siteId: site.id } })).toBe(0);
    const r = await confirmImport(actors.designer, site.id, good, "library.csv", true);
    expect(r.imported).toBe(3);
    expect(r.detectors.map((d) => d.label)).toEqual(["Front door", "Hall motion", "Back door"]);
    expect(await AuditEntry.count({ where: { action: "schedule.import", entityId: String(site.id) } })).toBe(1);
  });

  it("reports bad rows with their row numbers and stores nothing, not even the good rows", async () => {
    const { actors, site } = await siteWithOrg();
    const bad = good + "\r\nBroken,no-such-type,Ground,Hall,ten,22 AWG,\r\nFine,motion-wall,Ground,Hall,5,22 AWG,\r\nWorse,motion-wall,Ground,Hall,5,thick,maybe\r\n";
    const p = await previewImport(actors.designer, site.id, bad);
    expect(p.rows).toHaveLength(4);
    expect(p.errors.map((e) => [e.row, e.column])).toEqual([
      [5, "type"],
      [5, "cable_m"],
      [7, "gauge"],
      [7, "supervision"],
    ]);
    expect(p.records).toBe(6);
    await expect(confirmImport(actors.designer, site.id, bad)).rejects.toMatchObject({ status: 422, extra: { errors: p.errors } });
    expect(await ScheduleDetectorRecord.count({ where: { siteId: site.id } })).toBe(0);
    expect(await AuditEntry.count({ where: { action: "schedule.import", entityId: String(site.id) } })).toBe(0);
  });

  it("exports what it imports (round trip through the CSV parser)", async () => {
    const { actors, site } = await siteWithOrg();
    await confirmImport(actors.designer, site.id, good, undefined, true);
    const { csv, fileName } = await exportScheduleCsv(actors.installer, site.id);
    expect(fileName).toBe("test-library-device-schedule.csv");
    const back = parseScheduleCsv(csv, shippedCatalog().catalog);
    expect(back.errors).toEqual([]);
    expect(back.rows).toEqual((await listSchedule(actors.designer, site.id)).map(({ id: _id, ...row }) => row));
  });

  it("deletes all or nothing, and never across organisations (404)", async () => {
    const a = await siteWithOrg();
    const b = await siteWithOrg();
    await confirmImport(a.actors.designer, a.site.id, good, undefined, true);
    const ids = (await listSchedule(a.actors.designer, a.site.id)).map((d) => d.id);
    await expect(listSchedule(b.actors.admin, a.site.id)).rejects.toMatchObject({ status: 404 });
    await expect(deleteDetectors(b.actors.designer, a.site.id, ids)).rejects.toMatchObject({ status: 404 });
    await expect(deleteDetectors(b.actors.designer, b.site.id, ids)).rejects.toMatchObject({ status: 404 });
    await expect(updateDetector(b.actors.designer, b.site.id, Number(ids[0]), { label: "taken" })).rejects.toMatchObject({ status: 404 });
    expect(await deleteDetectors(a.actors.designer, a.site.id, ids.slice(0, 2))).toEqual({ deleted: 2, approvedLayouts: [] });
    expect((await listSchedule(a.actors.designer, a.site.id)).map((d) => d.label)).toEqual(["Back door"]);
  });
});
