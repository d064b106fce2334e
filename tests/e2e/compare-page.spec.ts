import { test, expect, type Page } from "@playwright/test";
import { signedInAs } from "./support";
import { demoSiteName } from "./support-api";

// The compare page in the browser: it hydrates without a console or React error, the chart keeps the spaces in
// layout names, and a layout with detectors left off its inputs is never marked best and says why.

test.use(signedInAs("designer"));

function collectErrors(page: Page): string[] {
  const errors: string[] = [];
  page.on("console", (m) => m.type() === "error" && errors.push(m.text()));
  page.on("pageerror", (e) => errors.push(e.message));
  return errors;
}

test("the compare page loads without a console or hydration error, and an incomplete layout is never best", async ({ page }) => {
  const { sites } = (await (await page.request.get("/api/sites")).json()) as { sites: { id: number; name: string }[] };
  const site = sites.find((s) => s.name === demoSiteName)!;
  const { layouts } = (await (await page.request.get(`/api/sites/${site.id}/layouts`)).json()) as { layouts: { id: number; name: string }[] };
  const demo = layouts.find((l) => l.name === "One detector per input")!;
  expect(demo).toBeTruthy();

  // a copy of the demo layout with its first three inputs emptied: it leaves more inputs spare than any other
  const current = (await (await page.request.get(`/api/layouts/${demo.id}`)).json()) as { document: { inputs: unknown[] } };
  const document = { ...current.document, inputs: current.document.inputs.slice(3) };
  const made = await page.request.post(`/api/sites/${site.id}/layouts`, { data: { name: `Three detectors left off ${Date.now()}`, document } });
  expect(made.status(), await made.text()).toBe(200);
  const incomplete = ((await made.json()) as { layout: { id: number } }).layout.id;

  const errors = collectErrors(page);
  const ids = [...layouts.map((l) => l.id), incomplete];
  await page.goto(`/sites/${site.id}/compare?ids=${ids.join(",")}`);
  await expect(page.getByTestId("compare-table")).toBeVisible();
  await page.waitForLoadState("networkidle");
  expect(errors, "console and React errors on the compare page").toEqual([]);

  // the chart's labels read as words: "Large panel with shared inputs" is drawn on two lines
  const chartText = await page.getByTestId("comparison-chart").evaluate((svg) => [...svg.querySelectorAll("text")].map((t) => t.textContent).join(" | "));
  expect(chartText).toContain("Large panel with shared inputs");
  expect(await page.locator("#cmp-chart-title").textContent()).toContain("spare, coverage");

  // the incomplete layout's column: the reason, and no "best" anywhere in it
  const column = ids.length; // the table's columns: the measure, then one per layout in the order asked
  const header = page.getByTestId("compare-table").locator(`thead th:nth-child(${column + 1})`);
  await expect(header.getByTestId("not-ranked")).toHaveText(/^not ranked: 3 detectors are not placed/);
  const cells = page.getByTestId("compare-table").locator(`tbody tr > td:nth-child(${column + 1})`);
  expect(await cells.count()).toBeGreaterThan(0);
  await expect(cells.filter({ hasText: /best/i })).toHaveCount(0);
  await expect(page.getByTestId("compare-summary")).toContainText("is not ranked: 3 detectors are not placed");
});
