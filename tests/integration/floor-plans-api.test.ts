import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import S3rver from "s3rver";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { makeOrganisation, testDb } from "./support";
import { Browser, installTestRequestScope, signIn } from "./auth-flow";
import { createSite } from "@/lib/server/sites";
import { createDetector } from "@/lib/server/schedules";
import { createStorage, storageConfigFromEnv, type Storage } from "@/lib/server/storage";
import { jpegHeader, pngHeader } from "@/lib/plan/test-images";
import { ScheduleDetectorRecord } from "@/models";
import * as auth from "@/app/api/auth/[...nextauth]/route";
import * as floorPlan from "@/app/api/sites/[siteId]/floors/[floorId]/plan/route";
import * as plans from "@/app/api/sites/[siteId]/plans/route";
import * as image from "@/app/api/sites/[siteId]/plans/[planId]/image/route";
import * as calibration from "@/app/api/sites/[siteId]/plans/[planId]/calibration/route";
import * as items from "@/app/api/sites/[siteId]/plans/[planId]/items/route";
import * as planItem from "@/app/api/sites/[siteId]/plan-items/[itemId]/route";
import * as routes from "@/app/api/sites/[siteId]/plan-routes/route";

installTestRequestScope();

// The floor plan routes over HTTP: upload checked by content, calibrate, place, route; refusals as 4xx with issues.

const PASSWORD = "test-password-1"; // tests/integration/support.ts
let server: S3rver;
let dir: string;

beforeAll(async () => {
  testDb();
  dir = mkdtempSync(join(tmpdir(), "lw-plans-api-"));
  server = new S3rver({ port: 0, address: "127.0.0.1", directory: dir, silent: true, configureBuckets: [{ name: "lw-test-plans-api" }] });
  const { port } = await server.run();
  // the process's storage (lib/server/storage.ts keeps it on globalThis) pointed at this fake S3 server
  (globalThis as { loopwrightStorage?: Storage }).loopwrightStorage = createStorage(storageConfigFromEnv({ S3_ENDPOINT: `http://127.0.0.1:${port}`, S3_BUCKET: "lw-test-plans-api", S3_ACCESS_KEY: "S3RVER", S3_SECRET_KEY: "S3RVER" }));
});

afterAll(async () => {
  delete (globalThis as { loopwrightStorage?: Storage }).loopwrightStorage;
  await server?.close();
  rmSync(dir, { recursive: true, force: true });
});

const fileForm = (bytes: Uint8Array, name: string, type: string) => {
  const f = new FormData();
  f.set("file", new File([bytes as BlobPart], name, { type }));
  return f;
};

async function signedIn(email: string) {
  const b = new Browser();
  expect((await signIn(b, auth.POST, email, PASSWORD)).ok).toBe(true);
  return b;
}

describe("floor plan routes", () => {
  it("upload, calibrate, place and route through HTTP, with clear refusals", async () => {
    const { actors } = await makeOrganisation("Plans API");
    const site = await createSite(actors.designer, { name: "Plans API site", floors: [{ name: "Ground", areas: [{ name: "Shop", rooms: [{ name: "Front" }] }] }] });
    const det = await createDetector(actors.designer, site.id, { label: "Door", catalogId: "contact-door-surface", area: "Shop", room: "Front", cableM: 12, gauge: { awg: 22 }, supervision: "double-eol" });
    const floorId = site.floors[0].id;
    const designer = await signedIn(actors.designer.email);
    const s = String(site.id);
    const upload = (b: Browser, form: FormData) => b.call(floorPlan.PUT, "PUT", `/api/sites/${s}/floors/${floorId}/plan`, { params: { siteId: s, floorId: String(floorId) }, multipart: form });

    const pdf = await upload(designer, fileForm(new TextEncoder().encode("%PDF-1.7\n"), "plan.png", "image/png"));
    expect(pdf.status).toBe(415);
    expect(((await pdf.json()) as { error: string }).error).toMatch(/PNG or JPEG/);
    const installer = await signedIn(actors.installer.email);
    expect((await upload(installer, fileForm(pngHeader(1000, 500), "plan.png", "image/png"))).status).toBe(403);

    const first = await upload(designer, fileForm(pngHeader(1000, 500), "ground.png", "image/png"));
    expect(first.status).toBe(201);
    const planId = String(((await first.json()) as { plan: { id: number } }).plan.id);
    const again = await upload(designer, fileForm(jpegHeader(1000, 500), "ground.jpg", "image/jpeg"));
    expect(again.status).toBe(200);
    expect(await again.json()).toMatchObject({ replaced: true, plan: { id: Number(planId), contentType: "image/jpeg" } });

    const img = await installer.call(image.GET, "GET", `/api/sites/${s}/plans/${planId}/image`, { params: { siteId: s, planId } });
    expect(img.status).toBe(200);
    expect(img.headers.get("content-type")).toBe("image/jpeg");
    expect(Buffer.compare(Buffer.from(await img.arrayBuffer()), Buffer.from(jpegHeader(1000, 500)))).toBe(0);

    const calibrate = (json: unknown) => designer.call(calibration.PUT, "PUT", `/api/sites/${s}/plans/${planId}/calibration`, { params: { siteId: s, planId }, json });
    const bad = await calibrate({ a: { x: 0, y: 0 }, b: { x: 400, y: 0 }, distance: 0 });
    expect(bad.status).toBe(422);
    expect(((await bad.json()) as { issues: { path: string }[] }).issues.map((i) => i.path)).toEqual(["distance"]);
    // 400 px for 8 m: 0.02 m/px
    expect(await (await calibrate({ a: { x: 0, y: 0 }, b: { x: 400, y: 0 }, distance: 8 })).json()).toMatchObject({ plan: { metresPerPixel: 0.02 } });

    const place = (json: unknown) => designer.call(items.POST, "POST", `/api/sites/${s}/plans/${planId}/items`, { params: { siteId: s, planId }, json });
    const door = await place({ kind: "detector", detectorId: det.id, x: 100, y: 100 });
    expect(door.status).toBe(201);
    const doorId = ((await door.json()) as { id: number }).id;
    expect((await place({ kind: "detector", detectorId: det.id, x: 5, y: 5 })).status).toBe(409);
    const panelId = ((await (await place({ kind: "panel", label: "Panel", x: 900, y: 400 })).json()) as { id: number }).id;
    expect((await place({ kind: "panel", x: 2000, y: 400 })).status).toBe(422);

    const moved = await designer.call(planItem.PATCH, "PATCH", `/api/sites/${s}/plan-items/${doorId}`, { params: { siteId: s, itemId: String(doorId) }, json: { x: 120, y: 100 } });
    expect(await moved.json()).toMatchObject({ x: 120, y: 100 });

    // (120,100)→(120,400)→(900,400): 300 + 780 = 1080 px × 0.02 = 21.6 m; + 0.5 m + 1 m slack, no rise = 23.1 m
    const saved = await designer.call(routes.PUT, "PUT", `/api/sites/${s}/plan-routes`, {
      params: { siteId: s },
      json: { fromItemId: doorId, toItemId: panelId, legs: [{ planId: Number(planId), points: [{ x: 120, y: 100 }, { x: 120, y: 400 }, { x: 900, y: 400 }] }] },
    });
    expect(saved.status).toBe(200);
    expect(await saved.json()).toMatchObject({ run: { ok: true, basis: "measured-on-plan", totalM: 23.1 } });
    const row = await ScheduleDetectorRecord.findByPk(Number(det.id));
    expect([row!.cableM, row!.cableBasis]).toEqual([23.1, "measured-on-plan"]);

    const listed = (await (await installer.call(plans.GET, "GET", `/api/sites/${s}/plans`, { params: { siteId: s } })).json()) as { plans: { items: unknown[] }[]; routes: { run: { totalM: number } }[] };
    expect(listed.plans[0].items).toHaveLength(2);
    expect(listed.routes.map((r) => r.run.totalM)).toEqual([23.1]);

    const rival = await makeOrganisation("Plans rival");
    const outsider = await signedIn(rival.actors.designer.email);
    expect((await outsider.call(plans.GET, "GET", `/api/sites/${s}/plans`, { params: { siteId: s } })).status).toBe(404);
    expect((await outsider.call(image.GET, "GET", `/api/sites/${s}/plans/${planId}/image`, { params: { siteId: s, planId } })).status).toBe(404);
  });
});
