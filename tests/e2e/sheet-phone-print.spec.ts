import { test, expect, type APIRequestContext, type Page } from "@playwright/test";
import { paper, readPdf, squash, type PdfPage } from "../support/pdf-text";
import { signedInAs } from "./support";
import { demoSiteName } from "./support-api";

// The terminal sheet and commissioning pages on a 390 × 844 phone (no sideways scrolling, the readings to check
// on screen), and the sheet printed by Chromium: a page for each board, no near-empty page, "page N of M".

test.use(signedInAs("designer"));

type SheetJson = { sheet: { boards: { boardKey: string; name: string; deviceName: string; rows: { spare: boolean }[] }[] } };
interface Target {
  what: string;
  siteId: number;
  layoutId: number;
}

const PHONE = { width: 390, height: 844 };
/** The printed footer sits in the bottom page margin (12 mm, components/sheet/sheet-print-style.tsx); 72 pt per inch, 25.4 mm per inch. */
const FOOTER_BAND_PT = (12 / 25.4) * 72;

async function ok<T>(res: Awaited<ReturnType<APIRequestContext["get"]>>, what: string): Promise<T> {
  expect(res.status(), `${what}: ${await res.text()}`).toBe(200);
  return (await res.json()) as T;
}

/** The demo data's layouts (scripts/demo/seed-demo-design.ts); other specs add layouts to the demo site. */
const DEMO_LAYOUTS = ["One detector per input", "Large panel with shared inputs"];

async function demoTargets(api: APIRequestContext): Promise<Target[]> {
  const { sites } = await ok<{ sites: { id: number; name: string }[] }>(await api.get("/api/sites"), "sites");
  const site = sites.find((s) => s.name === demoSiteName)!;
  const { layouts } = await ok<{ layouts: { id: number; name: string }[] }>(await api.get(`/api/sites/${site.id}/layouts`), "layouts");
  expect(layouts.filter((l) => DEMO_LAYOUTS.includes(l.name))).toHaveLength(DEMO_LAYOUTS.length);
  return layouts.filter((l) => DEMO_LAYOUTS.includes(l.name)).map((l) => ({ what: `demo layout "${l.name}"`, siteId: site.id, layoutId: l.id }));
}

/** 60 detectors, one per input: a 16-input panel and six 8-input expansion boards of the shipped catalog's mid family. */
async function sixtyDetectorLayout(api: APIRequestContext): Promise<Target> {
  const site = await ok<{ id: number }>(await api.post("/api/sites", { data: { name: `Sixty detectors ${Date.now()}`, address: "9 Long Corridor", areas: [{ name: "Wing", rooms: ["Room"] }] } }), "site");
  const types = ["contact-door-surface", "contact-window-surface", "contact-door-recessed", "contact-window-recessed"];
  const csv = ["label,type,area,room,cable_m,gauge,supervision", ...Array.from({ length: 60 }, (_, i) => `Opening ${i + 1} of the long corridor,${types[i % 4]},Wing,Room ${1 + (i % 12)},${12 + (i % 30)},22 AWG,single-eol`)].join("\n");
  const imported = await ok<{ detectors: { id: string }[] }>(await api.post(`/api/sites/${site.id}/schedule/import`, { data: { mode: "confirm", csv, addUnknownPlaces: true } }), "schedule");
  const ids = imported.detectors.map((d) => d.id);
  expect(ids).toHaveLength(60);
  const document = {
    panelId: "panel-mid-16",
    boards: Array.from({ length: 6 }, (_, b) => ({ key: `b${b + 1}`, kind: "expansion", catalogId: "board-mid-8", busAddress: b + 1 })),
    inputs: ids.map((id, i) => ({ boardKey: i < 16 ? "panel" : `b${Math.floor((i - 16) / 8) + 1}`, input: i < 16 ? i + 1 : ((i - 16) % 8) + 1, detectorIds: [id], scheme: "single-eol", placement: "at-detector" })),
    power: { standbyProfileId: "intruder-grade-2", safetyFactor: 1.2 },
    busCableM: 60,
  };
  const made = await ok<{ layout: { id: number } }>(await api.post(`/api/sites/${site.id}/layouts`, { data: { name: "Sixty on a mid panel", document } }), "layout");
  return { what: "the 60-detector layout", siteId: site.id, layoutId: made.layout.id };
}

async function overflow(page: Page) {
  return page.evaluate(() => ({ scroll: document.documentElement.scrollWidth, inner: window.innerWidth }));
}

/** How far down the page its lowest text reaches, as a share of the page's height; the footer band is not counted. */
function usedShare(p: PdfPage): number {
  const body = p.items.filter((i) => i.y < p.height - FOOTER_BAND_PT);
  return body.length ? Math.max(...body.map((i) => i.y)) / p.height : 0;
}

let targets: Target[] = [];

test.beforeAll(async ({ playwright }) => {
  const api = await playwright.request.newContext({ ...signedInAs("designer"), baseURL: test.info().project.use.baseURL });
  targets = [...(await demoTargets(api)), await sixtyDetectorLayout(api)];
  await api.dispose();
});

test("on a 390 px phone the sheet and commissioning pages never scroll sideways, and each reading to check is on screen", async ({ page }) => {
  test.setTimeout(180_000);
  await page.setViewportSize(PHONE);
  for (const t of targets) {
    const base = `/sites/${t.siteId}/layouts/${t.layoutId}`;
    await page.goto(`${base}/sheet`);
    await expect(page.getByTestId("terminal-sheet")).toBeVisible();
    const o = await overflow(page);
    expect(o.scroll, `${t.what}: sheet ${o.scroll} px wide in ${o.inner} px`).toBeLessThanOrEqual(o.inner);
    // the first input's tests: the expected reading, the measured and pass boxes all inside the screen's width
    const tests = page.getByTestId("sheet-tests").first();
    if ((await tests.count()) > 0) {
      for (const label of ["Meter reading expected", "Measured", "Pass / fail"]) {
        const box = await tests.locator(`td[data-label="${label}"]`).first().boundingBox();
        expect(box, `${t.what}: ${label} drawn`).not.toBeNull();
        expect(box!.x + box!.width, `${t.what}: ${label} inside the screen`).toBeLessThanOrEqual(PHONE.width);
        expect(box!.width).toBeGreaterThan(PHONE.width / 2); // stacked as a card, not a squeezed column
      }
    }
    await page.goto(`${base}/commissioning`);
    await expect(page.getByRole("heading").first()).toBeVisible();
    const c = await overflow(page);
    expect(c.scroll, `${t.what}: commissioning ${c.scroll} px wide in ${c.inner} px`).toBeLessThanOrEqual(c.inner);
  }
});

test("the board index jumps to each board", async ({ page }) => {
  await page.setViewportSize(PHONE);
  const t = targets.at(-1)!;
  await page.goto(`/sites/${t.siteId}/layouts/${t.layoutId}/sheet`);
  const index = page.getByTestId("sheet-board-index");
  await expect(index.getByRole("link")).toHaveCount(7);
  await index.getByRole("link").last().click();
  await expect(page).toHaveURL(/#board-b6$/);
  const box = await page.getByTestId("sheet-board-b6").boundingBox();
  expect(box && Math.abs(box.y)).toBeLessThan(40);
});

/** Prints the sheet as Chromium does on the chosen paper and checks it page by page. */
async function checkPrint(page: Page, t: Target, paperSize: "A4" | "LETTER") {
  const { sheet } = await ok<SheetJson>(await page.request.get(`/api/layouts/${t.layoutId}/sheet`), "sheet");
  const heading = (b: SheetJson["sheet"]["boards"][number]) => `${b.name} — ${b.deviceName}`;
  await page.goto(`/sites/${t.siteId}/layouts/${t.layoutId}/sheet`);
  // the page streams in behind its loading skeleton: wait for the sheet itself before touching its toolbar
  await expect(page.getByTestId("terminal-sheet")).toBeVisible({ timeout: 30_000 });
  // the organisation's default paper first (the demo organisation's is A4), then the other from the toolbar
  if (paperSize !== "A4") await page.getByTestId("sheet-toolbar").locator("input[name=paper]").nth(1).check({ force: true });
  await expect(page.getByTestId("terminal-sheet")).toHaveAttribute("data-paper", paperSize);
  const pdf = await readPdf(await page.pdf({ preferCSSPageSize: true, printBackground: true }));
  const what = `${t.what} on ${paperSize}`;
  // the page size the print style asked for: ISO 216 A4 or US Letter, portrait
  expect(Math.round(pdf.pages[0].width)).toBe(Math.round(paper[paperSize].width));
  expect(Math.round(pdf.pages[0].height)).toBe(Math.round(paper[paperSize].height));
  // one page per board: page n carries board n's heading (the table header names it) and no other board's
  expect(pdf.pageCount, `${what}: ${pdf.pageCount} pages for ${sheet.boards.length} boards`).toBe(sheet.boards.length);
  pdf.pages.forEach((p, n) => {
    const on = sheet.boards.filter((b) => p.text.includes(heading(b)));
    expect(on.map((b) => b.name), `${what}: page ${n + 1} names exactly its own board`).toEqual([sheet.boards[n].name]);
    if (n > 0) {
      const top = p.items.filter((i) => i.y < p.height - FOOTER_BAND_PT).sort((a, b) => a.y - b.y)[0];
      expect(top.str.startsWith(sheet.boards[n].name), `${what}: page ${n + 1} starts with its board, not "${top.str}"`).toBe(true);
    }
    // every used input of the board is on its page (its row starts with the input number, at the left edge)
    const used = sheet.boards[n].rows.filter((r) => !r.spare).length;
    expect(p.text, `${what}: page ${n + 1} ends with its sign-off`).toContain(`Sign-off: ${sheet.boards[n].name}`);
    if (used > 0) expect(p.items.filter((i) => /^\d+$/.test(i.str.trim()) && i.x < p.width * 0.1).length, `${what}: page ${n + 1} rows`).toBeGreaterThanOrEqual(used);
    if (n < pdf.pageCount - 1) expect(usedShare(p), `${what}: page ${n + 1} used ${Math.round(usedShare(p) * 100)} %`).toBeGreaterThanOrEqual(0.2);
    expect(squash(p.text), `${what}: page ${n + 1} footer`).toContain(`page ${n + 1} of ${pdf.pageCount}`);
  });
  expect(pdf.text).not.toContain("Boards on this sheet");
}

test("printed by Chromium on A4 and on US Letter, one page per board, each used to at least a fifth of its height, page N of M in the footer", async ({ page }) => {
  test.setTimeout(300_000);
  for (const t of targets) for (const size of ["A4", "LETTER"] as const) await checkPrint(page, t, size);
});
