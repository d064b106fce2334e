import { test, expect, type APIRequestContext } from "@playwright/test";
import { readFileSync } from "node:fs";
import { readCsv } from "@/lib/csv/csv";
import { readPdf, squash } from "../support/pdf-text";
import { signedInAs } from "./support";
import { demoSiteName } from "./support-api";

// The zone list for programming, as whoever keys the panel in reads it: reached from the terminal sheet and from the
// layout's tabs, every zone of the demo layouts with its keypad label (cut to the panel's zone label length, the cut
// shown), the wireless detectors on their receiver, and the same zones in the PDF and the CSV.

test.use(signedInAs("installer"));

interface Ids {
  siteId: number;
  layouts: { id: number; name: string }[];
  schedule: { id: string; label: string; catalogId: string }[];
}

async function demoIds(request: APIRequestContext): Promise<Ids> {
  const { sites } = (await (await request.get("/api/sites")).json()) as { sites: { id: number; name: string }[] };
  const site = sites.find((s) => s.name === demoSiteName)!;
  expect(site, "the demo site").toBeTruthy();
  const { layouts } = (await (await request.get(`/api/sites/${site.id}/layouts`)).json()) as Ids;
  const { detectors } = (await (await request.get(`/api/sites/${site.id}/schedule`)).json()) as { detectors: Ids["schedule"] };
  return { siteId: site.id, layouts, schedule: detectors };
}

/** Text with no white space: pdf.js gives a line break where a table cell wraps, even inside a word ("glass- break"). */
const tight = (s: string) => s.replace(/\s+/g, "");

/** The label as a keypad of `length` characters shows it, counted by code point. */
const shown = (label: string, length: number) => [...label].slice(0, length).join("");

test("the zone list shows every zone with its keypad label, in the page, the PDF and the CSV", async ({ page }) => {
  test.setTimeout(120_000);
  const { siteId, layouts, schedule } = await demoIds(page.request);
  const wirelessLabels = schedule.filter((d) => d.catalogId.startsWith("wireless-")).map((d) => d.label);
  expect(wirelessLabels, "the demo's two wireless detectors").toHaveLength(2);

  for (const name of ["One detector per input", "Large panel with shared inputs"]) {
    const layout = layouts.find((l) => l.name === name)!;
    expect(layout, name).toBeTruthy();
    await page.goto(`/sites/${siteId}/layouts/${layout.id}/sheet`);
    await page.getByTestId("zone-list-link").click();
    await expect(page).toHaveURL(new RegExp(`/layouts/${layout.id}/zones`));
    await expect(page.getByTestId("layout-tabs").getByRole("link", { name: "Zone list" })).toHaveAttribute("aria-current", "page");

    // the panel's zone label length, as the page states it
    const note = (await page.getByTestId("zone-label-note").textContent())!;
    const length = Number(/zone label length of (\d+) characters/.exec(note)?.[1]);
    expect(length, note).toBeGreaterThanOrEqual(4);

    // every detector of the schedule is a zone of these layouts (each places the whole schedule), wireless ones included
    const rows = page.getByTestId("zone-list-table").locator("tbody tr");
    await expect(rows).toHaveCount(schedule.length);
    const keypadLabels = await page.getByTestId("keypad-label").allTextContents();
    const cutOffs = await rows.evaluateAll((trs) => trs.map((tr) => tr.querySelector('[data-testid="label-cut-off"]')?.textContent?.replace(", cut off: ", "") ?? ""));
    for (const [i, keypad] of keypadLabels.entries()) {
      expect([...keypad].length, `zone ${i + 1}: ${keypad}`).toBeLessThanOrEqual(length);
      if (cutOffs[i]) expect([...keypad].length).toBe(length);
    }
    for (const label of wirelessLabels) {
      const row = rows.filter({ hasText: shown(label, length) });
      await expect(row).toHaveCount(1);
      await expect(row).toHaveAttribute("data-wireless", "");
      await expect(row).toContainText("Wireless receiver");
      await expect(row).toContainText("none (wireless)");
      if ([...label].length > length) await expect(row.getByTestId("label-cut-off")).toContainText([...label].slice(length).join(""));
    }

    // the PDF carries every zone's keypad label
    const [download] = await Promise.all([page.waitForEvent("download"), page.getByTestId("zone-list-pdf").click()]);
    expect(download.suggestedFilename()).toMatch(/^zone-list-.*\.pdf$/);
    const text = (await readPdf(readFileSync((await download.path())!))).text;
    expect(squash(text)).toContain("Zone list for programming");
    for (const [i, keypad] of keypadLabels.entries()) expect(tight(text), `zone ${i + 1}`).toContain(tight(cutOffs[i] ? `${keypad} [cut off: ${cutOffs[i]}]` : keypad));

    // the CSV has one record per zone, keypad label and cut-off part apart
    const csv = await page.request.get((await page.getByTestId("zone-list-csv").getAttribute("href"))!);
    expect(csv.status()).toBe(200);
    expect(csv.headers()["content-type"]).toMatch(/^text\/csv/);
    const { records, error } = readCsv(await csv.text());
    expect(error).toBeNull();
    expect(records[0].slice(0, 4)).toEqual(["zone", "keypad_label", "label_cut_off", "full_label"]);
    expect(records.slice(1).map((r) => [r[1], r[2]])).toEqual(keypadLabels.map((k, i) => [k, cutOffs[i]]));
    for (const r of records.slice(1)) expect(r[1] + r[2]).toBe(r[3]);
    expect(records.filter((r) => r[8] === "yes").map((r) => r[3]).sort()).toEqual([...wirelessLabels].sort());
  }
});

test("the terminal sheet PDF carries the zone list as a section", async ({ page }) => {
  test.setTimeout(120_000);
  const { layouts } = await demoIds(page.request);
  const layout = layouts.find((l) => l.name === "Large panel with shared inputs")!;
  const res = await page.request.get(`/api/layouts/${layout.id}/sheet/pdf?size=A4`);
  expect(res.status()).toBe(200);
  const text = (await readPdf(await res.body())).text;
  expect(squash(text)).toContain("Zone list for programming");
  const csv = readCsv(await (await page.request.get(`/api/layouts/${layout.id}/zones/csv`)).text());
  expect(csv.records.length).toBeGreaterThan(40);
  for (const r of csv.records.slice(1)) expect(tight(text)).toContain(tight(r[2] ? `${r[1]} [cut off: ${r[2]}]` : r[1]));
});
