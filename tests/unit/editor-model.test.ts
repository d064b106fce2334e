import { describe, expect, it } from "vitest";
import { changePanel, dropEdit, overSentence, parseDragId, parseDropId, resistorLines, resistorText, withoutMissingDetectors, zoneNumbers, detectorDragId, inputDropId, boardSortId, UNPLACED_DROP_ID } from "@/components/editor/editor-model";
import { copyName, dragOriginId, dragPlace, dropTargetIds, removedNotice } from "@/components/editor/drag-model";
import { indexCatalog } from "@/lib/layout/catalog-index";
import { createSolver } from "@/lib/solver";
import { fixtureCatalog } from "@/lib/solver/testing/fixture-catalog";
import { board, det, emptyLayout, inp } from "@/lib/solver/testing/fixture-schedule";

// The editor's pure drag-and-drop and display helpers, on the solver's fixture catalog:
// fx-panel-small has 8 fx-dual inputs (no sharing), fx-panel-large 16 fx-shared inputs.

const schedule = [det("a", "fx-door", { label: "Front door", supervision: "shared-ok" }), det("b", "fx-pir", { label: "Hall motion", supervision: "shared-ok" }), det("c", "fx-smoke", { label: "Hall smoke" }), det("d", "fx-door", { label: "Back door" })];
const ctx = { schedule, catalog: fixtureCatalog };
const detector = (id: string) => ({ type: "detector" as const, detectorId: id });
const input = (boardKey: string, n: number) => ({ type: "input" as const, boardKey, input: n });

describe("drag ids", () => {
  it("round-trip through the strings dnd-kit carries", () => {
    expect(parseDragId(detectorDragId("12"))).toEqual(detector("12"));
    expect(parseDropId(inputDropId("b1", 7))).toEqual(input("b1", 7));
    expect(parseDropId("unplaced")).toEqual({ type: "unplaced" });
    expect(parseDropId("in:panel:x")).toBeNull();
    expect(parseDropId(null)).toBeNull();
  });
});

describe("dropEdit", () => {
  const small = emptyLayout("fx-panel-small");
  const large = emptyLayout("fx-panel-large");

  it("places an unplaced detector on a free input, and moves a placed one", () => {
    const e = dropEdit(small, ctx, detector("a"), input("panel", 3))!;
    expect(e).toMatchObject({ ok: true, message: "Front door placed on Control panel, input 3" });
    expect(e.layout.inputs).toEqual([expect.objectContaining({ boardKey: "panel", input: 3, detectorIds: ["a"] })]);
    const moved = dropEdit(e.layout, ctx, detector("a"), input("panel", 5))!;
    expect(moved.message).toBe("Front door moved from Control panel, input 3 to Control panel, input 5");
    expect(moved.layout.inputs.map((i) => i.input)).toEqual([5]);
  });

  it("makes a shared input where the input type takes two, and refuses with the reason where it does not", () => {
    const onLarge = dropEdit(large, ctx, detector("a"), input("panel", 1))!.layout;
    const shared = dropEdit(onLarge, ctx, detector("b"), input("panel", 1))!;
    expect(shared).toMatchObject({ ok: true, message: "Hall motion shares Control panel, input 1 with Front door" });
    expect(shared.layout.inputs[0]).toMatchObject({ scheme: "shared", detectorIds: ["a", "b"] });

    const onSmall = dropEdit(small, ctx, detector("a"), input("panel", 1))!.layout;
    const refused = dropEdit(onSmall, ctx, detector("b"), input("panel", 1))!;
    expect(refused).toMatchObject({ ok: false, message: "Control panel, input 1 cannot be shared: its input type does not take two detectors" });
    expect(refused.layout).toBe(onSmall);

    const fire = dropEdit(onLarge, ctx, detector("c"), input("panel", 1))!;
    expect(fire).toMatchObject({ ok: false, message: "Hall smoke is a life-safety device and must have an input of its own" });
  });

  it("takes a detector back to the unplaced, and does nothing for a drop where it already is or on nothing", () => {
    const placed = dropEdit(small, ctx, detector("d"), input("panel", 2))!.layout;
    expect(dropEdit(placed, ctx, detector("d"), { type: "unplaced" })).toMatchObject({ ok: true, message: "Back door back to unplaced, was on Control panel, input 2" });
    expect(dropEdit(placed, ctx, detector("d"), input("panel", 2))).toBeNull();
    expect(dropEdit(small, ctx, detector("d"), { type: "unplaced" })).toBeNull();
    expect(dropEdit(small, ctx, detector("d"), null)).toBeNull();
  });

  it("reorders boards when a board lands on another board's place", () => {
    const doc = emptyLayout("fx-panel-small", { boards: [board("b1", "expansion", "fx-exp-8", 1), board("b2", "keypad", "fx-keypad", 2)] });
    const e = dropEdit(doc, ctx, { type: "board", boardKey: "b2" }, { type: "board", boardKey: "b1" })!;
    expect(e.layout.boards.map((b) => b.key)).toEqual(["b2", "b1"]);
    expect(e.message).toBe("Keypad 1 moved to position 1 of 2");
    expect(dropEdit(doc, ctx, { type: "board", boardKey: "b2" }, input("panel", 1))).toBeNull();
  });
});

describe("overSentence", () => {
  it("says whether an occupied input would take the detector as a second one", () => {
    const large = dropEdit(emptyLayout("fx-panel-large"), ctx, detector("a"), input("panel", 1))!.layout;
    expect(overSentence(large, ctx, detector("b"), input("panel", 1))).toBe("Hall motion is over Control panel, input 1, taken by Front door; dropping here makes it a shared input");
    const small = dropEdit(emptyLayout("fx-panel-small"), ctx, detector("a"), input("panel", 1))!.layout;
    expect(overSentence(small, ctx, detector("b"), input("panel", 1))).toBe("Hall motion is over Control panel, input 1, taken by Front door; this input takes no other detector");
    expect(overSentence(small, ctx, detector("b"), input("panel", 2))).toBe("Hall motion is over Control panel, input 2, free");
    expect(overSentence(small, ctx, detector("b"), null)).toBe("Hall motion is not over an input");
  });
});

describe("zone numbers", () => {
  it("run in board order, then input order, one per detector and two on a shared input", () => {
    const doc = emptyLayout("fx-panel-large", {
      boards: [board("b1", "expansion", "fx-exp-8", 1)],
      inputs: [inp("b1", 1, ["d"]), inp("panel", 4, ["a", "b"]), inp("panel", 2, ["c"], { scheme: "double-eol" })],
    });
    const zones = zoneNumbers(createSolver(schedule, fixtureCatalog).solve(doc));
    expect([...zones.entries()]).toEqual([
      ["c", 1],
      ["a", 2],
      ["b", 3],
      ["d", 4],
    ]);
  });
});

describe("resistor text", () => {
  const type = fixtureCatalog.inputTypes.find((t) => t.id === "fx-shared")!;
  it("shows fitted values where given, else the input type's expected values, with units", () => {
    expect(resistorText(resistorLines({ scheme: "double-eol" }, type))).toBe("EOL 2.2 kΩ · alarm 2.2 kΩ");
    expect(resistorText(resistorLines({ scheme: "double-eol", alarmOhms: 3300 }, type))).toBe("EOL 2.2 kΩ · alarm 3.3 kΩ");
    expect(resistorLines({ scheme: "double-eol", alarmOhms: 3300 }, type).map((l) => l.fitted)).toEqual([false, true]);
    expect(resistorText(resistorLines({ scheme: "shared" }, type))).toBe("line 2.2 kΩ · A 2.2 kΩ · B 4.7 kΩ");
    expect(resistorText(resistorLines({ scheme: "none" }, type))).toBe("no resistors");
  });
});

describe("withoutMissingDetectors", () => {
  it("takes deleted detectors off their inputs, a shared input left with one going back to a plain scheme", () => {
    const doc = emptyLayout("fx-panel-large", { inputs: [inp("panel", 1, ["a", "gone"]), inp("panel", 2, ["also-gone"]), inp("panel", 3, ["d"])] });
    const r = withoutMissingDetectors(doc, ctx);
    expect(r.removed).toEqual(["gone", "also-gone"]);
    // fx-shared takes double-eol, and Front door asks for shared-ok: the best supervised plain scheme
    expect(r.doc.inputs).toEqual([expect.objectContaining({ input: 1, detectorIds: ["a"], scheme: "double-eol" }), expect.objectContaining({ input: 3, detectorIds: ["d"] })]);
    const clean = emptyLayout("fx-panel-large", { inputs: [inp("panel", 3, ["d"])] });
    expect(withoutMissingDetectors(clean, ctx).doc).toBe(clean);
  });
});

describe("changePanel", () => {
  it("sends detectors beyond the new panel's inputs back, and a pair on an input that does not share", () => {
    const doc = emptyLayout("fx-panel-large", { inputs: [inp("panel", 1, ["a", "b"]), inp("panel", 2, ["d"]), inp("panel", 12, ["c"], { scheme: "double-eol" })] });
    const e = changePanel(doc, ctx, "fx-panel-small");
    expect(e).toMatchObject({ ok: true, message: "Control panel changed to Fixture panel S; 3 detectors back to unplaced" });
    expect(e.layout.panelId).toBe("fx-panel-small");
    expect(e.layout.inputs).toEqual([expect.objectContaining({ input: 2, detectorIds: ["d"] })]);
    expect(changePanel(doc, ctx, "fx-panel-large").ok).toBe(false);
    expect(changePanel(doc, ctx, "no-such-panel")).toMatchObject({ ok: false, message: "That control panel is not in the catalog" });
  });
});

describe("drag model", () => {
  const ix = indexCatalog(fixtureCatalog);
  const doc = emptyLayout("fx-panel-small", { boards: [board("b1", "expansion", "fx-exp-8", 1), board("b2", "keypad", "fx-keypad", 2)], inputs: [inp("panel", 2, ["a"])] });
  const labelOf = (id: string) => schedule.find((d) => d.id === id)?.label ?? id;

  it("orders keyboard drop targets: the unplaced list, the panel's inputs, then each board's, skipping boards without inputs", () => {
    const ids = dropTargetIds(doc, ix);
    // fx-panel-small has 8 inputs, fx-exp-8 has 8, fx-keypad none
    expect(ids).toHaveLength(1 + 8 + 8);
    expect(ids[0]).toBe(UNPLACED_DROP_ID);
    expect(ids[1]).toBe(inputDropId("panel", 1));
    expect(ids[8]).toBe(inputDropId("panel", 8));
    expect(ids[9]).toBe(inputDropId("b1", 1));
    expect(ids.some((id) => id.startsWith("in:b2:"))).toBe(false);
  });

  it("starts a drag where the item is: its input, the unplaced list, or its board position", () => {
    expect(dragOriginId(doc, detector("a"))).toBe(inputDropId("panel", 2));
    expect(dragOriginId(doc, detector("b"))).toBe(UNPLACED_DROP_ID);
    expect(dragOriginId(doc, { type: "board", boardKey: "b2" })).toBe(boardSortId("b2"));
  });

  it("names the dragged item and where it is", () => {
    expect(dragPlace(doc, indexCatalog(fixtureCatalog), detector("a"), labelOf)).toBe("Front door, on Control panel, input 2");
    expect(dragPlace(doc, indexCatalog(fixtureCatalog), detector("b"), labelOf)).toBe("Hall motion, unplaced");
    expect(dragPlace(doc, indexCatalog(fixtureCatalog), { type: "board", boardKey: "b2" }, labelOf)).toBe("Keypad 1, position 2 of 2");
  });

  it("words the removed-detector notice and the names of rescue copies", () => {
    expect(removedNotice(0)).toBeNull();
    expect(removedNotice(1)).toBe("1 detector was deleted from the device schedule since the last save and have been taken off their inputs.");
    expect(removedNotice(3)).toMatch(/^3 detectors were deleted/);
    expect(copyName("Ground floor", "reload", "02/12/2026, 17:00")).toBe("Ground floor — my changes 02/12/2026, 17:00");
    expect(copyName("Ground floor", "copy", "02/12/2026, 17:00")).toBe("Ground floor (copy 02/12/2026, 17:00)");
    expect(copyName("x".repeat(199), "copy", "now")).toHaveLength(200);
  });
});
