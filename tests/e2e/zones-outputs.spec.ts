import { test, expect, type Locator, type Page } from "@playwright/test";
import { signedInAs } from "./support";
import { demoSiteName } from "./support-api";

// Zones, areas, sounders and strobes in the editor, on a copy of the demo's shared-input layout (so no other spec
// sees the changes): an area added and a zone programmed, two sounders and a strobe placed on the panel's outputs
// (one by keyboard), the battery figure rising by exactly their alarm current, an overloaded output, and grade 3.

test.use(signedInAs("designer"));

type Draw = { id: string; alarmMa: number; standbyMa: number; ownBattery?: { chargingMa: number } };

async function copyOfDemoLayout(page: Page): Promise<{ siteId: number; layoutId: number }> {
  const { sites } = await (await page.request.get("/api/sites")).json();
  const siteId = (sites as { id: number; name: string }[]).find((s) => s.name === demoSiteName)!.id;
  const { layouts } = await (await page.request.get(`/api/sites/${siteId}/layouts`)).json();
  const demo = (layouts as { id: number; name: string }[]).find((l) => l.name === "Large panel with shared inputs")!;
  const res = await page.request.post(`/api/layouts/${demo.id}/duplicate`, { data: { name: `Zones and outputs ${Date.now()}` } });
  expect(res.status()).toBe(200);
  return { siteId, layoutId: (await res.json()).layout.id };
}

/** "1234.5 mA" → 1234.5 */
const milliamps = async (l: Locator) => Number((await l.textContent())!.replace(/[^\d.]/g, ""));

async function mouseDrag(page: Page, from: Locator, to: Locator) {
  await to.scrollIntoViewIfNeeded();
  // the list of sounders and strobes scrolls on its own beside the boards
  await from.scrollIntoViewIfNeeded();
  const a = (await from.boundingBox())!;
  const b = (await to.boundingBox())!;
  await page.mouse.move(a.x + a.width / 2, a.y + a.height / 2);
  await page.mouse.down();
  await page.mouse.move(a.x + a.width / 2 + 12, a.y + a.height / 2 + 4, { steps: 4 });
  await page.mouse.move(b.x + b.width / 2, b.y + b.height / 2, { steps: 12 });
  await page.mouse.up();
}

/** Space picks the sounder up, the down arrow moves output by output while the live region says where, Space drops. */
async function keyboardDrag(page: Page, label: string, where: string) {
  const live = page.locator("[id^=DndLiveRegion]");
  await page.getByRole("button", { name: label, exact: true }).focus();
  await page.keyboard.press("Space");
  await expect(live).toContainText(`Picked up ${label}, on no output`);
  await expect(live).toContainText("Arrow keys move between outputs");
  for (let i = 0; i < 30 && !(await live.textContent())?.includes(`over ${where},`); i++) {
    const before = await live.textContent();
    await page.keyboard.press("ArrowDown");
    await expect(live).not.toHaveText(before ?? "");
  }
  await expect(live).toContainText(`${label} is over ${where}, free`);
  await page.keyboard.press("Space");
  await expect(live).toContainText(`${label} on ${where}`);
}

async function addDevice(page: Page, type: string, label: string) {
  const list = page.getByRole("region", { name: /Sounders and strobes/ });
  const form = list.locator("details", { hasText: "Add a sounder or strobe" });
  if (!(await form.evaluate((d) => (d as HTMLDetailsElement).open))) await form.locator("summary").click();
  await form.getByLabel("Type").selectOption({ label: type });
  await form.getByLabel("Label").fill(label);
  await form.getByLabel(/Cable run/).fill("15");
  await form.getByRole("button", { name: "Add", exact: true }).click();
  await expect(page.getByTestId("output-pool").getByRole("button", { name: label, exact: true })).toBeVisible();
}

test("a designer programs zones and areas, puts sounders and a strobe on outputs, overloads one, and sets grade 3", async ({ page }) => {
  test.setTimeout(180_000);
  const { siteId, layoutId } = await copyOfDemoLayout(page);
  const { catalog } = await (await page.request.get("/api/catalog")).json();
  const byId = new Map<string, Draw>([...catalog.sounders, ...catalog.strobes].map((d: Draw) => [d.id, d]));
  await page.goto(`/sites/${siteId}/layouts/${layoutId}`);
  await expect(page.getByTestId("boards")).toBeVisible();
  const findings = page.getByTestId("findings");
  const saved = async () => expect(page.getByTestId("save-state")).toHaveText("Saved", { timeout: 20_000 });

  // areas: the copy has the demo's two; the designer adds a third and reads the grade's caution
  const areas = page.getByTestId("areas-grade");
  await expect(areas).toContainText("Check against the edition your authority uses.");
  await areas.getByLabel("New area name").fill("Warehouse");
  await areas.getByRole("button", { name: "Add area" }).click();
  await expect(areas.getByRole("list", { name: "Areas of this layout" })).toContainText("Warehouse (0 zones)");
  // set and unset from the copy's first keypad
  const fromKeypad = areas.getByLabel("Area Warehouse set from Keypad 1");
  await fromKeypad.check();
  await expect(page.getByTestId("editor-message")).toHaveText("Area Warehouse set from Keypad 1");
  await expect(fromKeypad).toBeChecked();

  // zone programming, reached from the detector's input: the lobby becomes an entry/exit zone in the warehouse
  const lobby = page.getByRole("listitem", { name: /Entrance lobby motion/ });
  await lobby.locator("summary", { hasText: "programming of Entrance lobby motion" }).click();
  await lobby.getByLabel("Zone type of Entrance lobby motion").selectOption({ label: "entry/exit" });
  await lobby.getByLabel("Area of Entrance lobby motion").selectOption({ label: "Warehouse" });
  await expect(lobby.locator("summary", { hasText: "programming of Entrance lobby motion" })).toContainText("entry/exit, Warehouse");
  await expect(areas).toContainText("Warehouse (1 zone)");
  await lobby.getByLabel("Entry time of Entrance lobby motion, seconds").fill("40");
  await lobby.getByLabel("Exit time of Entrance lobby motion, seconds").fill("50");
  await lobby.getByLabel("Exit time of Entrance lobby motion, seconds").press("Enter");
  await expect(findings.locator('[data-code="zone-time-over-grade"]')).toHaveCount(0);
  // 50 s is past the entry time limit (EN 50131-1 entry time, 45 s, from memory)
  await lobby.getByLabel("Entry time of Entrance lobby motion, seconds").fill("50");
  await lobby.getByLabel("Entry time of Entrance lobby motion, seconds").press("Enter");
  await expect(findings.locator('[data-code="zone-time-over-grade"]')).toContainText("entry time 50 s; grade 2 allows at most 45 s");
  await lobby.getByLabel("Entry time of Entrance lobby motion, seconds").fill("40");
  await lobby.getByLabel("Entry time of Entrance lobby motion, seconds").press("Enter");
  await expect(findings.locator('[data-code="zone-time-over-grade"]')).toHaveCount(0);

  // start from no sounders: the demo's four come off
  for (const label of ["Front wall sounder", "Rear wall sounder", "Lending hall sounder", "Front wall strobe"]) await page.getByRole("button", { name: `Remove ${label}` }).click();
  const batteryAlarm = page.getByTestId("supply-panel-battery-alarm");
  const batteryRest = page.getByTestId("supply-panel-battery-rest");
  await expect(page.getByTestId("output-panel-1")).toHaveAccessibleName("Control panel, siren output 1, free");
  const alarmBefore = await milliamps(batteryAlarm);
  const restBefore = await milliamps(batteryRest);

  await addDevice(page, "Outdoor sounder", "Yard sounder");
  await addDevice(page, "Outdoor sounder with its own battery", "Gate sounder");
  await addDevice(page, "Amber strobe", "Gate strobe");
  // on no output yet: nothing drawn from the battery
  await expect(batteryAlarm).toHaveText(`${alarmBefore} mA`);

  const pool = page.getByTestId("output-pool");
  await mouseDrag(page, pool.getByRole("button", { name: "Yard sounder", exact: true }), page.getByTestId("output-panel-1"));
  await expect(page.getByTestId("output-panel-1")).toContainText("Yard sounder");
  await page.getByTestId("output-panel-2").scrollIntoViewIfNeeded();
  await keyboardDrag(page, "Gate sounder", "Control panel, siren output 2");
  await expect(page.getByTestId("output-panel-2")).toContainText("Gate sounder");
  await mouseDrag(page, pool.getByRole("button", { name: "Gate strobe", exact: true }), page.getByTestId("output-panel-3"));
  await expect(page.getByTestId("output-panel-3")).toContainText("Gate strobe");
  await expect(pool).toContainText("Every sounder and strobe is on an output.");

  // the panel's battery carries them: in alarm their alarm currents, at rest their standby plus the own battery's charging
  const [yard, gate, strobe] = ["sounder-outdoor", "sounder-outdoor-battery", "strobe-amber"].map((id) => byId.get(id)!);
  const alarmAdded = yard.alarmMa + gate.alarmMa + strobe.alarmMa;
  const restAdded = yard.standbyMa + gate.standbyMa + (gate.ownBattery?.chargingMa ?? 0) + strobe.standbyMa;
  expect(alarmAdded).toBeGreaterThan(0);
  await expect.poll(() => milliamps(batteryAlarm)).toBeCloseTo(alarmBefore + alarmAdded, 1);
  await expect.poll(() => milliamps(batteryRest)).toBeCloseTo(restBefore + restAdded, 1);
  await expect(findings.locator('[data-code="output-overloaded"]')).toHaveCount(0);

  // the gate sounder joins the strobe on a 100 mA transistor output (family-large.yaml's rating): overloaded
  await page.getByLabel("Output for Gate sounder").selectOption({ label: "Control panel, programmable output 1" });
  await expect(page.getByTestId("output-panel-3")).toContainText("Gate sounder");
  await expect(findings.locator('[data-code="output-overloaded"]')).toContainText("Control panel, programmable output 1 drives Gate strobe, Gate sounder");
  await expect(page.getByTestId("output-panel-3-load")).toContainText(`${gate.alarmMa + strobe.alarmMa} mA in alarm`);
  await expect(page.getByTestId("output-panel-3-load")).toContainText("over its 100 mA");
  // the same current, on another output of the same battery
  await expect.poll(() => milliamps(batteryAlarm)).toBeCloseTo(alarmBefore + alarmAdded, 1);

  // grade 3: tamper must be reported apart from the alarm, so the shared inputs' detectors draw a new finding
  const gradeFindings = findings.locator('[data-code="grade-tamper-not-apart"], [data-code="grade-unsupervised"]');
  await expect(gradeFindings).toHaveCount(0);
  await areas.getByLabel("Security grade (EN 50131-1)").selectOption("3");
  await expect(areas.getByTestId("grade-rules")).toContainText("a detector's tamper reported apart from its alarm");
  await expect(gradeFindings.first()).toBeVisible();
  await expect(findings.locator('[data-code="grade-tamper-not-apart"]').first()).toContainText("a grade 3 system reports tamper apart");

  // all of it saved: after a reload the overloaded output and the lobby's programming are as left
  await saved();
  await page.reload();
  await expect(page.getByTestId("output-panel-3")).toContainText("Gate sounder");
  await expect(findings.locator('[data-code="output-overloaded"]')).toBeVisible();
  await expect(page.getByRole("listitem", { name: /Entrance lobby motion/ }).locator("summary", { hasText: "programming of Entrance lobby motion" })).toContainText("entry/exit, Warehouse");
  await expect(page.getByTestId("areas-grade").getByLabel("Security grade (EN 50131-1)")).toHaveValue("3");
  await expect(page.getByTestId("areas-grade").getByLabel("Area Warehouse set from Keypad 1")).toBeChecked();
});
