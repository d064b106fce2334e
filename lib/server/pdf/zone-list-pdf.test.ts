import { beforeAll, describe, expect, it } from "vitest";
import { shippedCatalog } from "@/lib/catalog/shipped";
import { buildTerminalSheet } from "@/lib/sheet/build-sheet";
import { midLayout, midSchedule } from "@/lib/sheet/testing/sample-layouts";
import { terminalSheetPdf } from "@/lib/server/pdf/terminal-sheet-pdf";
import { zoneListPdf } from "@/lib/server/pdf/zone-list-pdf";
import { keypadLabelCell } from "@/lib/sheet/zone-list-words";
import { readPdf, squash } from "@/tests/support/pdf-text";

// Read back by pdf.js (tests/support/pdf-text.ts), an independent reader of the PDF.
const { catalog } = shippedCatalog();
const meta = { siteName: "Test depot", layoutName: "Option A", revision: 3, generatedAt: "2026-12-01" };
const schedule = [...midSchedule, { id: "w1", label: "Upstairs landing wireless motion", catalogId: "wireless-motion", area: "First floor", room: "Landing", cableM: 0, gauge: { awg: 22 as const }, supervision: "double-eol" as const }];
const layout = { ...midLayout, boards: [...midLayout.boards, { key: "rx", kind: "receiver" as const, catalogId: "receiver-32", busAddress: 2 }], wireless: [{ boardKey: "rx", detectorIds: ["w1"] }] };

describe("the zone list on paper", { timeout: 60_000 }, () => {
  const sheet = buildTerminalSheet(layout, schedule, catalog);
  let own: string;
  let inSheet: string;
  beforeAll(async () => {
    own = squash((await readPdf(await zoneListPdf(sheet.zoneList, { ...meta, panelName: sheet.panel?.name ?? null, caution: sheet.caution }))).text);
    inSheet = squash((await readPdf(await terminalSheetPdf(sheet, meta))).text);
  }, 60_000);

  it("prints every zone with its keypad label and the part cut off, in its own PDF and in the terminal sheet's", () => {
    expect(sheet.zoneList.rows).toHaveLength(schedule.length);
    for (const text of [own, inSheet]) {
      expect(text).toContain("Zone list for programming");
      expect(text).toContain("zone label length of 16 characters"); // catalog/family-mid.yaml zoneLabelLength
      for (const r of sheet.zoneList.rows) expect(text).toContain(squash(keypadLabelCell(r)));
    }
    expect(own).toContain("Zone list — Test depot — Option A, revision 3");
    expect(own).toContain("Upstairs landing [cut off: wireless motion]");
    expect(own).toContain("(wireless)");
    // not approved: marked so on every page, like the terminal sheet
    expect(own).toContain("NOT APPROVED");
    // the mid sample has a smoke detector: the life-safety caution is printed
    expect(own).toContain(sheet.caution!.slice(0, 40));
  });
});
