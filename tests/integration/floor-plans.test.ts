import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import S3rver from "s3rver";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { testDb, makeOrganisation } from "./support";
import { createSite } from "@/lib/server/sites";
import { createDetector, updateDetector } from "@/lib/server/schedules";
import { calibratePlan, getPlanImage, listPlans, moveItem, placeItem, saveRoute, uploadPlan } from "@/lib/server/plans";
import { createStorage, storageConfigFromEnv, type Storage } from "@/lib/server/storage";
import { jpegHeader, pngHeader } from "@/lib/plan/test-images";
import { AuditEntry, FloorPlan, PlanRoute, ScheduleDetectorRecord } from "@/models";
import type { Actor } from "@/lib/server/session";

// Floor plans end to end below the HTTP layer: upload to a fake S3 server, calibrate, place, route, and the
// route's measured length written to the schedule detector's cable run.

let server: S3rver;
let store: Storage;
let dir: string;

beforeAll(async () => {
  testDb();
  dir = mkdtempSync(join(tmpdir(), "lw-plans-"));
  server = new S3rver({ port: 0, address: "127.0.0.1", directory: dir, silent: true, configureBuckets: [{ name: "lw-test-plans" }] });
  const { port } = await server.run();
  store = createStorage(storageConfigFromEnv({ S3_ENDPOINT: `http://127.0.0.1:${port}`, S3_BUCKET: "lw-test-plans", S3_ACCESS_KEY: "S3RVER", S3_SECRET_KEY: "S3RVER" }));
});

afterAll(async () => {
  await server?.close();
  rmSync(dir, { recursive: true, force: true });
});

const twoFloors = {
  name: "Workshop",
  address: "2 Mill Road",
  floors: [
    { name: "Ground floor", areas: [{ name: "Shop", rooms: [{ name: "Front" }] }] },
    { name: "First floor", areas: [{ name: "Office", rooms: [{ name: "Desk" }] }] },
  ],
};

async function siteWithDetector() {
  const { actors } = await makeOrganisation("Plans");
  const site = await createSite(actors.designer, twoFloors);
  const det = await createDetector(actors.designer, site.id, { label: "Front door", catalogId: "contact-door-surface", area: "Shop", room: "Front", cableM: 12, gauge: { awg: 22 }, supervision: "double-eol" });
  const [ground, first] = site.floors;
  return { actors, site, det, ground, first };
}

const cableOf = async (id: string) => {
  const r = await ScheduleDetectorRecord.findByPk(Number(id));
  return { cableM: r!.cableM, cableBasis: r!.cableBasis };
};

describe("floor plans", () => {
  it("stores a PNG and a JPEG plan by their bytes, refuses other files and keeps nothing of them", async () => {
    const { actors, site, ground, first } = await siteWithDetector();
    const png = pngHeader(2000, 1000);
    const up = await uploadPlan(actors.designer, site.id, ground.id, { fileName: "ground.png", bytes: png }, store);
    expect(up).toMatchObject({ replaced: false, plan: { floorId: ground.id, contentType: "image/png", widthPx: 2000, heightPx: 1000, metresPerPixel: null } });
    await uploadPlan(actors.designer, site.id, first.id, { fileName: "first.jpg", bytes: jpegHeader(800, 600) }, store);
    const img = await getPlanImage(actors.installer, site.id, up.plan.id, store);
    expect(Buffer.compare(img.body, Buffer.from(png))).toBe(0);
    await expect(uploadPlan(actors.designer, site.id, ground.id, { fileName: "x.png", bytes: new TextEncoder().encode("<svg/>") }, store)).rejects.toMatchObject({ status: 415 });
    await expect(uploadPlan(actors.installer, site.id, ground.id, { fileName: "x.png", bytes: png }, store)).rejects.toMatchObject({ status: 403 });
    const other = await makeOrganisation("Rival");
    await expect(uploadPlan(other.actors.designer, site.id, ground.id, { fileName: "x.png", bytes: png }, store)).rejects.toMatchObject({ status: 404 });
    await expect(getPlanImage(other.actors.designer, site.id, up.plan.id, store)).rejects.toMatchObject({ status: 404 });
    expect(await FloorPlan.count({ where: { siteId: site.id } })).toBe(2);
  });

  it("measures a route across two floors into the detector's cable run, and follows a new scale", async () => {
    const { actors, site, det, ground, first } = await siteWithDetector();
    const g = (await uploadPlan(actors.designer, site.id, ground.id, { fileName: "g.png", bytes: pngHeader(2000, 1000) }, store)).plan;
    const f = (await uploadPlan(actors.designer, site.id, first.id, { fileName: "f.png", bytes: pngHeader(1000, 1000) }, store)).plan;
    // 500 px for 10 m: 0.02 m/px
    expect((await calibratePlan(actors.designer, site.id, g.id, { a: { x: 100, y: 100 }, b: { x: 600, y: 100 }, distance: 10 })).plan.metresPerPixel).toBeCloseTo(0.02, 12);
    // typed in feet: 40 ft = 12.192 m over 400 px, 0.03048 m/px (1 ft = 0.3048 m, NIST Handbook 44 Appendix C)
    const imperial: Actor = { ...actors.designer, settings: { ...actors.designer.settings, units: "imperial" } };
    expect((await calibratePlan(imperial, site.id, f.id, { a: { x: 0, y: 0 }, b: { x: 0, y: 400 }, distance: 40 })).plan.calibration).toMatchObject({ distance: 40, units: "imperial" });

    const door = await placeItem(actors.designer, site.id, g.id, { kind: "detector", detectorId: Number(det.id), x: 200, y: 200 });
    const panel = await placeItem(actors.designer, site.id, f.id, { kind: "panel", label: "Panel", x: 250, y: 150 });
    await expect(placeItem(actors.designer, site.id, f.id, { kind: "detector", detectorId: Number(det.id), x: 5, y: 5 })).rejects.toMatchObject({ status: 409 });

    // ground: (200,200)→(200,700) = 500 px × 0.02 = 10 m; first: 100 px + 200 px = 300 px × 0.03048 = 9.144 m;
    // + 0.5 m device slack + 1 m board slack + 3 m rise (one floor crossed) = 23.644 m
    const legs = [
      { planId: g.id, points: [{ x: 200, y: 200 }, { x: 200, y: 700 }] },
      { planId: f.id, points: [{ x: 50, y: 50 }, { x: 50, y: 150 }, { x: 250, y: 150 }] },
    ];
    const route = await saveRoute(actors.designer, site.id, { fromItemId: door.id, toItemId: panel.id, legs });
    expect(route.run).toMatchObject({ ok: true, basis: "measured-on-plan", totalM: 23.644 });
    expect(await cableOf(det.id)).toEqual({ cableM: 23.644, cableBasis: "measured-on-plan" });
    expect(await AuditEntry.count({ where: { action: "plan.route", entityId: String(site.id) } })).toBe(1);

    // the ground floor recalibrated: the same 500 px are now 20 m, so that leg is 20 m: 20 + 9.144 + 4.5 = 33.644 m
    expect((await calibratePlan(actors.designer, site.id, g.id, { a: { x: 100, y: 100 }, b: { x: 600, y: 100 }, distance: 20 })).remeasured).toBe(1);
    expect((await cableOf(det.id)).cableM).toBe(33.644);

    // typed allowances replace the defaults: 20 + 9.144 + 0.2 m + 0.3 m slack + 0 rise = 29.644 m
    await saveRoute(actors.designer, site.id, { fromItemId: door.id, toItemId: panel.id, legs, allowances: { deviceSlackM: 0.2, boardSlackM: 0.3, riseM: 0 } });
    expect((await cableOf(det.id)).cableM).toBe(29.644);
    expect(await PlanRoute.count({ where: { siteId: site.id } })).toBe(1);

    // a typed length is the designer's own again
    await updateDetector(actors.designer, site.id, Number(det.id), { cableM: 15 });
    expect(await cableOf(det.id)).toEqual({ cableM: 15, cableBasis: "typed" });

    const listed = await listPlans(actors.installer, site.id);
    expect(listed.plans.map((p) => p.items.length)).toEqual([1, 1]);
    expect(listed.routes[0].run).toMatchObject({ ok: true, totalM: 29.644 });
  });

  it("refuses a bad route whole: nothing saved, the cable run untouched", async () => {
    const { actors, site, det, ground, first } = await siteWithDetector();
    const g = (await uploadPlan(actors.designer, site.id, ground.id, { fileName: "g.png", bytes: pngHeader(1000, 1000) }, store)).plan;
    const f = (await uploadPlan(actors.designer, site.id, first.id, { fileName: "f.png", bytes: pngHeader(1000, 1000) }, store)).plan;
    await calibratePlan(actors.designer, site.id, g.id, { a: { x: 0, y: 0 }, b: { x: 100, y: 0 }, distance: 5 });
    const door = await placeItem(actors.designer, site.id, g.id, { kind: "detector", detectorId: Number(det.id), x: 10, y: 10 });
    const panel = await placeItem(actors.designer, site.id, f.id, { kind: "panel", label: "", x: 10, y: 10 });
    const keypad = await placeItem(actors.designer, site.id, g.id, { kind: "keypad", label: "Hall", x: 20, y: 20 });
    const line = (planId: number) => ({ planId, points: [{ x: 10, y: 10 }, { x: 90, y: 10 }] });
    // the first floor has no scale yet
    await expect(saveRoute(actors.designer, site.id, { fromItemId: door.id, toItemId: panel.id, legs: [line(g.id), line(f.id)] })).rejects.toMatchObject({ status: 422, issues: [{ path: "legs", message: expect.stringMatching(/no scale/) }] });
    await expect(saveRoute(actors.designer, site.id, { fromItemId: door.id, toItemId: keypad.id, legs: [line(g.id)] })).rejects.toMatchObject({ status: 422, issues: [{ path: "toItemId" }] });
    await expect(saveRoute(actors.designer, site.id, { fromItemId: door.id, toItemId: panel.id, legs: [line(f.id)] })).rejects.toMatchObject({ status: 422, issues: [{ path: "legs.0.planId" }] });
    await expect(saveRoute(actors.designer, site.id, { fromItemId: door.id, toItemId: panel.id, legs: [{ planId: g.id, points: [{ x: 10, y: 10 }, { x: 5000, y: 10 }] }, line(f.id)] })).rejects.toMatchObject({ status: 422, issues: [{ path: "legs.0.points.1" }] });
    expect(await PlanRoute.count({ where: { siteId: site.id } })).toBe(0);
    expect(await cableOf(det.id)).toEqual({ cableM: 12, cableBasis: "typed" });
    await expect(moveItem(actors.designer, site.id, door.id, { x: 1001, y: 0 })).rejects.toMatchObject({ status: 422 });
    expect(await moveItem(actors.designer, site.id, door.id, { x: 400, y: 300 })).toMatchObject({ x: 400, y: 300 });
  });

  it("replacing a plan keeps what was placed, and its scale only when the size is the same", async () => {
    const { actors, site, det, ground } = await siteWithDetector();
    const g = (await uploadPlan(actors.designer, site.id, ground.id, { fileName: "g.png", bytes: pngHeader(1000, 800) }, store)).plan;
    await calibratePlan(actors.designer, site.id, g.id, { a: { x: 0, y: 0 }, b: { x: 100, y: 0 }, distance: 5 });
    await placeItem(actors.designer, site.id, g.id, { kind: "detector", detectorId: Number(det.id), x: 10, y: 10 });
    const same = await uploadPlan(actors.designer, site.id, ground.id, { fileName: "g2.jpg", bytes: jpegHeader(1000, 800) }, store);
    expect(same).toMatchObject({ replaced: true, scaleKept: true, plan: { id: g.id, contentType: "image/jpeg", metresPerPixel: 0.05 } });
    expect(same.plan.items).toHaveLength(1);
    const bigger = await uploadPlan(actors.designer, site.id, ground.id, { fileName: "g3.png", bytes: pngHeader(2000, 1600) }, store);
    expect(bigger).toMatchObject({ replaced: true, scaleKept: false, plan: { metresPerPixel: null, calibration: null } });
    expect(bigger.plan.items).toHaveLength(1);
    expect((await getPlanImage(actors.designer, site.id, g.id, store)).contentType).toBe("image/png");
  });
});
