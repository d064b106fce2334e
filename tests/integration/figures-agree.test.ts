import { describe, expect, it } from "vitest";
import { readPdf } from "../support/pdf-text";
import { makeOrganisation, testDb } from "./support";
import { createSite } from "@/lib/server/sites";
import { listLayouts, loadLayoutForEditor } from "@/lib/server/layouts";
import { terminalSheetPdfFor } from "@/lib/server/sheets";
import { createSolver } from "@/lib/solver";
import { fmt } from "@/lib/solver/format";
import { mA, SUPPLY_LABELS, supplyLines } from "@/lib/solver/supply-lines";
import { seedDemoDesign } from "@/scripts/demo/seed-demo-design";
import { shippedCatalog } from "@/lib/catalog/shipped";

// The figures panel, the battery note and the terminal sheet PDF show one current per supply: all three come from
// one solve of the demo layouts, and each label carries one number wherever it appears.

// lib/server/env.ts asks for these at the first database call
process.env.NEXTAUTH_URL ??= "http://localhost:3000";
process.env.NEXTAUTH_SECRET ??= "integration-test-secret-of-at-least-32-chars";

// Text extraction by pdf.js, an independent reader of the PDF (not the library that wrote it).
async function pdfText(buf: Buffer): Promise<string> {
  return (await readPdf(buf)).text.replace(/\s+/g, " ");
}

describe("figures agree across the editor, the battery note and the PDF", { timeout: 180_000 }, () => {
  it("shows the same current for each supply in every demo layout", async () => {
    const { org, actors } = await makeOrganisation("Figures agree");
    const site = await createSite(actors.designer, { name: "Demo library", address: "", description: "", areas: [] });
    await testDb().transaction((transaction) => seedDemoDesign(transaction, { organisationId: org.id, siteId: site.id, userId: actors.designer.userId }, shippedCatalog().catalog));
    const layouts = await listLayouts(actors.designer, site.id);
    expect(layouts.map((l) => l.name).sort()).toEqual(["Large panel with shared inputs", "One detector per input"]);
    for (const meta of layouts) {
      // the editor solves what it loads, in the browser, with the incremental solver
      const data = await loadLayoutForEditor(actors.designer, meta.id);
      const result = createSolver(data.schedule, data.catalog).solve(data.document);
      const { pdf } = await terminalSheetPdfFor(actors.designer, meta.id);
      const text = await pdfText(pdf);
      expect(result.supplies.length).toBeGreaterThan(0);
      for (const s of result.supplies) {
        const lines = Object.fromEntries(supplyLines(s).map((l) => [l.key, l]));
        // the battery note works from the battery load, the same figure as the panel's "Battery load at rest"
        const note = result.findings.find((f) => (f.code === "battery-needed" || f.code === "battery-too-large") && f.target.kind === "supply" && f.target.supplyKey === s.supplyKey);
        expect(note, s.name).toBeDefined();
        expect(note!.message).toContain(`${fmt(s.batteryRestMa)} mA battery load at rest`);
        expect(note!.message).toContain(`${fmt(s.batteryAlarmMa)} mA battery load in alarm`);
        expect(lines.batteryRest.value).toBe(mA(s.batteryRestMa));
        // every line of the figures panel, label and number, is printed as such in the PDF
        for (const l of Object.values(lines)) expect(text).toContain(`${l.label}: ${l.value}`);
        // the breakdown adds up to the battery load
        expect(s.breakdown.reduce((a, l) => a + l.restMa, 0)).toBeCloseTo(s.batteryRestMa, 6);
        expect(s.breakdown.reduce((a, l) => a + l.alarmMa, 0)).toBeCloseTo(s.batteryAlarmMa, 6);
        // and the PDF lists the panel's own draw line by line
        expect(text).toContain(s.breakdown[0].name);
      }
      // each label is printed once per supply, so none carries a second number
      for (const label of Object.values(SUPPLY_LABELS)) expect(text.split(`${label}: `).length - 1).toBe(result.supplies.length);
    }
  });
});
