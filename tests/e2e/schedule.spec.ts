import { test, expect, type Page } from "@playwright/test";
import { fileURLToPath } from "node:url";
import { openHome, signedInAs } from "./support";

// The device schedule page: add and edit with the shared form schema, sort, filter, bulk edit, import, export.

const fixture = (name: string) => fileURLToPath(new URL(`../fixtures/schedule/${name}`, import.meta.url));

async function newSite(page: Page): Promise<number> {
  const res = await page.request.post("/api/sites", { data: { name: `Schedule site ${Date.now()}`, areas: [{ name: "Shop floor", rooms: ["Front", "Counter"] }, { name: "Back", rooms: ["Stock room", "Yard", "Office"] }] } });
  expect(res.status()).toBe(200);
  return (await res.json()).id;
}

const rows = (page: Page) => page.getByTestId("schedule-table").locator("tbody tr");
const labels = async (page: Page) => (await rows(page).locator("td:nth-child(2)").allTextContents()).map((s) => s.trim());

test.use(signedInAs("designer"));

test("a designer keeps a device schedule: add, edit, import, sort, filter, bulk edit, export, delete", async ({ page }) => {
  test.setTimeout(120_000);
  const siteId = await newSite(page);
  await page.goto(`/sites/${siteId}/schedule`);
  await expect(page.getByTestId("schedule-table")).toContainText("The schedule is empty");

  // add: the form checks with the handler's schema before sending
  await page.getByRole("button", { name: "Add detector" }).click();
  const form = page.getByRole("form", { name: "Add detector" });
  await form.getByRole("button", { name: "Add detector" }).click();
  await expect(form).toContainText("a label is needed");
  await form.getByLabel("Label").fill("Till drawer contact");
  await form.getByLabel("Detector type").selectOption({ label: "Surface door contact" });
  await form.getByLabel("Area").selectOption("Shop floor");
  await form.getByLabel("Room").selectOption("Counter");
  await form.getByLabel("Cable run (m)").fill("5.5");
  await form.getByLabel("Gauge").fill("0.22 mm2");
  await form.getByRole("button", { name: "Add detector" }).click();
  await expect(page.getByTestId("schedule-message")).toHaveText("Till drawer contact added.");
  await expect(rows(page)).toHaveCount(1);
  await expect(rows(page).first()).toContainText("5.5 m");
  await expect(rows(page).first()).toContainText("0.22 mm2");

  // edit
  await page.getByRole("button", { name: "Edit Till drawer contact" }).click();
  const edit = page.getByRole("form", { name: "Save changes" });
  await edit.getByLabel("Cable run (m)").fill("7");
  await edit.getByRole("button", { name: "Save changes" }).click();
  await expect(page.getByTestId("schedule-message")).toHaveText("Till drawer contact saved.");
  await expect(rows(page).first()).toContainText("7 m");

  // import ten more
  await page.getByRole("button", { name: "Import CSV" }).click();
  await page.getByLabel("CSV file").setInputFiles(fixture("corner-shop.csv"));
  await page.getByRole("button", { name: "Import 10 detectors" }).click();
  await expect(rows(page)).toHaveCount(11);

  // sort by cable run, longest first; then filter
  await page.getByRole("button", { name: /^Cable \(m\)/ }).click();
  await page.getByRole("button", { name: /^Cable \(m\)/ }).click();
  await expect(page.getByRole("columnheader", { name: /Cable/ })).toHaveAttribute("aria-sort", "descending");
  expect((await labels(page)).slice(0, 3)).toEqual(["Yard shutter", "Office motion", "Office window"]);
  await page.getByLabel("Filter").fill("motion");
  expect(await labels(page)).toEqual(["Office motion", "Stock room motion", "Shop motion", "Counter motion"]);

  // bulk edit the filtered rows: select all shown, set a gauge and the supervision
  await page.getByLabel("Select every detector shown").check();
  const bulk = page.getByTestId("bulk-edit");
  await expect(bulk).toContainText("4 selected");
  await bulk.getByLabel("Gauge").fill("24 AWG");
  await bulk.getByLabel("Supervision").selectOption("shared-ok");
  await bulk.getByRole("button", { name: "Apply to 4" }).click();
  await expect(page.getByTestId("schedule-message")).toHaveText("4 detectors changed.");
  for (const r of await rows(page).all()) {
    await expect(r).toContainText("24 AWG");
    await expect(r).toContainText("may share an input");
  }
  await page.getByLabel("Filter").fill("");
  await expect(page.getByRole("row", { name: /Shop door/ })).toContainText("22 AWG");

  // export: the same columns the import reads
  const download = page.waitForEvent("download");
  await page.getByRole("link", { name: "Export CSV" }).click();
  const file = await download;
  const text = await (await import("node:fs/promises")).readFile((await file.path())!, "utf8");
  expect(text.split("\r\n")[0]).toBe("label,type,area,room,cable_m,gauge,supervision");
  expect(text).toContain("Shop motion,motion-wall,Shop floor,Front,10,24 AWG,shared-ok");
  expect(text).toContain("Till drawer contact,contact-door-surface,Shop floor,Counter,7,0.22 mm2,double-eol");

  // delete two
  await bulk.getByRole("button", { name: "Clear selection" }).click();
  await page.getByLabel("Select Yard shutter").check();
  await page.getByLabel("Select Office window").check();
  page.once("dialog", (d) => void d.accept());
  await page.getByRole("button", { name: "Delete 2" }).click();
  await expect(page.getByTestId("schedule-message")).toHaveText("2 detectors deleted.");
  await expect(rows(page)).toHaveCount(9);
});

test.describe(() => {
  test.use(signedInAs("installer"));
  test("an installer reads the schedule without controls, and the API refuses a change with 403", async ({ page }) => {
    await openHome(page);
    await page.getByTestId("site-list").getByText("Marrowbank Community Library").click();
    await page.getByRole("link", { name: "Device schedule" }).click();
    await expect(rows(page)).toHaveCount(43); // the demo schedule: 41 wired and 2 wireless detectors (scripts/demo/seed-demo-design.ts)
    await expect(page.getByTestId("fire-caution")).toBeVisible();
    await expect(page.getByRole("button", { name: "Add detector" })).toHaveCount(0);
    await expect(page.getByRole("button", { name: "Import CSV" })).toHaveCount(0);
    await expect(page.getByRole("checkbox")).toHaveCount(0);
    const siteId = Number(new URL(page.url()).pathname.split("/")[2]);
    const res = await page.request.post(`/api/sites/${siteId}/schedule`, { data: { label: "X", catalogId: "motion-wall", area: "", room: "", cableM: 5, gauge: { awg: 22 }, supervision: "none" } });
    expect(res.status()).toBe(403);
    expect((await res.json()).error).toContain("Your role (installer) cannot edit device schedules");
  });
});
