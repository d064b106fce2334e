import { describe, expect, it } from "vitest";
import { makeOrganisation, testDb } from "./support";
import { Browser, installTestRequestScope, signIn } from "./auth-flow";
import { createSite } from "@/lib/server/sites";
import { AuditEntry, ScheduleDetectorRecord } from "@/models";
import * as auth from "@/app/api/auth/[...nextauth]/route";
import * as schedule from "@/app/api/sites/[siteId]/schedule/route";
import * as oneDetector from "@/app/api/sites/[siteId]/schedule/[detectorId]/route";

installTestRequestScope();

// One detector added or changed through the schedule API names an area and a room of the site's structure: any
// other is refused with 422 naming the field, and nothing is stored. (The CSV import offers to add unknown places.)

const PASSWORD = "test-password-1"; // tests/integration/support.ts

async function designerOnSite() {
  testDb();
  const { actors } = await makeOrganisation("Schedule places");
  const site = await createSite(actors.designer, { name: "Places site", address: "", description: "", areas: [{ name: "Offices", rooms: ["Reception", "Kitchen"] }, { name: "Stores", rooms: ["Stock room"] }] });
  const browser = new Browser();
  expect((await signIn(browser, auth.POST, actors.designer.email, PASSWORD)).ok).toBe(true);
  const params = { siteId: String(site.id) };
  const add = (area: string, room: string, label = "Side door") =>
    browser.call(schedule.POST, "POST", `/api/sites/${site.id}/schedule`, { params, json: { label, catalogId: "contact-door-surface", area, room, cableM: 10, gauge: { awg: 22 }, supervision: "single-eol" } });
  const patch = (id: string, json: unknown) => browser.call(oneDetector.PATCH, "PATCH", `/api/sites/${site.id}/schedule/${id}`, { params: { ...params, detectorId: id }, json });
  return { actors, site, add, patch };
}

type Refusal = { error: string; issues: { path: string; message: string }[] };

describe("the schedule API keeps detectors inside the site's structure", () => {
  it("refuses a new detector in an unknown area, a room of another area, or a room without an area, naming the field", async () => {
    const { actors, site, add } = await designerOnSite();
    const cases: [string, string, string, string][] = [
      ["Roof", "", "area", "“Roof” is not an area of this site"],
      ["Offices", "Stock room", "room", "“Stock room” is not a room of Offices"],
      ["Offices", "Kitchn", "room", "“Kitchn” is not a room of Offices"],
      ["", "Kitchen", "room", "needs its area"],
    ];
    for (const [area, room, field, words] of cases) {
      const res = await add(area, room);
      expect(res.status, `${area}/${room}`).toBe(422);
      const body = (await res.json()) as Refusal;
      expect(body.issues).toEqual([{ path: field, message: expect.stringContaining(words) }]);
      expect(body.issues[0].message.startsWith(field === "area" ? "Area:" : "Room:")).toBe(true); // the field by its label
      expect(body.error).toContain(words);
      expect(body.error).toContain("Nothing was saved.");
    }
    expect(await ScheduleDetectorRecord.count({ where: { siteId: site.id } })).toBe(0);
    expect(await AuditEntry.count({ where: { action: "schedule.create", organisationId: actors.designer.organisationId } })).toBe(0);
  });

  it("accepts a known place in any letter case and stores the site's spelling, and no place at all", async () => {
    const { site, add } = await designerOnSite();
    const res = await add("offices", "KITCHEN");
    expect(res.status, await res.clone().text()).toBe(200);
    expect(await res.json()).toMatchObject({ area: "Offices", room: "Kitchen" });
    expect((await add("", "", "Unplaced door")).status).toBe(200);
    expect(await ScheduleDetectorRecord.count({ where: { siteId: site.id } })).toBe(2);
  });

  it("refuses moving one detector to a place the site lacks and leaves it as it was; a change that keeps the place is never checked", async () => {
    const { site, add, patch } = await designerOnSite();
    const made = (await (await add("Offices", "Reception")).json()) as { id: string };

    const moved = await patch(made.id, { room: "Boiler room" });
    expect(moved.status).toBe(422);
    expect(((await moved.json()) as Refusal).issues).toEqual([{ path: "room", message: expect.stringContaining("“Boiler room” is not a room of Offices") }]);
    const toArea = await patch(made.id, { area: "Stores" }); // Reception is not a room of Stores
    expect(toArea.status).toBe(422);
    expect(((await toArea.json()) as Refusal).issues[0]).toMatchObject({ path: "room", message: expect.stringContaining("not a room of Stores") });
    const row = await ScheduleDetectorRecord.findByPk(Number(made.id));
    expect([row!.area, row!.room, Number(row!.cableM)]).toEqual(["Offices", "Reception", 10]);

    const ok = await patch(made.id, { area: "stores", room: "stock ROOM", cableM: 14 });
    expect(ok.status).toBe(200);
    expect(await ok.json()).toMatchObject({ area: "Stores", room: "Stock room", cableM: 14 });

    // a row whose place left the structure by another way (here straight in the table) can still have its cable changed
    await ScheduleDetectorRecord.update({ room: "Old store" }, { where: { id: Number(made.id) } });
    const cable = await patch(made.id, { area: "Stores", room: "Old store", cableM: 20 });
    expect(cable.status).toBe(200);
    expect(await ScheduleDetectorRecord.count({ where: { siteId: site.id } })).toBe(1);
  });
});
