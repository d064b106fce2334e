import { test, expect, type APIRequestContext, type Page } from "@playwright/test";
import { readFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import { randomUUID } from "node:crypto";
import type * as mariadb from "mariadb";
import { demo, mailPage, signedInAs } from "./support";
import { demoSiteName, openDb } from "./support-api";
import { readPdf } from "../support/pdf-text";

// The whole job on the demo library: an engineer compares two layouts, records the choice and approves one; the
// sheet goes by e-mail to the site's installer; the installer opens the sheet, downloads its PDF and commissions
// a loop on which the resistor was fitted at the panel end (the short test reads about the resistor's value),
// sees that diagnosis, puts it right, uploads a photo of the terminations; once every loop has passed (the rest
// recorded through the API to keep the test short) the commissioning record is there and the layout is marked
// commissioned. Screenshots of each page go to test-results/whole-job/.

test.describe.configure({ mode: "serial" });

const shots = "test-results/whole-job";
const photo = fileURLToPath(new URL("../fixtures/photos/terminations.jpg", import.meta.url));

type Expected = { test: string; instruction: string; minOhms: number | "Infinity"; maxOhms: number | "Infinity"; nominalOhms: number | "Infinity"; rangeText: string };
type Row = { spare: boolean; boardKey: string; input: number; scheme: string; placement: string; zones: number[]; detectors: { label: string; lifeSafety: boolean }[]; resistors: { role: string; valueText: string; ohms: number }[]; expected: Expected[] };
type SheetJson = { approved: boolean; meta: { revision: number }; sheet: { caution: string | null; boards: { boardKey: string; name: string; rows: Row[] }[] } };

let conn: mariadb.Connection;
let siteId: number;
let chosen: { id: number; name: string };
let other: { id: number; name: string };

const num = (v: number | "Infinity") => (v === "Infinity" ? Infinity : v);
/** What a meter would show for a value: "OL" for open, kilohms with two decimals, else ohms with one. */
const meterText = (ohms: number) => (ohms === Infinity ? "OL" : ohms >= 1000 ? `${(ohms / 1000).toFixed(2)}k` : ohms.toFixed(1));

async function pdfText(bytes: Buffer): Promise<string> {
  expect(bytes.subarray(0, 5).toString("latin1")).toBe("%PDF-"); // ISO 32000-1, 7.5.2: the file header
  return (await readPdf(bytes)).text;
}

async function sheetJson(api: APIRequestContext, layoutId: number): Promise<SheetJson> {
  const res = await api.get(`/api/layouts/${layoutId}/sheet`);
  expect(res.status()).toBe(200);
  return res.json();
}

test.beforeAll(async ({ browser }) => {
  conn = await openDb();
  const [site] = await conn.query("SELECT id FROM sites WHERE name = ? ORDER BY id LIMIT 1", [demoSiteName]);
  siteId = site.id;
  let layouts = (await conn.query("SELECT id, name FROM layouts WHERE site_id = ? ORDER BY id", [siteId])) as { id: number; name: string }[];
  if (layouts.length < 2) {
    // without the demo layouts, two are made through the API from the hardware suggestions
    const ctx = await browser.newContext(signedInAs("designer"));
    const page = await ctx.newPage();
    for (const [name, allowShared] of [["One detector per input", false], ["Large panel with shared inputs", true]] as const) {
      const res = await page.request.post(`/api/sites/${siteId}/layouts`, { data: { name, suggestion: { allowShared, busCableM: 120 } } });
      expect(res.status(), await res.text()).toBe(200);
    }
    await ctx.close();
    layouts = (await conn.query("SELECT id, name FROM layouts WHERE site_id = ? ORDER BY id", [siteId])) as { id: number; name: string }[];
  }
  chosen = layouts[0];
  other = layouts[1];
});

test.afterAll(async () => {
  await conn?.end();
});

test.describe(() => {
  test.use(signedInAs("engineer"));
  test("an engineer compares two layouts, records the choice and approves one", async ({ page, browser }) => {
    await page.goto(`/sites/${siteId}/layouts`);
    await page.getByTestId("compare-link").click();
    await page.waitForURL(/\/compare\?ids=/);
    if (!page.url().includes(`ids=${chosen.id},${other.id}`)) await page.goto(`/sites/${siteId}/compare?ids=${chosen.id},${other.id}`);

    const table = page.getByTestId("compare-table");
    await expect(table).toContainText("Cost (list prices)");
    await expect(table).toContainText(/\d+ of \d+ used, \d+ spare/);
    await expect(table).toContainText(/\d+ mA at rest, \d+ mA in alarm, rated \d+ mA/);
    await expect(table).toContainText(/standby battery \d+\.\d Ah needed → \d+ Ah/);
    await expect(table).toContainText(/\d+ %/);
    await expect(page.getByTestId("comparison-chart")).toBeVisible();
    await expect(page.getByTestId("comparison-chart").locator("rect")).not.toHaveCount(0);
    // the shared layout's trade-offs in plain words, and every finding of each
    await expect(page.getByTestId(`compare-details-${other.id}`).getByTestId("tradeoffs")).toContainText("saves 1 input");
    await expect(page.getByTestId(`compare-details-${chosen.id}`).getByTestId("compare-findings").locator("li")).not.toHaveCount(0);
    await expect(page.getByTestId("life-safety-caution")).toBeVisible();
    await page.screenshot({ path: `${shots}/compare.png`, fullPage: true });

    await page.getByTestId("choose-form").getByLabel(chosen.name).check();
    await page.getByTestId("choose-form").getByLabel("Why (kept in the decision log)").fill("Every detector on its own input: full supervision coverage and spare inputs for the extension.");
    await page.getByRole("button", { name: "Record the decision" }).click();
    await expect(page.getByTestId("choose-message")).toContainText(`${chosen.name} chosen`);
    await expect(page.getByTestId("choices")).toContainText("full supervision coverage");

    // review: the designer who made it sends it, the engineer (a second pair of eyes) approves it
    await page.goto(`/sites/${siteId}/layouts/${chosen.id}/review`);
    await expect(page.getByTestId("review-state")).toHaveAttribute("data-state", "draft");
    await expect(page.getByTestId("action-approve")).toHaveAttribute("data-allowed", "false");
    await expect(page.getByTestId("action-approve")).toContainText("send it for review first");
    const designerContext = await browser.newContext(signedInAs("designer"));
    const sent = await designerContext.request.post(`/api/layouts/${chosen.id}/review`, { data: { action: "submit" } });
    expect(sent.status(), await sent.text()).toBe(200);
    await designerContext.close();
    await page.reload();
    await expect(page.getByTestId("review-state")).toHaveAttribute("data-state", "in-review");
    await page.getByLabel("Add a comment").fill("Checked the battery size against the fire profile; fine.");
    await page.getByRole("button", { name: "Comment" }).click();
    await expect(page.getByTestId("comments")).toContainText("Checked the battery size");
    await page.getByTestId("action-approve").getByRole("button").click();
    await expect(page.getByTestId("review-message")).toContainText("is now approved");
    await expect(page.getByTestId("review-state")).toHaveAttribute("data-state", "approved");
    await expect(page.getByTestId("decision-log")).toContainText("approved by Demo Engineer");
    await page.screenshot({ path: `${shots}/review.png`, fullPage: true });

    // the audit log has every step
    const steps = (await conn.query("SELECT action FROM audit_entries WHERE entity_type = 'layout' AND entity_id = ? AND action LIKE 'layout.%' ORDER BY id", [String(chosen.id)])) as { action: string }[];
    expect(steps.map((s) => s.action)).toEqual(expect.arrayContaining(["layout.choose", "layout.review.submit", "layout.comment", "layout.review.approve"]));

    // the editor shows the approved revision read-only
    await page.goto(`/sites/${siteId}/layouts/${chosen.id}`);
    await expect(page.getByTestId("read-only")).toContainText("approved revision 1 is frozen; changes make a new draft");
    await expect(page.getByTestId("start-new-draft")).toBeVisible();
    await page.screenshot({ path: `${shots}/editor-frozen.png` });
  });
});

test.describe(() => {
  test.use(signedInAs("designer"));
  test("a designer cannot approve: the review says who can", async ({ page }) => {
    await page.goto(`/sites/${siteId}/layouts/${other.id}/review`);
    await expect(page.getByTestId("action-approve")).toHaveAttribute("data-allowed", "false");
    const res = await page.request.post(`/api/layouts/${other.id}/review`, { data: { action: "approve" } });
    expect(res.status()).toBe(409); // a draft cannot be approved whoever asks: the state is checked first
    await page.request.post(`/api/layouts/${other.id}/review`, { data: { action: "submit" } });
    const again = await page.request.post(`/api/layouts/${other.id}/review`, { data: { action: "approve" } });
    expect(again.status()).toBe(403);
    expect((await again.json()).error).toMatch(/only engineer members can/);
    expect((await page.request.post(`/api/layouts/${other.id}/review`, { data: { action: "withdraw" } })).status()).toBe(200);
    // its sheet is only for review
    await page.goto(`/sites/${siteId}/layouts/${other.id}/sheet`);
    await expect(page.getByTestId("sheet-approval")).toHaveText("Not approved — for review only");
  });
});

test.describe(() => {
  test.use(signedInAs("engineer"));
  test("the engineer e-mails the sheet to the site's installer, and the mail sink received it with the PDF", async ({ page }) => {
    await page.goto(`/sites/${siteId}/layouts/${chosen.id}/sheet`);
    await expect(page.getByTestId("sheet-approval")).toContainText("Approved revision 1");
    await page.getByTestId("send-sheet").click();
    await expect(page.getByTestId("send-message")).toContainText(`Sent to Demo Installer <${demo.installer}>`, { timeout: 30_000 }); // a PDF of 41 loops is made first

    await page.goto(mailPage);
    const mail = page.locator("#messages > li").filter({ hasText: `to ${demo.installer}` }).filter({ hasText: "Terminal sheet:" }).first();
    await expect(mail).toContainText("revision 1");
    const attachment = mail.getByRole("link", { name: /^terminal-sheet-.*\.pdf$/ });
    await expect(attachment).toBeVisible();
    await expect(mail).toContainText("application/pdf");
    const res = await page.request.get(new URL((await attachment.getAttribute("href"))!, mailPage).href);
    expect(res.status()).toBe(200);
    expect(await pdfText(await res.body())).toContain("Terminal sheet");
  });
});

test.describe(() => {
  test.use(signedInAs("installer"));
  test("the installer opens the approved sheet, prints it, and downloads it as a PDF and the zone list as CSV", async ({ page }) => {
    const row0Label = (await sheetJson(page.request, chosen.id)).sheet.boards[0].rows.find((r) => !r.spare)!.detectors[0].label;
    await page.goto(`/sites/${siteId}/layouts/${chosen.id}/sheet`);
    await expect(page.getByTestId("sheet-approval")).toContainText("Approved revision 1");
    await expect(page.getByTestId("life-safety-caution")).toContainText("authority having jurisdiction");
    const first = page.getByTestId("sheet-board-panel").locator("section.sheet-input").first();
    await expect(first.getByTestId("sheet-resistor").first()).toContainText(/\d(\.\d+)? kΩ ±5 %/);
    await expect(first.getByTestId("colour-bands").first()).toBeVisible();
    await expect(first.getByTestId("expected-range").first()).toContainText(/Ω/);
    await expect(first.getByTestId("loop-schematic")).toBeVisible();
    await expect(page.getByTestId("send-sheet")).toBeDisabled(); // installers receive the sheet, they do not send it
    await page.screenshot({ path: `${shots}/sheet.png` });
    // printed: the paper the toggle says (CSS @page), no navigation or buttons, a new page for each board
    const boardCount = await page.locator("section.sheet-board").count();
    const boardNames = (await sheetJson(page.request, chosen.id)).sheet.boards.map((b) => b.name);
    expect(boardNames.length).toBe(boardCount);
    // ISO 216 A4 is 210 × 297 mm = 595.3 × 841.9 pt, US Letter 8.5 × 11 in = 612 × 792 pt (72 pt per inch); Chromium rounds its page box to device pixels, so within a point
    for (const [paper, w, h] of [["US Letter", 612, 792], ["A4", 595.3, 841.9]] as const) {
      await page.getByText(paper, { exact: false }).first().click();
      const pdf = await readPdf(await page.pdf({ preferCSSPageSize: true, printBackground: true }));
      const { width: pw, height: ph } = pdf.pages[0];
      expect(Math.abs(pw - w), `${paper} width ${pw} pt`).toBeLessThan(1);
      expect(Math.abs(ph - h), `${paper} height ${ph} pt`).toBeLessThan(1);
      expect(pdf.pageCount).toBeGreaterThanOrEqual(boardCount);
      const printed = pdf.text;
      // every board after the first starts a page
      const pageTexts = pdf.pages.map((p) => p.text.replace(/^page \d+ of \d+[^\n]*\n/, "").trim()); // the footer ("page N of M", the sheet) comes first in drawing order
      for (const name of boardNames.slice(1)) expect(pageTexts.some((t) => t.startsWith(`${name} — `)), `${paper}: a page starts with ${name}`).toBe(true);
      expect(printed).toContain(row0Label);
      expect(printed).not.toContain("E-mail to the site's installer");
      expect(printed).not.toContain("Sign out");
    }
    await first.screenshot({ path: `${shots}/sheet-input.png` });
    await page.emulateMedia({ media: "print" });
    await page.screenshot({ path: `${shots}/sheet-print.png` });
    await expect(page.getByTestId("sheet-toolbar")).toBeHidden();
    await page.emulateMedia({ media: "screen" });

    const s = await sheetJson(page.request, chosen.id);
    const row = s.sheet.boards[0].rows.find((r) => !r.spare)!;
    const [download] = await Promise.all([page.waitForEvent("download"), page.getByTestId("download-pdf").click()]);
    expect(download.suggestedFilename()).toMatch(/^terminal-sheet-.*-rev-1\.pdf$/);
    const text = await pdfText(readFileSync((await download.path())!));
    expect(text).toContain(row.detectors[0].label);
    expect(text).toContain(row.resistors[0].valueText);

    const csv = await page.request.get((await page.getByTestId("zones-csv").getAttribute("href"))!);
    expect(csv.headers()["content-type"]).toMatch(/^text\/csv/);
    const lines = (await csv.text()).split("\r\n"); // RFC 4180: CRLF between records
    expect(lines[0]).toBe("zone,label,area,room,device_type,board,input,report_types");
    expect(lines[1]).toContain(row.detectors[0].label);
    const bom = await page.request.get((await page.getByTestId("bom-csv").getAttribute("href"))!);
    expect(bom.headers()["content-type"]).toMatch(/^text\/csv/);
    expect(await bom.text()).toMatch(/^kind,catalog_id,description,quantity,unit_price,total,note,currency\r\n/);
  });
});

async function typeReading(page: Page, test: string, text: string) {
  const input = page.getByTestId(`reading-${test}`);
  await input.fill(text);
  return page.getByTestId(`verdict-${test}`);
}

test.describe(() => {
  test.use(signedInAs("installer"));
  test("the installer commissions the loops: a resistor at the panel end is diagnosed, a photo kept, then the record", async ({ page: first, context }) => {
    let page = first;
    test.setTimeout(300_000);
    await page.setViewportSize({ width: 390, height: 844 }); // a phone in the plant room
    const s = await sheetJson(page.request, chosen.id);
    const loops = s.sheet.boards.flatMap((b) => b.rows).filter((r) => !r.spare);
    const row = loops.find((r) => r.placement === "at-detector" && r.scheme !== "none" && r.expected.some((e) => e.test === "short") && r.expected.some((e) => e.test === "rest" && e.nominalOhms !== "Infinity"))!;
    const rest = row.expected.find((e) => e.test === "rest")!;

    await page.goto(`/sites/${siteId}/layouts/${chosen.id}/commissioning`);
    await expect(page.getByTestId("site-progress")).toHaveText(`0 of ${loops.length} loops passed`);
    await expect(page.getByTestId("life-safety-caution")).toBeVisible();
    await page.getByTestId(`board-${row.boardKey}`).click();
    await page.getByTestId(`loop-${row.boardKey}-${row.input}`).click();
    await expect(page.getByTestId("loop-panel")).toContainText(row.detectors[0].label);

    // rest, typed the way the meter's value is written on the resistor (RKM code, IEC 60062) when that is in range
    const rkm = `${Math.floor(num(rest.nominalOhms) / 1000)}k${Math.round((num(rest.nominalOhms) % 1000) / 100)}`;
    const rkmOhms = Number(rkm.replace("k", ".")) * 1000;
    const restText = rkmOhms >= num(rest.minOhms) && rkmOhms <= num(rest.maxOhms) ? rkm : meterText(num(rest.nominalOhms));
    await expect(await typeReading(page, "rest", restText)).toHaveAttribute("data-verdict", "pass");
    await page.getByTestId("save-rest").click();
    await expect(page.getByTestId("latest-rest")).toHaveAttribute("data-verdict", "pass");

    // the short at the far end reads about the resistor's value: it was fitted at the panel end
    const wrong = await typeReading(page, "short", meterText(num(rest.nominalOhms)));
    await expect(wrong).toHaveAttribute("data-verdict", "fail");
    await expect(wrong.locator('[data-code="resistor-not-at-end"]')).toContainText("the resistor is not at the end of the line");
    await page.screenshot({ path: `${shots}/commissioning-diagnosis.png`, fullPage: true });
    await page.getByTestId("save-short").click();
    await expect(page.getByTestId("latest-short")).toHaveAttribute("data-verdict", "fail");
    await expect(page.getByTestId(`queue`)).toHaveAttribute("data-count", "0");

    // moved to the detector: the short now reads the cable alone. Saved with no signal, it waits on the device,
    // and goes as soon as the browser is back online (its `online` event), without a reload.
    const short = row.expected.find((e) => e.test === "short")!;
    await context.setOffline(true);
    await expect(await typeReading(page, "short", meterText(num(short.nominalOhms)))).toHaveAttribute("data-verdict", "pass");
    await page.getByTestId("save-short").click();
    await expect(await typeReading(page, "rest", restText)).toHaveAttribute("data-verdict", "pass");
    await page.getByTestId("save-rest").click();
    await expect(page.getByTestId("queue")).toContainText("2 readings waiting to send");
    await expect(page.getByTestId("latest-short")).toHaveAttribute("data-verdict", "fail"); // not sent yet
    await context.setOffline(false);
    await expect(page.getByTestId("queue")).toHaveAttribute("data-count", "0", { timeout: 10_000 });
    await expect(page.getByTestId("latest-short")).toHaveAttribute("data-verdict", "pass");

    // a reading taken offline survives the tab being closed: the next visit sends it
    const cut = row.expected.find((e) => e.test === "cut")!;
    await context.setOffline(true);
    await expect(await typeReading(page, "cut", meterText(num(cut.nominalOhms)))).toHaveAttribute("data-verdict", "pass");
    await page.getByTestId("save-cut").click();
    await expect(page.getByTestId("queue")).toContainText("1 reading waiting to send");
    await page.close();
    await context.setOffline(false);
    page = await context.newPage();
    await page.setViewportSize({ width: 390, height: 844 });
    await page.goto(`/sites/${siteId}/layouts/${chosen.id}/commissioning`);
    // the kept reading reaches the server from this visit; the page then shows it (a reload gives the server's view)
    await expect
      .poll(
        async () => {
          const body = (await (await page.request.get(`/api/layouts/${chosen.id}/commissioning`)).json()) as { readings: { boardKey: string; input: number; test: string; verdict: string }[] };
          return body.readings.some((r) => r.boardKey === row.boardKey && r.input === row.input && r.test === "cut" && r.verdict === "pass");
        },
        { timeout: 15_000 },
      )
      .toBe(true);
    await page.reload();
    await expect(page.getByTestId("queue")).toHaveAttribute("data-count", "0");
    await page.getByTestId(`board-${row.boardKey}`).click();
    await page.getByTestId(`loop-${row.boardKey}-${row.input}`).click();
    await expect(page.getByTestId("latest-cut")).toHaveAttribute("data-verdict", "pass");
    await expect(page.getByTestId("latest-short")).toHaveAttribute("data-verdict", "pass");

    // the other tests of this loop
    for (const e of row.expected.filter((x) => !["rest", "short", "cut"].includes(x.test))) {
      await expect(await typeReading(page, e.test, meterText(num(e.nominalOhms)))).toHaveAttribute("data-verdict", "pass");
      await page.getByTestId(`save-${e.test}`).click();
      await expect(page.getByTestId(`latest-${e.test}`)).toHaveAttribute("data-verdict", "pass");
    }
    await expect(page.getByTestId(`loop-panel`)).toBeVisible();

    // a photo of the terminations
    await page.getByTestId("photo-input").setInputFiles(photo);
    await expect(page.getByTestId("photo-message")).toContainText("Photo kept: terminations.jpg");
    await expect(page.getByTestId("photos").locator("img")).toHaveCount(1);
    await page.screenshot({ path: `${shots}/commissioning-loop.png`, fullPage: true });

    // the report waits for every loop
    expect((await page.request.get(`/api/layouts/${chosen.id}/commissioning/report`)).status()).toBe(409);
    for (const l of loops) {
      if (l.boardKey === row.boardKey && l.input === row.input) continue;
      for (const e of l.expected) {
        const res = await page.request.post(`/api/layouts/${chosen.id}/commissioning/readings`, { data: { clientId: randomUUID(), boardKey: l.boardKey, input: l.input, test: e.test, reading: meterText(num(e.nominalOhms)) } });
        expect(res.status(), `${l.boardKey} ${l.input} ${e.test}: ${await res.text()}`).toBe(201);
        expect((await res.json()).verdict.verdict, `${l.boardKey} ${l.input} ${e.test}`).toBe("pass");
      }
    }
    await page.goto(`/sites/${siteId}/layouts/${chosen.id}/commissioning`);
    await expect(page.getByTestId("site-progress")).toHaveText(`${loops.length} of ${loops.length} loops passed`);
    await expect(page.getByTestId("completion")).toBeVisible();
    const [report] = await Promise.all([page.waitForEvent("download"), page.getByTestId("report-pdf").click()]);
    const text = await pdfText(readFileSync((await report.path())!));
    expect(text).toContain(row.detectors[0].label);
    expect(text).toContain("terminations.jpg");
    await page.getByTestId("mark-commissioned").click();
    await expect(page.getByTestId("commissioned")).toContainText("is commissioned");
    await page.reload();
    await expect(page.getByTestId("review-state")).toHaveAttribute("data-state", "commissioned");
    await page.screenshot({ path: `${shots}/commissioning-done.png`, fullPage: true });

    // the record is closed: no more readings on this revision
    const late = await page.request.post(`/api/layouts/${chosen.id}/commissioning/readings`, { data: { clientId: randomUUID(), boardKey: row.boardKey, input: row.input, test: "rest", reading: restText } });
    expect(late.status()).toBe(409);
  });
});
