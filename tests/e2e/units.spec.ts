import { test, expect } from "@playwright/test";
import { authFile } from "./support";

// An organisation on imperial units types cable runs in feet; the schedule stores metres. The rival organisation
// is used, so the demo organisation's metric pages stay as the other specs expect; its settings are put back after.

const rivalAdmin = { storageState: authFile("rival-admin") };
const rivalDesigner = { storageState: authFile("rival-designer") };

test("cable runs are typed and shown in feet for an imperial organisation, and stored in metres", async ({ browser }) => {
  test.setTimeout(120_000);
  const adminContext = await browser.newContext(rivalAdmin);
  const admin = await adminContext.newPage();
  const saved = await (await admin.request.get("/api/organisation")).json();
  const designerContext = await browser.newContext(rivalDesigner);
  try {
    await admin.goto("/settings");
    await admin.getByLabel("Units").selectOption("imperial");
    await admin.getByRole("button", { name: "Save settings" }).click();
    await expect(admin.getByRole("status")).toHaveText("Settings saved.");

    const page = await designerContext.newPage();
    // the site through the API: this test is about lengths, the site form has its own spec
    const made = await page.request.post("/api/sites", { data: { name: `Imperial site ${Date.now()}`, areas: [{ name: "Workshop floor", rooms: ["Bench room"] }] } });
    expect(made.status()).toBe(200);
    const siteId = ((await made.json()) as { id: number }).id;

    await page.goto(`/sites/${siteId}/schedule`);
    await page.getByRole("button", { name: "Add detector" }).click();
    const form = page.getByRole("form", { name: "Add detector" });
    await form.getByLabel("Label").fill("Bench room door");
    await form.getByLabel("Area").selectOption("Workshop floor");
    await form.getByLabel("Room").selectOption("Bench room");
    await form.getByLabel("Cable run (ft)").fill("100");
    await form.getByRole("button", { name: "Add detector" }).click();
    await expect(page.getByTestId("schedule-message")).toHaveText("Bench room door added.");
    const row = page.getByRole("row", { name: /Bench room door/ });
    await expect(row).toContainText("100 ft");
    await expect(page.getByRole("columnheader", { name: /Cable \(ft\)/ })).toBeVisible();

    const stored = async () => ((await (await page.request.get(`/api/sites/${siteId}/schedule`)).json()) as { detectors: { cableM: number }[] }).detectors[0].cableM;
    expect(await stored()).toBe(30.48); // NIST Handbook 44, Appendix C: 1 ft = 0.3048 m exactly

    // saved again without touching the length: not moved by a rounding
    await page.getByRole("button", { name: "Edit Bench room door" }).click();
    const edit = page.getByRole("form", { name: "Save changes" });
    await expect(edit.getByLabel("Cable run (ft)")).toHaveValue("100");
    await edit.getByLabel("Label").fill("Bench room side door");
    await edit.getByRole("button", { name: "Save changes" }).click();
    await expect(page.getByTestId("schedule-message")).toHaveText("Bench room side door saved.");
    expect(await stored()).toBe(30.48);

    // the loop bench types its cable in feet too
    await page.goto("/loop-bench");
    await expect(page.getByTestId("cable-length").locator("xpath=following-sibling::span")).toHaveText("ft");
  } finally {
    const back = await admin.request.patch("/api/organisation", { data: saved });
    expect(back.status()).toBe(200);
    await designerContext.close();
    await adminContext.close();
  }
});
