import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { dropEdit, overSentence, parseDragId, parseDropId } from "@/components/editor/editor-model";
import { dragOriginId, dragPlace } from "@/components/editor/drag-model";
import { DropTargetOrder } from "@/components/editor/dnd-helpers";
import {
  allOutputs,
  OUTPUT_POOL_DROP_ID,
  outputDeviceDragId,
  outputDropEdit,
  outputDropId,
  outputDropTargetIds,
  outputName,
  outputOverSentence,
  parseOutputDropId,
} from "@/components/editor/output-drag-model";
import { indexCatalog } from "@/lib/layout/catalog-index";
import { layoutDocumentSchema, type LayoutDocument } from "@/lib/layout/schema";
import { addOutputDevice, outputOf } from "@/lib/layout/zone-output-operations";
import { createSolver } from "@/lib/solver";
import { zonedCatalog } from "@/lib/solver/testing/fixture-catalog";
import { board, det, emptyLayout } from "@/lib/solver/testing/fixture-schedule";

// Dragging sounders and strobes onto outputs, on the zoned fixture: the small panel has a 1000 mA relay siren
// output and two 100 mA transistor programmable outputs, the relay module m1 four 1000 mA relay outputs.

const ctx = { schedule: [det("d1", "fx-door", { label: "Front door" })], catalog: zonedCatalog };
const ix = indexCatalog(zonedCatalog);
const cable = { cableM: 10, gauge: { awg: 22 as const } };
const item = (deviceId: string) => ({ type: "output-device" as const, deviceId });
const output = (boardKey: string, n: number) => ({ type: "output" as const, boardKey, output: n });

function layout(): LayoutDocument {
  let doc = emptyLayout("fx-panel-small", { boards: [board("m1", "outputs", "fx-relays-4", 1)] });
  doc = addOutputDevice(doc, ctx, { kind: "sounder", catalogId: "fx-sounder-out", label: "Rear sounder", ...cable }).layout;
  doc = addOutputDevice(doc, ctx, { kind: "sounder", catalogId: "fx-sounder-in", label: "Hall sounder", ...cable }).layout;
  return addOutputDevice(doc, ctx, { kind: "strobe", catalogId: "fx-strobe", label: "Porch strobe", ...cable }).layout;
}

describe("output drag ids", () => {
  it("round-trip through the strings dnd-kit carries, and are not taken for detectors or inputs", () => {
    expect(parseDragId(outputDeviceDragId("sounder-1"))).toEqual(item("sounder-1"));
    expect(parseDropId(outputDropId("m1", 3))).toEqual(output("m1", 3));
    expect(parseDropId(OUTPUT_POOL_DROP_ID)).toEqual({ type: "output-pool" });
    expect(parseOutputDropId("out:panel:x")).toBeNull();
    expect(parseDragId("odev:")).toBeNull();
    expect(parseDropId("in:panel:2")).toEqual({ type: "input", boardKey: "panel", input: 2 });
  });
});

describe("outputs in reading order", () => {
  it("lists the panel's outputs, siren first, then each board's, named as the terminals are marked", () => {
    const doc = layout();
    expect(allOutputs(doc, ix).map((s) => outputName(doc, ix, s))).toEqual([
      "Control panel, siren output 1",
      "Control panel, programmable output 1",
      "Control panel, programmable output 2",
      ...[1, 2, 3, 4].map((n) => `Output module 1, programmable output ${n}`),
    ]);
    expect(outputDropTargetIds(doc, ix)).toEqual([OUTPUT_POOL_DROP_ID, "out:panel:1", "out:panel:2", "out:panel:3", "out:m1:1", "out:m1:2", "out:m1:3", "out:m1:4"]);
  });

  it("keeps detectors and sounders apart in the keyboard order", () => {
    const order = new DropTargetOrder();
    order.set(["unplaced", "in:panel:1"], ["output-pool", "out:panel:1"]);
    expect(order.get("detector")).toEqual(["unplaced", "in:panel:1"]);
    expect(order.get("output-device")).toEqual(["output-pool", "out:panel:1"]);
  });
});

describe("dropping a sounder or strobe", () => {
  it("puts it on an output, moves it, takes it back to the list, and does nothing where it already is", () => {
    const doc = layout();
    const on = dropEdit(doc, ctx, item("sounder-1"), output("panel", 1))!;
    expect(on).toMatchObject({ ok: true, message: "Rear sounder on Control panel, siren output 1" });
    expect(outputOf(on.layout, "sounder-1")).toEqual({ boardKey: "panel", output: 1 });
    expect(dragOriginId(on.layout, item("sounder-1"))).toBe("out:panel:1");
    expect(dragPlace(on.layout, ix, item("sounder-1"), () => "")).toBe("Rear sounder, on Control panel, siren output 1");
    expect(dropEdit(on.layout, ctx, item("sounder-1"), output("panel", 1))).toBeNull();
    const moved = dropEdit(on.layout, ctx, item("sounder-1"), output("panel", 3))!;
    expect(outputOf(moved.layout, "sounder-1")).toEqual({ boardKey: "panel", output: 3 });
    const back = dropEdit(moved.layout, ctx, item("sounder-1"), { type: "output-pool" })!;
    expect(back).toMatchObject({ ok: true, message: "Rear sounder taken off its output" });
    expect(dragOriginId(back.layout, item("sounder-1"))).toBe(OUTPUT_POOL_DROP_ID);
    expect(dropEdit(doc, ctx, item("sounder-1"), { type: "output-pool" })).toBeNull();
  });

  it("refuses an output the board does not have, and ignores inputs and the unplaced list", () => {
    const doc = layout();
    expect(outputDropEdit(doc, ctx, item("sounder-1"), output("panel", 9))).toMatchObject({ ok: false, message: "Control panel has outputs 1 to 3" });
    expect(dropEdit(doc, ctx, item("sounder-1"), { type: "input", boardKey: "panel", input: 1 })).toBeNull();
    expect(dropEdit(doc, ctx, item("sounder-1"), { type: "unplaced" })).toBeNull();
    // a detector is never dropped on an output
    expect(dropEdit(doc, ctx, { type: "detector", detectorId: "d1" }, output("panel", 1))).toBeNull();
  });

  it("says where it is over, and who shares the output", () => {
    const doc = dropEdit(layout(), ctx, item("sounder-2"), output("panel", 2))!.layout;
    expect(outputOverSentence(doc, ix, item("sounder-1"), output("panel", 1))).toBe("Rear sounder is over Control panel, siren output 1, free");
    expect(overSentence(doc, ctx, item("sounder-1"), output("panel", 2))).toBe("Rear sounder is over Control panel, programmable output 1, with Hall sounder");
    expect(overSentence(doc, ctx, item("sounder-2"), output("panel", 2))).toBe("Hall sounder is over its own output, Control panel, programmable output 1");
    expect(overSentence(doc, ctx, item("sounder-1"), { type: "output-pool" })).toBe("Rear sounder is over the list of sounders and strobes");
    expect(overSentence(doc, ctx, item("sounder-1"), null)).toBe("Rear sounder is not over an output");
  });

  it("two sounders on a 100 mA transistor output overload it; the solver says so and the output's figure shows it", () => {
    // fx-sounder-out draws 300 mA and fx-sounder-in 150 mA in alarm (fixture values): 450 mA > 100 mA
    let doc = dropEdit(layout(), ctx, item("sounder-1"), output("panel", 2))!.layout;
    doc = dropEdit(doc, ctx, item("sounder-2"), output("panel", 2))!.layout;
    const result = createSolver(ctx.schedule, zonedCatalog).solve(doc);
    expect(result.outputs.find((o) => o.boardKey === "panel" && o.output === 2)).toMatchObject({ alarmMa: 450, ratingMa: 100, ok: false });
    expect(result.findings.some((f) => f.code === "output-overloaded")).toBe(true);
  });

  it("after any sequence of drops every sounder and strobe is on at most one output and the document stays valid", () => {
    const targets = [{ type: "output-pool" as const }, ...allOutputs(layout(), ix).map((s) => output(s.boardKey, s.output))];
    fc.assert(
      fc.property(fc.array(fc.tuple(fc.constantFrom("sounder-1", "sounder-2", "strobe-1"), fc.constantFrom(...targets)), { maxLength: 20 }), (drops) => {
        let doc = layout();
        for (const [id, t] of drops) {
          const e = dropEdit(doc, ctx, item(id), t);
          if (e) {
            expect(e.ok).toBe(true);
            doc = e.layout;
          }
          expect(outputOf(doc, id)).toEqual(t.type === "output" ? { boardKey: t.boardKey, output: t.output } : null);
        }
        const placed = (doc.outputs ?? []).flatMap((o) => o.deviceIds);
        expect(new Set(placed).size).toBe(placed.length);
        expect(layoutDocumentSchema.safeParse(doc).success).toBe(true);
      }),
      { numRuns: 100 },
    );
  });
});
