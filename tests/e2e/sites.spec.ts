import { test, expect, type Page } from "@playwright/test";
import { signedInAs } from "./support";

// Sites in the interface: a new site with its floors, areas and rooms, its installer, a schedule import that offers
// the one room the site lacks, the detector form's room list, a refused removal, and a duplicated layout.

const scheduleRows = (page: Page) => page.getByTestId("schedule-table").locator("tbody tr");

test.describe("as a designer", () => {
  test.use(signedInAs("designer"));

  test("creates a site with two floors and rooms, assigns the installer, imports a schedule with an unknown room, duplicates a layout", async ({ page }) => {
    test.setTimeout(180_000);
    const name = `Harbour depot ${Date.now()}`;
    await page.goto("/");
    await page.getByRole("link", { name: "New site" }).click();
    await expect(page).toHaveURL(/\/sites\/new$/);
    const form = page.getByRole("form", { name: "New site" });

    // the form checks with the API's schema and puts each error beside its field
    await form.getByRole("button", { name: "Create site" }).click();
    await expect(form).toContainText("Name the site");
    await form.getByLabel("Site name").fill(name);
    await form.getByLabel("Address").fill("7 Quay Road");
    await form.getByLabel("Customer contact").fill("Harbour office");
    await form.getByLabel("Contact e-mail").fill("not-an-address");
    await form.getByRole("button", { name: "Create site" }).click();
    await expect(form).toContainText("not an e-mail address");
    await form.getByLabel("Contact e-mail").fill("office@harbour.example");

    await page.getByTestId("add-floor").click();
    await page.getByTestId("add-floor").click();
    await page.getByTestId("floor-name-0").fill("Ground floor");
    await page.getByTestId("floor-name-1").fill("First floor");
    await page.getByTestId("add-area-0").click();
    await page.getByTestId("area-name-0-0").fill("Warehouse");
    await page.getByTestId("add-room-0-0").click();
    await page.getByTestId("add-room-0-0").click();
    await page.getByTestId("room-name-0-0-0").fill("Loading bay");
    await page.getByTestId("room-name-0-0-1").fill("Dispatch");
    await page.getByTestId("add-area-1").click();
    await page.getByTestId("area-name-1-0").fill("Offices");
    await page.getByTestId("add-room-1-0").click();
    await page.getByTestId("room-name-1-0-0").fill("Reception");
    await page.getByRole("button", { name: "Move room Dispatch up" }).click();
    await expect(page.getByTestId("room-name-0-0-0")).toHaveValue("Dispatch");
    // two rooms of one area with the same name are refused beside the second
    await page.getByTestId("room-name-0-0-1").fill("dispatch");
    await form.getByRole("button", { name: "Create site" }).click();
    await expect(form).toContainText("Warehouse already has a room called dispatch");
    await page.getByTestId("room-name-0-0-1").fill("Loading bay");
    await form.getByRole("button", { name: "Create site" }).click();

    await expect(page).toHaveURL(/\/sites\/\d+$/);
    const siteId = Number(/\/sites\/(\d+)$/.exec(page.url())![1]);
    await expect(page.getByRole("heading", { name })).toBeVisible();
    await expect(page.getByText("Harbour office · office@harbour.example")).toBeVisible();
    for (const text of ["Ground floor", "First floor", "Dispatch", "Loading bay", "Reception"]) await expect(page.getByText(text, { exact: true })).toBeVisible();

    // assign the installer from the organisation's installers
    await page.getByRole("link", { name: "Edit site" }).click();
    await page.getByTestId("site-installers").getByLabel(/Demo Installer/).check();
    await page.getByRole("button", { name: "Save installers" }).click();
    await expect(page.getByText("1 installer assigned.")).toBeVisible();
    await page.goto(`/sites/${siteId}`);
    await expect(page.getByTestId("site-installer-names")).toHaveText("Demo Installer");

    // a CSV naming a room the site lacks: listed and offered, stored only when accepted
    await page.goto(`/sites/${siteId}/schedule`);
    await page.getByRole("button", { name: "Import CSV" }).click();
    const csv = [
      "label,type,area,room,cable_m,gauge,supervision",
      "Loading bay door,contact-door-surface,Warehouse,Loading bay,25,22 AWG,double-eol",
      "Dispatch motion,motion-wall,warehouse,dispatch,18,22 AWG,single-eol",
      "Front desk door,contact-door-surface,Offices,Front desk,12,22 AWG,double-eol",
    ].join("\n");
    await page.getByLabel("CSV file").setInputFiles({ name: "harbour.csv", mimeType: "text/csv", buffer: Buffer.from(csv) });
    await expect(page.getByTestId("import-unknown-places")).toContainText("room Front desk in Offices (row 4)");
    await expect(page.getByRole("button", { name: "Import 3 detectors" })).toBeDisabled();
    await page.getByLabel(/Add it to the site's structure/).check();
    await page.getByRole("button", { name: "Add 1 and import 3 detectors" }).click();
    await expect(scheduleRows(page)).toHaveCount(3);
    await expect(scheduleRows(page).nth(1)).toContainText("Dispatch");

    // the detector form picks from the site's lists, the imported room included, and adds a room inline
    await page.getByRole("button", { name: "Add detector" }).click();
    const add = page.getByRole("form", { name: "Add detector" });
    await add.getByLabel("Label").fill("Kitchen window");
    await add.getByLabel("Area").selectOption("Offices");
    await expect(add.getByTestId("add-detector-room").locator("option")).toContainText(["(no room)", "Reception", "Front desk", "+ Add a new room…"]);
    await add.getByTestId("add-detector-room").selectOption({ label: "+ Add a new room…" });
    await add.getByLabel("New room name").fill("Kitchen");
    await add.getByRole("button", { name: "Add room" }).click();
    await expect(add.getByTestId("add-detector-room")).toHaveValue("Kitchen");
    await add.getByLabel("Cable run (m)").fill("9");
    await add.getByRole("button", { name: "Add detector" }).click();
    await expect(page.getByTestId("schedule-message")).toHaveText("Kitchen window added.");
    await expect(scheduleRows(page)).toHaveCount(4);

    // removing a room detectors use is refused, with how many, and nothing changes
    await page.goto(`/sites/${siteId}/edit`);
    await page.getByRole("button", { name: "Remove room Kitchen" }).click();
    await page.getByTestId("save-structure").click();
    await expect(page.getByTestId("structure-error")).toContainText("room Kitchen in Offices is used by 1 detector");
    const site = await (await page.request.get(`/api/sites/${siteId}`)).json();
    expect(site.areas.find((a: { name: string }) => a.name === "Offices").rooms.map((r: { name: string }) => r.name)).toEqual(["Reception", "Front desk", "Kitchen"]);

    // the sheet offers to go to the assigned installer
    const created = await page.request.post(`/api/sites/${siteId}/layouts`, { data: { name: "Option A", panelId: "panel-large-32" } });
    expect(created.status()).toBe(200);
    const layoutId = (await created.json()).layout.id as number;
    await page.goto(`/sites/${siteId}/layouts/${layoutId}/sheet`);
    await expect(page.getByTestId("send-sheet")).toContainText("Demo Installer");

    // duplicate the layout as a new draft with its own history
    await page.goto(`/sites/${siteId}/layouts`);
    await page.getByTestId(`duplicate-layout-${layoutId}`).click();
    const dup = page.getByRole("form", { name: "Duplicate Option A" });
    await expect(dup.getByLabel("Name of the copy")).toHaveValue("Copy of Option A");
    await dup.getByLabel("Name of the copy").fill("Option B");
    await dup.getByRole("button", { name: "Create draft copy" }).click();
    await expect(page).toHaveURL(new RegExp(`/sites/${siteId}/layouts/(?!${layoutId}$)\\d+$`));
    const copyId = Number(/\/layouts\/(\d+)$/.exec(page.url())![1]);
    const revisions = await (await page.request.get(`/api/layouts/${copyId}/revisions`)).json();
    expect(revisions.revisions.map((r: { revision: number }) => r.revision)).toEqual([1]);
    const copy = await (await page.request.get(`/api/layouts/${copyId}`)).json();
    expect(copy.layout).toMatchObject({ name: "Option B", status: "draft" });
  });
});

test.describe("as an installer", () => {
  test.use(signedInAs("installer"));

  test("sees why a new site cannot be made, and no New site button", async ({ page }) => {
    await page.goto("/");
    await expect(page.getByTestId("site-list")).toBeVisible();
    await expect(page.getByRole("link", { name: "New site" })).toHaveCount(0);
    await page.goto("/sites/new");
    await expect(page.getByTestId("refusal")).toContainText("cannot create and edit sites");
  });
});
