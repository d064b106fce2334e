import { describe, expect, it } from "vitest";
import { shippedCatalog } from "@/lib/catalog/shipped";
import { readCsv } from "@/lib/csv/csv";
import { batterySize, billOfMaterials } from "@/lib/bom/bill-of-materials";
import { bomCsv, zoneListCsv } from "@/lib/bom/csv";
import { makeFormat } from "@/lib/format/format";
import { buildTerminalSheet } from "@/lib/sheet/build-sheet";
import { largeLayout, largeSchedule, midLayout, midSchedule } from "@/lib/sheet/testing/sample-layouts";

const { catalog } = shippedCatalog();

describe("bill of materials", () => {
  const bom = billOfMaterials(midLayout, midSchedule, catalog);
  const line = (key: string) => bom.lines.find((l) => l.key === key);

  it("lists the hardware and detectors at their catalog list prices, worked by hand", () => {
    // catalog/*.yaml list prices: panel 260 + fire board 120 + door contacts 9 and 7 + motion 24 + panic button 16 + smoke 36 = 472
    expect(bom.lines.filter((l) => l.unitPrice !== null).map((l) => [l.key, l.quantity, l.total])).toEqual([
      ["panel-mid-16", 1, 260],
      ["board-fire-4", 1, 120],
      ["contact-door-surface", 1, 9],
      ["motion-wall", 1, 24],
      ["panic-button-no", 1, 16],
      ["smoke-4wire-no", 1, 36],
      ["contact-door-recessed", 1, 7],
    ]);
    expect(bom.total).toBe(472);
  });

  it("counts end-of-line resistors by value", () => {
    // double end-of-line door: 4.7 k + 4.7 k; three single end-of-line loops: 4.7 k each; fire zone: 1 k + 4.7 k
    expect(line("resistor-4700-5")).toMatchObject({ description: "Resistor 4.7 kΩ ±5 %", quantity: 6, unitPrice: null });
    expect(line("resistor-1000-5")).toMatchObject({ quantity: 1 });
    expect(bom.lines.filter((l) => l.kind === "resistor").map((l) => l.key)).toEqual(["resistor-1000-5", "resistor-4700-5"]);
  });

  it("sizes the standby battery from the supply's load and rounds it up to a common size", () => {
    // Panel 90 mA + fire board 35 mA + motion 12 mA + smoke 0.1 mA at rest = 137.1 mA; alarm 160 + 90 + 15 + 30 = 295 mA.
    // 12 h standby, 15 min alarm, × 1.25: (137.1 × 12 + 295 × 15 / 60) / 1000 × 1.25 = 2.149 Ah → 7 Ah.
    const b = bom.lines.filter((l) => l.kind === "battery");
    expect(b).toHaveLength(1);
    expect(b[0]).toMatchObject({ key: "battery-12v-7", description: "12 V standby battery, 7 Ah", quantity: 1 });
    expect(b[0].note).toContain("needs 2.1 Ah");
    expect(b[0].note).toContain("common practice");
  });

  it("rounds batteries up to 7, 12, 17 or 18 Ah within the charger's limit (common practice)", () => {
    expect([5.2, 7, 7.01, 12.5, 17.5].map((a) => batterySize(a))).toEqual([7, 7, 12, 17, 18]);
    expect(batterySize(19)).toBeNull();
    expect(batterySize(9, 7)).toBeNull(); // the charger takes at most 7 Ah
  });

  it("carries the fire caution when the schedule has life-safety devices", () => {
    expect(bom.notes.join(" ")).toMatch(/local fire code and the authority having jurisdiction/);
    expect(billOfMaterials(largeLayout, largeSchedule, catalog).notes.join(" ")).not.toMatch(/fire code/);
  });
});

describe("CSV exports", () => {
  it("exports the zone list, read back by the CSV reader", () => {
    const schedule = midSchedule.map((d) => (d.id === "d-door" ? { ...d, label: 'Front door, "main"' } : d));
    const csv = zoneListCsv(buildTerminalSheet(midLayout, schedule, catalog));
    const { records, error } = readCsv(csv);
    expect(error).toBeNull();
    expect(records[0]).toEqual(["zone", "label", "area", "room", "device_type", "board", "input", "report_types"]);
    expect(records[1]).toEqual(["1", 'Front door, "main"', "Ground floor", "Lobby", "Surface door contact", "Control panel", "1", "normal; active (alarm); open / cut; short"]);
    expect(records.map((r) => r[0])).toEqual(["zone", "1", "2", "3", "4", "5"]);
  });
  it("exports the bill of materials with a total record", () => {
    const { records, error } = readCsv(bomCsv(billOfMaterials(midLayout, midSchedule, catalog)));
    expect(error).toBeNull();
    const panelName = catalog.panels.find((p) => p.id === "panel-mid-16")!.name;
    expect(records[1]).toEqual(["panel", "panel-mid-16", panelName, "1", "260.00", "260.00", "", "EUR"]);
    const total = records.at(-1)!;
    expect([total[0], total[5]]).toEqual(["total", "472.00"]);
  });
  it("writes amounts in the organisation's currency decimals and names the currency", () => {
    const yen = makeFormat({ locale: "en-GB", timeZone: "UTC", currency: "JPY", units: "metric" });
    const { records } = readCsv(bomCsv(billOfMaterials(midLayout, midSchedule, catalog), { currency: "JPY", plain: yen.moneyPlain }));
    // ISO 4217: the yen has no minor unit
    expect(records[1].slice(4, 6)).toEqual(["260", "260"]);
    expect(records[1][7]).toBe("JPY");
    expect(records.at(-1)![7]).toBe("JPY");
  });
});
