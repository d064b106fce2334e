import { readFileSync } from "node:fs";
import { test, expect, type Page } from "@playwright/test";
import { signedInAs } from "./support";

const fixture = (name: string) => `tests/fixtures/catalog/${name}`;

/** The numbers in one column of a kind's table, top to bottom. */
async function columnNumbers(page: Page, kind: string, header: string): Promise<number[]> {
  const table = page.getByTestId(`catalog-table-${kind}`);
  const headers = await table.locator("thead th").allInnerTexts();
  const index = headers.findIndex((h) => h.startsWith(header));
  expect(index, `column ${header}`).toBeGreaterThanOrEqual(0);
  const cells = await table.locator(`tbody tr td:nth-child(${index + 1})`).allInnerTexts();
  return cells.map((c) => Number.parseFloat(c));
}

test.describe.serial("the catalog", () => {
  test.use(signedInAs("engineer"));

  test("an engineer filters and sorts the tables and opens an input type's band scale", async ({ page }) => {
    await page.goto("/catalog");
    await expect(page.getByRole("heading", { name: "Catalog", exact: true })).toBeVisible();
    await expect(page.getByTestId("life-safety-caution")).toContainText("authority having jurisdiction");

    await page.getByLabel("Kind").selectOption("panels");
    await expect(page.getByTestId("catalog-table-detectors")).toHaveCount(0);
    await page.getByTestId("catalog-table-panels").getByRole("button", { name: /Max zones/ }).click();
    const up = await columnNumbers(page, "panels", "Max zones");
    expect(up.length).toBeGreaterThanOrEqual(3);
    expect(up).toEqual([...up].sort((a, b) => a - b));
    await page.getByTestId("catalog-table-panels").getByRole("button", { name: /Max zones/ }).click();
    const down = await columnNumbers(page, "panels", "Max zones");
    expect(down).toEqual([...up].reverse());
    await expect(page).toHaveURL(/kind=panels.*sort=maxZones.*dir=desc/);

    await page.getByLabel("Kind").selectOption("all");
    await page.getByLabel("Search").fill("fire zone");
    const row = (id: string) => page.locator(`[data-testid="catalog-row"][data-entry-id="${id}"]`);
    await expect(row("input-fire-1k-4k7")).toHaveCount(1);
    await expect(row("board-fire-4")).toHaveCount(1); // its inputs are of the fire zone input type
    await expect(row("contact-door-surface")).toHaveCount(0);
    await expect(row("input-4k7")).toHaveCount(0);
    await page.screenshot({ path: "test-results/catalog-table.png", fullPage: true });

    await page.getByRole("link", { name: /Fire zone input/ }).first().click();
    await expect(page).toHaveURL(/\/catalog\/input-fire-1k-4k7$/);
    await expect(page.getByTestId("life-safety-caution")).toBeVisible();
    const scale = page.getByTestId("band-scale").first();
    await expect(scale).toBeVisible();
    await expect(scale.locator("[data-report]")).toHaveCount(5);
    // band edges of the fire zone table in catalog/input-types.yaml
    await expect(scale.getByTestId("band-edge")).toHaveText(["0 Ω", "400 Ω", "2.5 kΩ", "4.5 kΩ", "7.5 kΩ"]);
    await expect(scale.getByTestId("expected-reading")).toHaveText([/5\.7 kΩ at rest/, /1 kΩ detector active/]);
    const figures = page.getByTestId("entry-figures");
    await expect(figures.getByRole("row", { name: /End-of-line resistor/ })).toContainText("1000 Ω");
    await expect(figures.getByRole("row", { name: /Alarm resistor/ })).toContainText("4700 Ω");
    await expect(figures.getByRole("row", { name: /Max loop resistance/ })).toContainText("50 Ω");
    await page.screenshot({ path: "test-results/catalog-input-type.png", fullPage: true });

    // a shared input: one scale per scheme, four expected readings on the shared one
    await page.goto("/catalog/input-5k6");
    await expect(page.getByTestId("band-scale")).toHaveCount(3);
    await expect(page.locator('[data-testid="band-scale"][data-scheme="shared"]').getByTestId("expected-reading")).toHaveCount(4);
    await page.getByTestId("scheme-shared").screenshot({ path: "test-results/catalog-shared-scale.png" });

    expect((await page.request.get("/api/catalog/no-such-entry")).status()).toBe(404);
    const one = await page.request.get("/api/catalog/input-fire-1k-4k7");
    expect(one.status()).toBe(200);
    expect(await one.json()).toMatchObject({ kind: "inputTypes", origin: "shipped", entry: { id: "input-fire-1k-4k7", lifeSafety: true } });
  });

  test("an engineer uploads a good file, sees the diff, confirms and finds the entry in the table", async ({ page }) => {
    await page.goto("/catalog");
    await page.getByLabel("Catalog file (.yaml)").setInputFiles(fixture("good-upload.yaml"));
    await page.getByRole("button", { name: "Check file" }).click();
    const preview = page.getByTestId("upload-preview");
    await expect(preview).toContainText("good-upload.yaml is valid");
    await expect(preview.getByTestId("diff-added")).toContainText("custom-beam-outdoor");
    await expect(preview.getByTestId("diff-changed")).toContainText("contact-door-surface");
    await expect(preview.getByTestId("diff-changed")).toContainText("listPrice");
    await page.getByTestId("catalog-upload").screenshot({ path: "test-results/catalog-upload-preview.png" });
    // nothing is stored by a preview
    expect((await (await page.request.get("/api/catalog/uploads")).json()).uploads).toEqual([]);

    await page.getByRole("button", { name: "Confirm and store as version 1" }).click();
    await expect(page.getByRole("status").filter({ hasText: "Stored as version 1" })).toBeVisible();
    const row = (id: string) => page.locator(`[data-testid="catalog-row"][data-entry-id="${id}"]`);
    await expect(row("custom-beam-outdoor")).toBeVisible();
    await expect(row("custom-beam-outdoor").getByTestId("origin-badge")).toHaveText("Your upload");
    await expect(row("contact-door-surface").getByTestId("origin-badge")).toContainText("replaces shipped");
    await expect(row("contact-door-recessed").getByTestId("origin-badge")).toHaveCount(0);
    await expect(page.getByTestId("upload-versions").locator("tbody tr")).toHaveCount(1);

    const href = await page.getByTestId("upload-versions").getByRole("link", { name: /Download/ }).getAttribute("href");
    const download = await page.request.get(href!);
    expect(download.headers()["content-type"]).toMatch(/^text\/yaml/);
    expect(await download.text()).toBe(readFileSync(fixture("good-upload.yaml"), "utf8"));

    await page.getByRole("link", { name: "Outdoor beam pair (house profile)" }).click();
    await expect(page).toHaveURL(/\/catalog\/custom-beam-outdoor$/);
    await expect(page.getByTestId("origin-badge")).toContainText("Your upload, version 1");
    await expect(page.getByTestId("entry-figures")).toContainText("38 mA");
  });

  test("a bad file is refused with its line-numbered errors and nothing is stored", async ({ page }) => {
    await page.goto("/catalog");
    await page.getByLabel("Catalog file (.yaml)").setInputFiles(fixture("bad-upload.yaml"));
    await page.getByRole("button", { name: "Check file" }).click();
    const errors = page.getByTestId("catalog-errors");
    await expect(errors).toContainText("bad-upload.yaml:3:5 detectors.0.mounting");
    await expect(errors).toContainText("bad-upload.yaml:12:7 detectors.0.power.standbyMa");
    await expect(errors).toContainText('found the text "25 mA"');
    await expect(page.getByRole("button", { name: /Confirm/ })).toHaveCount(0);
    await page.locator("#organisation-catalog + div").screenshot({ path: "test-results/catalog-upload-refused.png" });

    // the API says the same; binary and oversized files are refused before the loader
    const post = (name: string, mimeType: string, buffer: Buffer, mode = "store") => page.request.post("/api/catalog/uploads", { multipart: { mode, file: { name, mimeType, buffer } } });
    const bad = await post("bad-upload.yaml", "application/yaml", readFileSync(fixture("bad-upload.yaml")));
    expect(bad.status()).toBe(422);
    expect((await bad.json()).errors).toEqual(expect.arrayContaining([expect.objectContaining({ file: "bad-upload.yaml", line: 12, column: 7, path: "detectors.0.power.standbyMa" })]));
    expect((await post("catalog.yaml", "application/zip", Buffer.from([0x50, 0x4b, 0x03, 0x04, 0x14, 0x00]))).status()).toBe(415);
    expect((await post("catalog.yaml", "application/yaml", Buffer.from([0x50, 0x4b, 0x03, 0x04, 0x14, 0x00]))).status()).toBe(415); // ZIP magic
    expect((await post("big.yaml", "application/yaml", Buffer.alloc(300 * 1024, "#"))).status()).toBe(413);
    expect((await (await page.request.get("/api/catalog/uploads")).json()).uploads).toHaveLength(1);
  });

  test.describe(() => {
    test.use(signedInAs("designer"));
    test("a designer sees the catalog and the versions but no upload control; the API refuses (403)", async ({ page }) => {
      await page.goto("/catalog");
      await expect(page.locator('[data-testid="catalog-row"][data-entry-id="custom-beam-outdoor"]')).toBeVisible();
      await expect(page.getByTestId("upload-versions").locator("tbody tr")).toHaveCount(1);
      await expect(page.getByTestId("catalog-upload")).toHaveCount(0);
      await expect(page.getByLabel("Catalog file (.yaml)")).toHaveCount(0);
      const res = await page.request.post("/api/catalog/uploads", {
        multipart: { mode: "preview", file: { name: "good-upload.yaml", mimeType: "application/yaml", buffer: readFileSync(fixture("good-upload.yaml")) } },
      });
      expect(res.status()).toBe(403);
      expect((await res.json()).error).toMatch(/cannot upload organisation catalogs/);
      expect((await page.request.get("/api/catalog")).status()).toBe(200);
    });
  });
});
