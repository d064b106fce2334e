import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { shippedCatalog } from "@/lib/catalog/shipped";
import type { LayoutDocument } from "@/lib/layout/schema";
import type { Schedule } from "@/lib/schedule/schema";
import { buildTerminalSheet } from "@/lib/sheet/build-sheet";
import type { SheetInput } from "@/lib/sheet/sheet-types";
import { midLayout, midSchedule } from "@/lib/sheet/testing/sample-layouts";
import { buildZoneList, zoneOptionsText } from "@/lib/sheet/zone-list";
import type { ZoneFigures } from "@/lib/solver/types";

const { catalog } = shippedCatalog();

// The mid sample with zone programming, two areas and two wireless detectors on a receiver.
const schedule: Schedule = [
  ...midSchedule,
  { id: "w-hall", label: "Upstairs hall wireless motion", catalogId: "wireless-motion", area: "First floor", room: "Hall", cableM: 0, gauge: { awg: 22 }, supervision: "double-eol" },
  { id: "w-shed", label: "Shed door", catalogId: "wireless-door", area: "Garden", room: "Shed", cableM: 0, gauge: { awg: 22 }, supervision: "double-eol" },
];
const layout: LayoutDocument = {
  ...midLayout,
  boards: [...midLayout.boards, { key: "rx", kind: "receiver", catalogId: "receiver-32", busAddress: 2, label: "Receiver by the stairs" }],
  areas: [
    { key: "shop", name: "Shop" },
    { key: "back", name: "Back rooms" },
  ],
  zones: [
    { detectorId: "d-door", type: "entry-exit", areaKey: "shop", entryS: 30, exitS: 45, keypadLabel: "Front door" },
    { detectorId: "d-pir", type: "instant", areaKey: "shop", entryRoute: true, chime: true },
    { detectorId: "d-panic", type: "hold-up", areaKey: "shop" },
    { detectorId: "d-smoke", type: "fire", areaKey: "back" },
    { detectorId: "d-back", type: "instant", areaKey: "back", partSet: true },
    { detectorId: "w-shed", type: "instant", areaKey: "back", partSet: true },
  ],
  wireless: [{ boardKey: "rx", detectorIds: ["w-hall", "w-shed"] }],
};

describe("the zone list", () => {
  const sheet = buildTerminalSheet(layout, schedule, catalog);
  const list = sheet.zoneList;

  it("lists every zone, wired then wireless, numbered as the terminal sheet numbers them", () => {
    expect(list.rows.map((r) => r.detectorId)).toEqual(["d-door", "d-pir", "d-panic", "d-back", "d-smoke", "w-hall", "w-shed"]);
    expect(list.rows.map((r) => r.number)).toEqual([1, 2, 3, 4, 5, 6, 7]);
    const sheetZone = new Map(sheet.boards.flatMap((b) => b.rows.filter((r): r is SheetInput => !r.spare).flatMap((r) => r.detectors.map((d) => [d.id, d.zone] as const))));
    for (const r of list.rows.filter((x) => !x.wireless)) expect(r.number).toBe(sheetZone.get(r.detectorId));
  });

  it("cuts the keypad label to the panel's zone label length and shows what is cut off", () => {
    expect(list.zoneLabelLength).toBe(16); // catalog/family-mid.yaml zoneLabelLength
    const hall = list.rows.find((r) => r.detectorId === "w-hall")!;
    expect(hall).toMatchObject({ label: "Upstairs hall wireless motion", keypadLabel: "Upstairs hall wi", cutOff: "reless motion" });
    expect(hall.keypadLabel + hall.cutOff).toBe(hall.label);
    const door = list.rows.find((r) => r.detectorId === "d-door")!;
    expect(door).toMatchObject({ label: "Front door", keypadLabel: "Front door", cutOff: "" });
    expect(list.cutLabels).toBe(list.rows.filter((r) => [...r.label].length > 16).length);
    expect(list.cutLabels).toBeGreaterThan(0);
  });

  it("gives type, area, part-set and the options each type allows", () => {
    const by = (id: string) => list.rows.find((r) => r.detectorId === id)!;
    expect(by("d-door")).toMatchObject({ typeText: "entry/exit", area: "Shop", partSet: false, options: "entry 30 s, exit 45 s" });
    expect(by("d-pir")).toMatchObject({ typeText: "instant", options: "entry route; chime" });
    expect(by("d-panic")).toMatchObject({ typeText: "hold-up", options: "" });
    expect(by("d-back")).toMatchObject({ area: "Back rooms", partSet: true });
    // a detector without programming: instant in the first area (the layout document's default)
    expect(by("w-hall")).toMatchObject({ typeText: "instant", area: "Shop", partSet: false });
  });

  it("gives the input and its resistors for a wired zone, the receiver for a wireless one", () => {
    const door = list.rows.find((r) => r.detectorId === "d-door")!;
    const doorInput = sheet.boards[0].rows.find((r): r is SheetInput => !r.spare && r.input === 1)!;
    expect(door.input).toBe(`${sheet.boards[0].name}, input 1 (1+ / 1−)`);
    expect(door.resistors).toBe(doorInput.resistors.map((x) => `${x.name} ${x.valueText}`).join("; "));
    expect(door.resistors).toContain("end-of-line resistor");
    const shed = list.rows.find((r) => r.detectorId === "w-shed")!;
    expect(shed).toMatchObject({ wireless: true, input: "Receiver by the stairs (wireless)", resistors: "none (wireless)" });
  });

  it("keeps labels whole when the catalog gives no label length", () => {
    const zone: ZoneFigures = { number: 1, detectorId: "x", label: "A very long label indeed", keypadLabel: "A very long label indeed", labelCut: false, type: "instant", areaKey: null, areaName: null, partSet: false, entryS: null, exitS: null, entryRoute: false, chime: false, where: "Control panel, input 1", boardKey: "panel", input: 1, wireless: false };
    const l = buildZoneList([zone], [], undefined);
    expect(l).toMatchObject({ zoneLabelLength: null, cutLabels: 0 });
    expect(l.rows[0]).toMatchObject({ cutOff: "", area: null, resistors: "not on the terminal sheet", input: "Control panel, input 1" });
  });

  it("the keypad label and the part cut off always make up the label (property)", () => {
    fc.assert(
      fc.property(fc.string({ unit: "grapheme", minLength: 1, maxLength: 40 }), fc.integer({ min: 4, max: 32 }), (label, length) => {
        const chars = [...label];
        const shown = chars.slice(0, length).join("");
        const zone: ZoneFigures = { number: 1, detectorId: "x", label, keypadLabel: shown, labelCut: chars.length > length, type: "instant", areaKey: null, areaName: null, partSet: false, entryS: null, exitS: null, entryRoute: false, chime: false, where: "here", boardKey: "panel", input: 1, wireless: false };
        const row = buildZoneList([zone], [], length).rows[0];
        expect(row.keypadLabel + row.cutOff).toBe(label);
        expect(row.cutOff === "").toBe(chars.length <= length);
      }),
    );
  });

  it("writes options only for what is set", () => {
    expect(zoneOptionsText({ entryS: null, exitS: null, entryRoute: false, chime: false })).toBe("");
    expect(zoneOptionsText({ entryS: 20, exitS: null, entryRoute: false, chime: true })).toBe("entry 20 s; chime");
  });
});
