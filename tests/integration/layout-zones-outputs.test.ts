import { beforeAll, describe, expect, it } from "vitest";
import { makeOrganisation, testDb } from "./support";
import { createSite, getSite, updateSite } from "@/lib/server/sites";
import { confirmImport, listSchedule } from "@/lib/server/schedules";
import { createLayout, getLayout, saveLayout } from "@/lib/server/layouts";
import { errorResponse } from "@/lib/server/route";
import { saveLayoutSchema } from "@/lib/layout/layout-request-schema";
import type { LayoutDocument } from "@/lib/layout/schema";
import { LayoutRevision } from "@/models";

// The site's security grade and the layout document's zone programming, areas, outputs and wireless detectors,
// through the server layer and MariaDB.

beforeAll(() => {
  testDb();
});

const csv = [
  "label,type,area,room,cable_m,gauge,supervision",
  "Front door,contact-door-surface,Ground,Hall,12,22 AWG,double-eol",
  "Hall motion,motion-wall,Ground,Hall,18,22 AWG,double-eol",
  "Store motion,wireless-motion,Ground,Store,1,22 AWG,none",
  "Yard door,wireless-door,Ground,Store,1,22 AWG,none",
].join("\n");

async function fixture(securityGrade?: number) {
  const o = await makeOrganisation("Zones");
  const site = await createSite(o.actors.designer, { name: "Zoned site", address: "", description: "", areas: [{ name: "Ground", rooms: ["Hall", "Store"] }], securityGrade });
  await confirmImport(o.actors.designer, site.id, csv, undefined, true);
  const schedule = await listSchedule(o.actors.designer, site.id);
  const id = (label: string) => schedule.find((d) => d.label === label)!.id;
  return { ...o, site, schedule, id };
}

describe("a site's security grade", () => {
  it("is stored, changed and read back, and a new blank layout takes it with the grade's standby profile", async () => {
    const { actors, site } = await fixture(3);
    expect(site.securityGrade).toBe(3);
    const { document } = await createLayout(actors.designer, site.id, { name: "Grade 3", panelId: "panel-mid-16" });
    expect(document.grade).toBe(3);
    expect(document.power.standbyProfileId).toBe("intruder-grade-3-60h");
    await updateSite(actors.designer, site.id, { securityGrade: 2 });
    expect((await getSite(actors.installer, site.id)).securityGrade).toBe(2);
    await updateSite(actors.designer, site.id, { securityGrade: null });
    expect((await getSite(actors.installer, site.id)).securityGrade).toBeNull();
  });
});

describe("zones, areas, outputs and wireless detectors in a layout revision", () => {
  it("are saved in one revision and read back whole, with the solver's figures in the summary", async () => {
    const { actors, site, id } = await fixture(2);
    const { layout, document: blank } = await createLayout(actors.designer, site.id, { name: "Full", panelId: "panel-mid-16" });
    const doc: LayoutDocument = {
      ...blank,
      boards: [board("kp", "keypad", "keypad-mid", 1), board("rx", "receiver", "receiver-32", 2)],
      inputs: [
        { boardKey: "panel", input: 1, detectorIds: [id("Front door")], scheme: "double-eol", placement: "at-detector" },
        { boardKey: "panel", input: 2, detectorIds: [id("Hall motion")], scheme: "double-eol", placement: "at-detector" },
      ],
      areas: [
        { key: "off", name: "Offices", keypadKeys: ["kp"] },
        { key: "wh", name: "Warehouse" },
      ],
      zones: [
        { detectorId: id("Front door"), type: "entry-exit", areaKey: "off", entryS: 30, exitS: 45, keypadLabel: "Front door" },
        { detectorId: id("Hall motion"), type: "instant", areaKey: "off", entryRoute: true, partSet: true },
        { detectorId: id("Store motion"), type: "instant", areaKey: "wh" },
      ],
      outputDevices: [
        { id: "s1", kind: "sounder", catalogId: "sounder-outdoor-battery", label: "Front sounder", cableM: 10, gauge: { awg: 22 } },
        { id: "s2", kind: "strobe", catalogId: "strobe-amber", label: "Front strobe", cableM: 10, gauge: { awg: 22 } },
      ],
      outputs: [
        { boardKey: "panel", output: 1, deviceIds: ["s1"] },
        { boardKey: "panel", output: 2, deviceIds: ["s2"] },
      ],
      wireless: [{ boardKey: "rx", detectorIds: [id("Store motion"), id("Yard door")] }],
    };
    const saved = await saveLayout(actors.designer, layout.id, { version: 1, document: saveLayoutSchema.parse({ version: 1, document: doc }).document });
    // 2 wired + 2 wireless detectors, each a zone; none unplaced
    expect(saved.layout.summary).toMatchObject({ zonesUsed: 4, unplaced: 0 });
    const back = await getLayout(actors.installer, layout.id);
    expect(back.document).toEqual(doc);
    const row = await LayoutRevision.findOne({ where: { layoutId: layout.id, revision: 2 } });
    expect((row?.document as LayoutDocument).outputs).toEqual(doc.outputs);
  });

  it("refuses a sounder the catalog lacks and a zone for a detector the schedule lacks with 422 naming each field, storing nothing", async () => {
    const { actors, site, id } = await fixture();
    const { layout, document: blank } = await createLayout(actors.designer, site.id, { name: "Bad", panelId: "panel-mid-16" });
    const doc: LayoutDocument = {
      ...blank,
      outputDevices: [{ id: "s1", kind: "sounder", catalogId: "no-such-sounder", label: "Old sounder", cableM: 5, gauge: { awg: 22 } }],
      zones: [{ detectorId: "99999", type: "instant" }, { detectorId: id("Front door"), type: "entry-exit" }],
    };
    const err = await saveLayout(actors.designer, layout.id, { version: 1, document: doc }).catch((e) => e);
    const res = errorResponse(err);
    expect(res.status).toBe(422);
    const body = (await res.json()) as { issues: { path: string; message: string }[] };
    expect(body.issues.map((i) => i.path)).toEqual(["document.zones.0.detectorId", "document.outputDevices.0.catalogId"]);
    expect(await LayoutRevision.count({ where: { layoutId: layout.id } })).toBe(1);
  });

  it("the request schema refuses a grade outside 1–4, an area listed twice and an output listed twice", () => {
    const base = { panelId: "panel-mid-16", boards: [], inputs: [], power: { standbyProfileId: "intruder-grade-2", safetyFactor: 1.2 }, busCableM: 0 };
    const issues = (doc: object) => {
      const r = saveLayoutSchema.safeParse({ version: 1, document: doc });
      return r.success ? [] : r.error.issues.map((i) => `${i.path.join(".")}: ${i.message}`);
    };
    expect(issues({ ...base, grade: 5 })).toEqual(["document.grade: the security grade is 1 to 4"]);
    expect(issues({ ...base, areas: [{ key: "a", name: "One" }, { key: "a", name: "Two" }] })).toEqual(["document.areas.1: area a appears twice"]);
    expect(issues({ ...base, outputs: [{ boardKey: "panel", output: 1, deviceIds: [] }, { boardKey: "panel", output: 1, deviceIds: [] }] })).toEqual(["document.outputs.1.output: output 1 of panel appears twice"]);
    expect(issues(base)).toEqual([]); // a document without any of the new parts is still valid
  });
});

function board(key: string, kind: "keypad" | "receiver", catalogId: string, busAddress: number) {
  return { key, kind, catalogId, busAddress };
}
