import { test, expect, type APIRequestContext, type Browser } from "@playwright/test";
import { signedInAs, type DemoRole } from "./support";

// The installer's phone after a reading: the verdict, the likely cause and the next thing to check stay on
// screen once the reading is saved, worked out in the browser from the same lib/commissioning code, so they
// appear offline too; the loop's readings are listed with theirs. The layout is made by the designer and
// approved by the engineer (a second pair of eyes).

type Expected = { test: string; nominalOhms: number | "Infinity" };
type Row = { spare: boolean; boardKey: string; input: number; scheme: string; detectors: { label: string }[]; expected: Expected[] };

const schedule = [
  "label,type,area,room,cable_m,gauge,supervision",
  "Phone test front door,contact-door-surface,Ground,Hall,12,22 AWG,single-eol",
  "Phone test back door,contact-door-recessed,Ground,Kitchen,30,22 AWG,single-eol",
].join("\n");

let layoutId: number;
let siteId: number;
let row: Row;

async function as(browser: Browser, role: DemoRole, run: (api: APIRequestContext) => Promise<void>) {
  const ctx = await browser.newContext(signedInAs(role));
  try {
    await run(ctx.request);
  } finally {
    await ctx.close();
  }
}

// eslint-disable-next-line @typescript-eslint/no-explicit-any -- JSON answers, checked by the assertions that use them
async function ok(res: Awaited<ReturnType<APIRequestContext["post"]>>, what: string): Promise<any> {
  expect(res.status(), `${what}: ${await res.text()}`).toBeLessThan(300);
  return res.json();
}

test.beforeAll(async ({ browser }) => {
  await as(browser, "designer", async (api) => {
    const site = await ok(await api.post("/api/sites", { data: { name: `Phone diagnosis ${Date.now()}`, address: "1 Test Row", areas: [{ name: "Ground", rooms: ["Hall", "Kitchen"] }] } }), "site");
    siteId = site.id;
    await ok(await api.post(`/api/sites/${siteId}/schedule/import`, { data: { mode: "confirm", csv: schedule, fileName: "phone.csv" } }), "schedule");
    const v = await ok(await api.post(`/api/sites/${siteId}/layouts`, { data: { name: "Phone test layout", suggestion: { allowShared: false, busCableM: 20 } } }), "layout");
    layoutId = v.layout.id;
    await ok(await api.post(`/api/layouts/${layoutId}/review`, { data: { action: "submit" } }), "submit");
  });
  await as(browser, "engineer", async (api) => {
    await ok(await api.post(`/api/layouts/${layoutId}/review`, { data: { action: "approve" } }), "approve");
    const sheet = await ok(await api.get(`/api/layouts/${layoutId}/sheet`), "sheet");
    row = (sheet.sheet.boards as { rows: Row[] }[]).flatMap((b) => b.rows).find((r) => !r.spare && r.scheme === "single-eol")!;
  });
});

test.use({ ...signedInAs("installer"), viewport: { width: 390, height: 844 } }); // a phone in the plant room

test("the installer records a wrong reading and sees the likely cause and the next check, online and offline", async ({ page, context }) => {
  const rest = row.expected.find((e) => e.test === "rest")!;
  expect(typeof rest.nominalOhms).toBe("number");
  // about 40 % of the resistor the sheet asks for: a resistor from other stock (common practice, no published source)
  const wrong = `${((rest.nominalOhms as number) * 0.4 / 1000).toFixed(2)}k`;

  await page.goto(`/sites/${siteId}/layouts/${layoutId}/commissioning`);
  await page.getByTestId(`board-${row.boardKey}`).click();
  await page.getByTestId(`loop-${row.boardKey}-${row.input}`).click();
  await expect(page.getByTestId("loop-panel")).toContainText(row.detectors[0].label);

  await page.getByTestId("reading-rest").fill(wrong);
  await expect(page.getByTestId("verdict-rest")).toHaveAttribute("data-verdict", "fail");
  await page.getByTestId("save-rest").click();
  await expect(page.getByTestId("latest-rest")).toHaveAttribute("data-verdict", "fail");

  // the field is empty again, and the diagnosis stays on screen
  await expect(page.getByTestId("reading-rest")).toHaveValue("");
  const advice = page.getByTestId("advice-rest");
  await expect(advice).toHaveAttribute("data-verdict", "fail");
  await expect(advice).toContainText("FAIL:");
  await expect(page.getByTestId("advice-rest-cause")).toContainText("probably the wrong resistor");
  await expect(page.getByTestId("advice-rest-next")).toContainText("Take the resistor out");
  await expect(advice).toBeInViewport({ ratio: 0.5 });
  await expect(page.getByTestId("loop-history")).toContainText("probably the wrong resistor");
  await page.screenshot({ path: "test-results/phone-diagnosis/after-wrong-reading.png", fullPage: true });

  // no signal: the short test read like rest, still diagnosed on the phone, kept to send later
  await context.setOffline(true);
  await page.getByTestId("reading-short").fill(`${((rest.nominalOhms as number) / 1000).toFixed(2)}k`);
  await page.getByTestId("save-short").click();
  await expect(page.getByTestId("advice-short-cause")).toContainText("the resistor is not at the end of the line");
  await expect(page.getByTestId("advice-short-next")).toContainText("Open the detector");
  await expect(page.getByTestId("loop-history")).toContainText("waiting to send");
  await context.setOffline(false);
});
