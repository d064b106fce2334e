import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { layoutDocumentSchema, type LayoutDocument } from "@/lib/layout/schema";
import { addArea, addOutputDevice, outputOf, placeOutputDevice, removeArea, removeOutputDevice, setAreaKeypads, setGrade, setZoneProgram } from "@/lib/layout/zone-output-operations";
import { zonedCatalog } from "@/lib/solver/testing/fixture-catalog";
import { board, det, emptyLayout } from "@/lib/solver/testing/fixture-schedule";

const ctx = { schedule: [det("d1", "fx-door", { label: "Front door" })], catalog: zonedCatalog };
const cable = { cableM: 10, gauge: { awg: 22 as const } };

function withDevices(n: number): LayoutDocument {
  let doc = emptyLayout("fx-panel-small", { boards: [board("m1", "outputs", "fx-relays-4", 1)] });
  for (let i = 0; i < n; i++) doc = addOutputDevice(doc, ctx, { kind: "sounder", catalogId: "fx-sounder-out", label: `Sounder ${i + 1}`, ...cable }).layout;
  return doc;
}

// Outputs of the zoned fixture: the panel has 3 (siren, two programmable), the relay module 4.
const refs = [...[1, 2, 3].map((output) => ({ boardKey: "panel", output })), ...[1, 2, 3, 4].map((output) => ({ boardKey: "m1", output }))];

describe("sounders and strobes onto outputs", () => {
  it("after any sequence of moves every device is on at most one output, the document stays valid, and none is lost", () => {
    fc.assert(
      fc.property(fc.array(fc.tuple(fc.integer({ min: 0, max: 3 }), fc.option(fc.constantFrom(...refs), { nil: null })), { maxLength: 25 }), (moves) => {
        let doc = withDevices(4);
        for (const [i, to] of moves) {
          const id = doc.outputDevices![i].id;
          const e = placeOutputDevice(doc, ctx, id, to);
          expect(e.ok).toBe(true);
          doc = e.layout;
          expect(outputOf(doc, id)).toEqual(to);
        }
        expect(layoutDocumentSchema.safeParse(doc).success).toBe(true);
        const placed = (doc.outputs ?? []).flatMap((o) => o.deviceIds);
        expect(new Set(placed).size).toBe(placed.length);
        expect(doc.outputDevices).toHaveLength(4);
        expect((doc.outputs ?? []).every((o) => o.deviceIds.length > 0)).toBe(true);
      }),
      { numRuns: 100 },
    );
  });

  it("refuses an output the board does not have, and says where a device went", () => {
    const doc = withDevices(1);
    const id = doc.outputDevices![0].id;
    expect(placeOutputDevice(doc, ctx, id, { boardKey: "panel", output: 4 })).toMatchObject({ ok: false, message: "Control panel has outputs 1 to 3" });
    expect(placeOutputDevice(doc, ctx, id, { boardKey: "panel", output: 2 }).message).toBe("Sounder 1 on Control panel, programmable output 1");
    const removed = removeOutputDevice(placeOutputDevice(doc, ctx, id, { boardKey: "m1", output: 1 }).layout, ctx, id).layout;
    expect([removed.outputDevices, removed.outputs]).toEqual([[], []]);
  });
});

describe("zone programming, areas and the grade", () => {
  it("drops options the new type does not allow", () => {
    let doc = setZoneProgram(emptyLayout("fx-panel-small"), ctx, "d1", { type: "entry-exit", entryS: 30, exitS: 40 }).layout;
    expect(doc.zones).toEqual([{ detectorId: "d1", type: "entry-exit", entryS: 30, exitS: 40 }]);
    doc = setZoneProgram(doc, ctx, "d1", { type: "hold-up", partSet: true }).layout;
    expect(doc.zones).toEqual([{ detectorId: "d1", type: "hold-up" }]);
  });
  it("areas are added with unique names, and a removed area's zones go back to the first", () => {
    let doc = addArea(emptyLayout("fx-panel-small"), ctx, "Offices").layout;
    expect(addArea(doc, ctx, " offices ").ok).toBe(false);
    doc = addArea(doc, ctx, "Warehouse").layout;
    doc = setZoneProgram(doc, ctx, "d1", { type: "instant", areaKey: "area-2" }).layout;
    doc = removeArea(doc, ctx, "area-2").layout;
    expect(doc.areas).toEqual([{ key: "area-1", name: "Offices" }]);
    expect(doc.zones).toEqual([{ detectorId: "d1", type: "instant" }]);
    expect(setZoneProgram(doc, ctx, "d1", { areaKey: "area-9" }).ok).toBe(false);
  });
  it("choosing a grade sizes an intruder battery for it and leaves a fire profile alone", () => {
    const intruder = setGrade(emptyLayout("fx-panel-small"), ctx, 3).layout;
    expect([intruder.grade, intruder.power.standbyProfileId]).toEqual([3, "intruder-grade-3-60h"]);
    const fire = setGrade(emptyLayout("fx-panel-small", { power: { standbyProfileId: "nfpa72-fire", safetyFactor: 1.25 } }), ctx, 3).layout;
    expect(fire.power.standbyProfileId).toBe("nfpa72-fire");
  });
});

describe("keypads of an area", () => {
  const withKeypads = () => {
    const doc = emptyLayout("fx-panel-small", { boards: [board("k1", "keypad", "fx-keypad", 1), board("k2", "keypad", "fx-keypad", 2), board("m1", "outputs", "fx-relays-4", 3)] });
    return addArea(doc, ctx, "Offices").layout;
  };

  it("sets an area from keypads of the layout, in board order, and refuses anything else", () => {
    const doc = withKeypads();
    const e = setAreaKeypads(doc, ctx, "area-1", ["k2", "k1"]);
    expect(e).toMatchObject({ ok: true, message: "Area Offices set from Keypad 1 and Keypad 2" });
    expect(e.layout.areas![0].keypadKeys).toEqual(["k1", "k2"]);
    expect(setAreaKeypads(e.layout, ctx, "area-1", [])).toMatchObject({ ok: true, message: "Area Offices set from no keypad" });
    // an output module is not a keypad, and an area must exist
    expect(setAreaKeypads(doc, ctx, "area-1", ["m1"])).toMatchObject({ ok: false, layout: doc });
    expect(setAreaKeypads(doc, ctx, "area-9", ["k1"])).toMatchObject({ ok: false, layout: doc });
    expect(layoutDocumentSchema.safeParse(e.layout).success).toBe(true);
  });
});
