import { test, expect } from "@playwright/test";
import { readFileSync } from "node:fs";
import { signedInAs } from "./support";
import { demoSiteName } from "./support-api";

// The zone list CSV as the designer downloads it from the terminal sheet: a detector labelled like a spreadsheet
// formula comes out with a single quote in front, so a spreadsheet shows it as text and runs nothing
// (OWASP "CSV Injection"). The label is put back afterwards, so the demo data stays as the other specs expect.

type SheetJson = { sheet: { boards: { rows: { spare: boolean; detectors?: { id: string; zone: number; label: string }[] }[] }[] } };

test.use(signedInAs("designer"));

test("a detector labelled =1+1 comes out of the zone list CSV as text", async ({ page }) => {
  const sites = (await (await page.request.get("/api/sites")).json()) as { sites: { id: number; name: string }[] };
  const site = sites.sites.find((s) => s.name === demoSiteName);
  expect(site, "the demo site").toBeTruthy();
  const layouts = (await (await page.request.get(`/api/sites/${site!.id}/layouts`)).json()) as { layouts: { id: number }[] };
  expect(layouts.layouts.length).toBeGreaterThan(0);
  const layoutId = layouts.layouts[0].id;

  const sheetRes = await page.request.get(`/api/layouts/${layoutId}/sheet`);
  expect(sheetRes.status()).toBe(200);
  const sheet = ((await sheetRes.json()) as SheetJson).sheet;
  const detector = sheet.boards.flatMap((b) => b.rows.flatMap((r) => r.detectors ?? [])).at(-1);
  expect(detector, "a detector on an input of the layout").toBeTruthy();
  const { id, zone, label } = detector!;

  const rename = (to: string) => page.request.patch(`/api/sites/${site!.id}/schedule/${id}`, { data: { label: to } });
  expect((await rename("=1+1")).status()).toBe(200);
  try {
    await page.goto(`/sites/${site!.id}/layouts/${layoutId}/sheet`);
    const [download] = await Promise.all([page.waitForEvent("download"), page.getByTestId("zones-csv").click()]);
    expect(download.suggestedFilename()).toMatch(/^zones-.*\.csv$/);
    const records = readFileSync((await download.path())!, "utf8").split("\r\n"); // RFC 4180: CRLF between records
    expect(records[0]).toBe("zone,label,area,room,device_type,board,input,report_types");
    const record = records.find((r) => r.startsWith(`${zone},`));
    // the cell holds '=1+1, quoted as the quote-guarded cells are written
    expect(record).toMatch(new RegExp(`^${zone},"'=1\\+1",`));
    expect(records.some((r) => r.startsWith(`${zone},=1+1`))).toBe(false);
  } finally {
    expect((await rename(label)).status()).toBe(200);
  }
});
