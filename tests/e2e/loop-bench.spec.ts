import { test, expect, type Page } from "@playwright/test";
import { openHome, signedInAs, signedOut } from "./support";

const shot = (page: Page, name: string) => page.screenshot({ path: `test-results/loop-bench-${name}.png`, fullPage: true });

test.use(signedInAs("installer"));

test("a short at the detector end reads normal with the resistor at the panel, and short with the resistor at the detector", async ({ page }) => {
  await openHome(page);
  await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Loop bench" }).click();
  await expect(page.getByRole("heading", { name: "Loop bench" })).toBeVisible();

  await page.getByLabel("Input type", { exact: true }).selectOption({ label: "2.2 kΩ input" });
  await page.getByRole("radio", { name: "single end-of-line", exact: true }).check();
  await expect(page.getByTestId("panel-report")).toHaveText("normal");
  await expect(page.getByTestId("meter-reading")).toContainText("kΩ");
  await shot(page, "at-rest");

  await page.getByRole("radio", { name: "resistor at the panel", exact: true }).check();
  await page.getByRole("radio", { name: "short at the detector end", exact: true }).check();
  // the resistor stays in circuit beyond the short: 2.2 kΩ plus the cable, inside the normal band
  await expect(page.getByTestId("panel-report")).toHaveText("normal");
  await expect(page.getByTestId("defeat-warning")).toContainText("Defeat");
  await expect(page.getByTestId("verdict-short-detector")).toContainText("defeat");
  await expect(page.getByTestId("loop-schematic")).toHaveAttribute("data-placement", "at-panel");
  await expect(page.getByTestId("loop-schematic").locator('[data-part="fault-short"]')).toHaveCount(1);
  await expect(page.getByTestId("findings").locator('[data-code="short-reads-normal"]')).toBeVisible();
  await shot(page, "at-panel-short");

  await page.getByRole("radio", { name: "resistor at the detector", exact: true }).check();
  // the short now bypasses the resistor: a few ohms of cable
  await expect(page.getByTestId("panel-report")).toHaveText("short");
  await expect(page.getByTestId("defeat-warning")).toHaveCount(0);
  await expect(page.getByTestId("meter-reading")).toHaveText(/ Ω$/);
  await expect(page.getByTestId("verdict-short-detector")).toContainText("detected");
});

test.describe(() => {
  test.use(signedInAs("designer"));
  test("the bench is keyboard-operable: detector states, a shared input's decode table, resistor values", async ({ page }) => {
    await page.goto("/loop-bench");
    await page.getByLabel("Input type", { exact: true }).selectOption({ label: "5.6 kΩ input" });
    await page.getByRole("radio", { name: "shared input", exact: true }).check();
    await expect(page.getByTestId("decode-table")).toBeVisible();
    await page.getByTestId("detector-state-0").getByRole("radio", { name: "active", exact: true }).focus();
    await page.keyboard.press("Space");
    await expect(page.getByTestId("panel-report")).toHaveText("detector A active");
    await page.getByTestId("resistor-field-eol").getByRole("textbox").fill("5k1");
    await expect(page.getByTestId("resistor-field-eol")).toContainText("The input type expects 5.6 kΩ");
    await page.getByTestId("resistor-field-eol").getByRole("textbox").fill("5k");
    await expect(page.getByTestId("nearest-preferred").first()).toContainText("Nearest E24: 4.7 kΩ or 5.1 kΩ");
    await shot(page, "shared");
  });
});

test("POST /api/loops/analyze: 422 with a readable path for a negative length, 404 for an unknown input type, 401 signed out", async ({ page, playwright }) => {
  const body = (lengthM: number, inputType = "input-2k2") => ({
    inputType,
    loop: {
      scheme: "single-eol",
      placement: "at-detector",
      detectors: [{ label: "Front door", contact: "NC", tamper: true }],
      tolerancePct: 5,
      cable: { gauge: { mm2: 0.22 }, lengthM, tempMinC: -10, tempMaxC: 40 },
    },
  });

  const anonymous = await playwright.request.newContext({ storageState: signedOut });
  const out = await anonymous.post("/api/loops/analyze", { data: body(30) });
  expect(out.status()).toBe(401);
  expect((await out.json()).error).toMatch(/sign in/i);

  const bad = await page.request.post("/api/loops/analyze", { data: body(-5) });
  expect(bad.status()).toBe(422);
  const err = await bad.json();
  expect(err.issues).toContainEqual({ path: "loop.cable.lengthM", message: expect.stringMatching(/can't be negative/) });

  const shared = await page.request.post("/api/loops/analyze", { data: { ...body(30), loop: { ...body(30).loop, scheme: "shared" } } });
  expect(shared.status()).toBe(422);
  expect((await shared.json()).issues).toContainEqual({ path: "loop.detectors", message: "a shared input takes exactly two detectors (this loop has 1)" });

  const unsupported = await page.request.post("/api/loops/analyze", { data: { ...body(30), loop: { ...body(30).loop, scheme: "double-eol" } } });
  expect(unsupported.status()).toBe(422);
  expect((await unsupported.json()).issues.map((i: { path: string }) => i.path)).toEqual(expect.arrayContaining(["loop.scheme", "loop.alarmOhms"]));

  const missing = await page.request.post("/api/loops/analyze", { data: body(30, "no-such-input") });
  expect(missing.status()).toBe(404);

  const ok = await page.request.post("/api/loops/analyze", { data: body(30) });
  expect(ok.status()).toBe(200);
  const analysis = await ok.json();
  expect(analysis.faults).toEqual({ "short-panel": "detected", "short-detector": "detected", cut: "mistaken" });
  expect(analysis.rows.find((r: { fault: string }) => r.fault === "cut").maxOhms).toBe("Infinity");

  const types = await page.request.get("/api/loops/input-types");
  expect((await types.json()).inputTypes.map((t: { id: string }) => t.id)).toContain("input-2k2");

  const doc = await anonymous.get("/api/openapi.json");
  expect(doc.status()).toBe(200);
  const openapi = await doc.json();
  expect(openapi.openapi).toBe("3.1.0");
  expect(openapi.paths["/api/loops/analyze"].post.responses).toHaveProperty("422");
  await anonymous.dispose();
});

test("a four-core loop-back: shorting two chosen cores changes the verdict and the schematic", async ({ page }) => {
  await page.goto("/loop-bench");
  await page.getByLabel("Input type", { exact: true }).selectOption({ label: "2.2 kΩ input" });
  await page.getByRole("radio", { name: "single end-of-line", exact: true }).check();
  await page.getByRole("radio", { name: "loop-back resistor", exact: true }).check();
  const schematic = page.getByTestId("loop-schematic");
  await expect(page.getByTestId("panel-report")).toHaveText("normal");
  await expect(schematic.locator('[data-part="conductor-fault"]')).toHaveCount(0);

  await page.getByTestId("conductor-kind").getByRole("radio", { name: "short between two cores", exact: true }).check();
  // the four cores are drawn by colour on the schematic and offered by colour
  await expect(schematic.locator('[data-part="cores"] [data-core]')).toHaveCount(4);
  await page.getByTestId("core-green").click();
  await page.getByTestId("core-white").click();
  await page.getByTestId("conductor-position").getByRole("radio", { name: "at the detector end", exact: true }).check();
  // green and white close the loop-back resistor at the detector: a short there bypasses it, a few ohms of cable
  await expect(page.getByTestId("panel-report")).toHaveText("short");
  await expect(schematic.locator('[data-part="conductor-fault"]')).toHaveAttribute("data-cores", "green white");
  await expect(page.getByTestId("conductor-result")).toContainText(/a short between the green and white cores at the detector end/i);
  // at rest it reads as a short; with the contact open the loop reads open, which this input reports as an alarm
  await expect(page.getByTestId("conductor-verdict")).toHaveText("mistaken");
  await shot(page, "cores-green-white");

  // yellow and green at the detector end join the two sides of the contact: the alarm is masked
  await page.getByTestId("core-white").click();
  await page.getByTestId("core-yellow").click();
  await expect(page.getByTestId("core-yellow")).toHaveAttribute("aria-pressed", "true");
  await page.getByTestId("detector-state-0").getByRole("radio", { name: "active", exact: true }).check();
  await expect(schematic.locator('[data-part="conductor-fault"]')).toHaveAttribute("data-cores", "green yellow");
  await expect(page.getByTestId("conductor-verdict")).toHaveText("defeat");
  await expect(page.getByTestId("panel-report")).toHaveText("normal");
  await expect(page.getByTestId("defeat-warning")).toContainText("a short between the green and yellow cores at the detector end reads as normal");
  await shot(page, "cores-yellow-green");
});

test("a six-core cable: the supply cut reads as an alarm, and a short to the supply's 0 V hides the tamper", async ({ page }) => {
  await page.goto("/loop-bench");
  await page.getByLabel("Input type", { exact: true }).selectOption({ label: "2.2 kΩ input" });
  await page.getByRole("radio", { name: "single end-of-line", exact: true }).check();
  await page.getByRole("radio", { name: "resistor at the detector", exact: true }).check();
  await page.getByLabel("Each detector has a tamper contact (NC, in series)").check();
  await page.getByTestId("cable-cores").getByRole("radio", { name: "six-core, alarm, tamper and supply pairs", exact: true }).check();
  await page.getByTestId("conductor-kind").getByRole("radio", { name: "one core open", exact: true }).check();
  // six cores offered by colour, the supply pair among them
  await expect(page.getByTestId("conductor-cores").getByRole("button")).toHaveCount(6);
  // the schematic draws all six cores, the tamper contact on its own pair and the supply pair beside it
  const schematic = page.getByTestId("loop-schematic");
  await expect(schematic.locator('[data-part="cores"] [data-core]')).toHaveCount(6);
  await expect(schematic.locator('[data-part="tamper-pair"] [data-part="contact-t-0"]')).toHaveCount(1);
  await expect(schematic.locator('[data-part="supply-pair"]')).toBeVisible();
  await page.getByTestId("core-red").click();
  await page.getByTestId("conductor-position").getByRole("radio", { name: "at the detector end", exact: true }).check();
  await expect(page.getByTestId("conductor-result")).toContainText(/the red core open at the detector end, cutting the detectors' supply/i);
  await expect(schematic.locator('[data-part="conductor-fault"]')).toHaveAttribute("data-cores", "red");
  await expect(schematic.locator('[data-part="conductor-fault"]')).toHaveAttribute("data-kind", "open");
  // the relay drops to its alarm position: the detector at rest reads as an alarm, not as a fault
  await expect(page.getByTestId("panel-report")).toHaveText(/^active/);
  await expect(page.getByTestId("conductor-verdict")).toHaveText("mistaken");

  await page.getByTestId("conductor-kind").getByRole("radio", { name: "short between two cores", exact: true }).check();
  await page.getByTestId("core-blue").click();
  await page.getByTestId("core-black").click();
  await page.getByTestId("detector-state-0").getByRole("radio", { name: "tamper", exact: true }).check();
  await expect(page.getByTestId("conductor-result")).toContainText(/a short between the blue and black cores at the detector end/i);
  await expect(page.getByTestId("panel-report")).toHaveText("normal");
  await expect(page.getByTestId("conductor-verdict")).toHaveText("defeat");
  // the short drawn between the two cores chosen, and the tamper contact drawn open on its pair
  await expect(schematic.locator('[data-part="conductor-fault"]')).toHaveAttribute("data-cores", "blue black");
  await expect(schematic.locator('[data-part="tamper-pair"] [data-part="contact-t-0"]')).toHaveAttribute("data-closed", "false");
  await shot(page, "six-core-blue-black");
});
