import { test, expect, type APIResponse } from "@playwright/test";
import AxeBuilder from "@axe-core/playwright";
import { signedInAs } from "./support";
import { pngHeader } from "@/lib/plan/test-images";

// The floor plans page: a plan uploaded, calibrated and furnished through the API, then read as a designer sees it.

test.use(signedInAs("designer"));

test("a floor plan shows its detectors by shape and text, its scale bar and its route; a floor without a plan says so", async ({ page }) => {
  test.setTimeout(120_000);
  const api = page.request;
  const ok = async <T = { id: number }>(res: APIResponse): Promise<T> => {
    expect(res.ok(), `${res.status()} ${await res.text()}`).toBe(true);
    return (await res.json()) as T;
  };
  const site = await ok<{ id: number; floors: { id: number }[] }>(
    await api.post("/api/sites", { data: { name: `Plans site ${Date.now()}`, floors: [{ name: "Ground floor", areas: [{ name: "Shop", rooms: [{ name: "Front" }] }] }, { name: "First floor", areas: [] }] } }),
  );
  const det = await ok<{ id: string }>(await api.post(`/api/sites/${site.id}/schedule`, { data: { label: "Shop door", catalogId: "contact-door-surface", area: "Shop", room: "Front", cableM: 12, gauge: { awg: 22 }, supervision: "double-eol" } }));
  const up = await ok<{ plan: { id: number } }>(await api.put(`/api/sites/${site.id}/floors/${site.floors[0].id}/plan`, { multipart: { file: { name: "ground.png", mimeType: "image/png", buffer: Buffer.from(pngHeader(2000, 1000)) } } }));
  const planId = up.plan.id;
  // 500 px for 10 m: 0.02 m/px
  await ok(await api.put(`/api/sites/${site.id}/plans/${planId}/calibration`, { data: { a: { x: 100, y: 100 }, b: { x: 600, y: 100 }, distance: 10 } }));
  const door = await ok(await api.post(`/api/sites/${site.id}/plans/${planId}/items`, { data: { kind: "detector", detectorId: det.id, x: 300, y: 300 } }));
  const panel = await ok(await api.post(`/api/sites/${site.id}/plans/${planId}/items`, { data: { kind: "panel", label: "Panel", x: 1500, y: 300 } }));
  // 1200 px × 0.02 = 24 m + 0.5 m + 1 m slack = 25.5 m
  const route = await ok<{ run: { totalM: number } }>(await api.put(`/api/sites/${site.id}/plan-routes`, { data: { fromItemId: door.id, toItemId: panel.id, legs: [{ planId, points: [{ x: 300, y: 300 }, { x: 1500, y: 300 }] }] } }));
  expect(route.run.totalM).toBe(25.5);

  await page.goto(`/sites/${site.id}/plans`);
  const marker = page.getByRole("img", { name: "Shop door: on no input yet" });
  await expect(marker).toBeVisible();
  await expect(marker).toHaveAttribute("data-shape", "circle");
  await expect(page.getByRole("list", { name: "Detectors on Ground floor" })).toContainText("Shop door: on no input yet");
  // the widest round length within min(300, 2000 / 4) px: 300 px × 0.02 = 6 m at most, so 5 m
  await expect(page.getByTestId("scale-bar")).toContainText("5 m");
  await expect(page.getByRole("region", { name: "First floor" })).toContainText("No plan for this floor yet.");
  await expect(page.getByRole("img", { name: "Panel (panel)" })).toBeAttached();

  const schedule = await ok<{ detectors: { id: string; cableM: number }[] }>(await api.get(`/api/sites/${site.id}/schedule`));
  expect(schedule.detectors.find((d) => d.id === det.id)?.cableM).toBe(25.5);

  const axe = await new AxeBuilder({ page }).analyze();
  expect(axe.violations.filter((v) => v.impact === "serious" || v.impact === "critical").map((v) => v.id)).toEqual([]);
});

test("a site with no floors says a plan belongs to a floor and where to add them", async ({ page }) => {
  const made = await page.request.post("/api/sites", { data: { name: `No floors ${Date.now()}` } });
  expect(made.ok(), await made.text()).toBe(true);
  const { id } = (await made.json()) as { id: number };
  await page.goto(`/sites/${id}/plans`);
  await expect(page.getByTestId("no-floors")).toContainText("This site has no floors yet");
  await page.getByRole("link", { name: "Add the site's floors" }).click();
  await expect(page).toHaveURL(new RegExp(`/sites/${id}/edit$`));
});
