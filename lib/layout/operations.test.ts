import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { addBoard, assign, classAAllowed, makeShared, moveBetween, removeBoard, reorderBoards, setBusAddress, setInputWiring, setPoweredBy, unassign, unplacedDetectorIds, type LayoutContext } from "@/lib/layout/operations";
import { layoutDocumentSchema, type LayoutDocument } from "@/lib/layout/schema";
import { createLayoutSchema, suggestRequestSchema } from "@/lib/layout/layout-request-schema";
import { fixtureCatalog } from "@/lib/solver/testing/fixture-catalog";
import { det, emptyLayout } from "@/lib/solver/testing/fixture-schedule";

const schedule = [
  det("d1", "fx-door", { label: "Kitchen door contact" }),
  det("d2", "fx-door", { label: "Back door contact", supervision: "shared-ok" }),
  det("d3", "fx-pir", { label: "Hall motion" }),
  det("d4", "fx-smoke", { label: "Landing smoke" }),
];
const ctx: LayoutContext = { schedule, catalog: fixtureCatalog };

function withBoards(): LayoutDocument {
  let doc = emptyLayout("fx-panel-small");
  doc = addBoard(doc, ctx, "expansion", "fx-exp-8").layout;
  doc = addBoard(doc, ctx, "expansion", "fx-exp-8-shared").layout;
  return doc;
}

describe("layout operations", () => {
  it("places a detector and says where, with the human board name", () => {
    const doc = withBoards();
    const r = assign(doc, ctx, "d1", { boardKey: "b2", input: 3 });
    expect(r).toMatchObject({ ok: true, message: "Kitchen door contact placed on Expansion board 2, input 3" });
    expect(r.layout.inputs).toEqual([{ boardKey: "b2", input: 3, detectorIds: ["d1"], scheme: "double-eol", placement: "at-detector" }]);
    expect(doc.inputs).toEqual([]); // immutable
    expect(layoutDocumentSchema.safeParse(r.layout).success).toBe(true);
  });
  it("moves a placed detector, and refuses an occupied input or an input the board lacks", () => {
    let doc = assign(withBoards(), ctx, "d1", { boardKey: "panel", input: 1 }).layout;
    doc = assign(doc, ctx, "d3", { boardKey: "panel", input: 2 }).layout;
    const moved = assign(doc, ctx, "d1", { boardKey: "b1", input: 8 });
    expect(moved.message).toBe("Kitchen door contact moved from Control panel, input 1 to Expansion board 1, input 8");
    expect(moved.layout.inputs.map((i) => [i.boardKey, i.input, i.detectorIds])).toEqual([["panel", 2, ["d3"]], ["b1", 8, ["d1"]]]);
    const taken = assign(doc, ctx, "d1", { boardKey: "panel", input: 2 });
    expect(taken.ok).toBe(false);
    expect(taken.layout).toBe(doc);
    expect(taken.message).toMatch(/taken by Hall motion/);
    expect(assign(doc, ctx, "d1", { boardKey: "b1", input: 9 }).message).toBe("Expansion board 1 has inputs 1 to 8, not 9");
  });
  it("unassigns back to unplaced", () => {
    const doc = assign(withBoards(), ctx, "d3", { boardKey: "b1", input: 1 }).layout;
    const r = unassign(doc, ctx, "d3");
    expect(r.message).toBe("Hall motion back to unplaced, was on Expansion board 1, input 1");
    expect(unplacedDetectorIds(r.layout, schedule)).toEqual(["d1", "d2", "d3", "d4"]);
  });
  it("shares an input only where the input type takes two detectors, never for a life-safety device", () => {
    let doc = assign(withBoards(), ctx, "d1", { boardKey: "b2", input: 1 }).layout;
    doc = assign(doc, ctx, "d3", { boardKey: "b1", input: 1 }).layout;
    const shared = makeShared(doc, ctx, "d2", { boardKey: "b2", input: 1 });
    expect(shared.message).toBe("Back door contact shares Expansion board 2, input 1 with Kitchen door contact");
    expect(shared.layout.inputs.find((i) => i.boardKey === "b2")).toMatchObject({ detectorIds: ["d1", "d2"], scheme: "shared" });
    expect(makeShared(doc, ctx, "d2", { boardKey: "b1", input: 1 }).message).toMatch(/cannot be shared/); // fx-dual has no shared scheme
    expect(makeShared(doc, ctx, "d4", { boardKey: "b2", input: 1 }).message).toMatch(/life-safety device/);
    // taking one detector off a shared input leaves a plain one
    const back = unassign(shared.layout, ctx, "d1").layout;
    expect(back.inputs.find((i) => i.boardKey === "b2")).toMatchObject({ detectorIds: ["d2"], scheme: "double-eol" });
  });
  it("moves an input's wiring to a free input, or swaps with a used one", () => {
    let doc = assign(withBoards(), ctx, "d1", { boardKey: "b1", input: 1 }).layout;
    doc = setInputWiring(doc, ctx, { boardKey: "b1", input: 1 }, { scheme: "single-eol", eolOhms: 5600 }).layout;
    doc = assign(doc, ctx, "d3", { boardKey: "b1", input: 2 }).layout;
    const swapped = moveBetween(doc, ctx, { boardKey: "b1", input: 1 }, { boardKey: "b1", input: 2 });
    expect(swapped.message).toMatch(/swapped/);
    expect(swapped.layout.inputs.find((i) => i.input === 2)).toMatchObject({ detectorIds: ["d1"], scheme: "single-eol", eolOhms: 5600 });
    expect(swapped.layout.inputs.find((i) => i.input === 1)).toMatchObject({ detectorIds: ["d3"] });
  });
  it("adds boards at the next free bus address and removes them, freeing their detectors", () => {
    let doc = withBoards();
    expect(doc.boards.map((b) => [b.key, b.busAddress])).toEqual([["b1", 1], ["b2", 2]]);
    doc = setBusAddress(doc, ctx, "b1", 3).layout;
    const added = addBoard(doc, ctx, "keypad", "fx-keypad");
    expect(added.message).toBe("Keypad 1 added at bus address 1");
    doc = addBoard(added.layout, ctx, "supply", "fx-psu-2a").layout;
    doc = setPoweredBy(doc, ctx, "b2", "b4").layout;
    doc = assign(doc, ctx, "d1", { boardKey: "b4", input: 1 }).layout; // a supply has no inputs
    expect(unplacedDetectorIds(doc, schedule)).toHaveLength(4);
    doc = assign(doc, ctx, "d1", { boardKey: "b2", input: 1 }).layout;
    doc = assign(doc, ctx, "d2", { boardKey: "b2", input: 2 }).layout;
    const removedSupply = removeBoard(doc, ctx, "b4");
    expect(removedSupply.message).toBe("Power supply 1 removed; 1 board now on the panel's auxiliary output");
    const removed = removeBoard(removedSupply.layout, ctx, "b2");
    expect(removed.message).toBe("Expansion board 2 removed; 2 detectors back to unplaced");
    expect(removed.layout.inputs).toEqual([]);
    expect(addBoard(doc, ctx, "expansion", "no-such").ok).toBe(false);
  });
  it("returns a life-safety input's loop to the panel (Class A) and back, and refuses it where the input type can't", () => {
    const fireCtx: LayoutContext = { schedule: [det("s1", "fx-smoke", { label: "Stair smoke" })], catalog: fixtureCatalog };
    const at = { boardKey: "panel", input: 1 };
    const doc = assign(emptyLayout("fx-panel-fire"), fireCtx, "s1", at).layout;
    const a = setInputWiring(doc, fireCtx, at, { pathway: "class-a" });
    expect(a).toMatchObject({ ok: true, message: "Control panel, input 1 wiring set: return path to the panel (Class A)" });
    expect(a.layout.inputs[0].pathway).toBe("class-a");
    expect(layoutDocumentSchema.safeParse(a.layout).success).toBe(true);
    // back to Class B clears the field: the document keeps its default shape
    const b = setInputWiring(a.layout, fireCtx, at, { pathway: "class-b" });
    expect(b.ok).toBe(true);
    expect("pathway" in b.layout.inputs[0]).toBe(false);
    // an intruder input type carries no Class A option
    const door = assign(withBoards(), ctx, "d1", { boardKey: "b1", input: 1 }).layout;
    const refused = setInputWiring(door, ctx, { boardKey: "b1", input: 1 }, { pathway: "class-a" });
    expect(refused.ok).toBe(false);
    expect(refused.message).toMatch(/Class A\): that needs a life-safety input type/);
    expect(refused.layout).toBe(door);
  });
  it("the suggestion request and the create-from-suggestion body take a pathway, and refuse any other word", () => {
    expect(suggestRequestSchema.parse({ pathway: "class-a" })).toEqual({ pathway: "class-a" });
    expect(suggestRequestSchema.safeParse({ pathway: "loop" }).error?.issues[0].path).toEqual(["pathway"]);
    expect(createLayoutSchema.safeParse({ name: "A", suggestion: { allowShared: false, pathway: "class-a" } }).success).toBe(true);
    expect(createLayoutSchema.safeParse({ name: "A", suggestion: { allowShared: false, pathway: "class-c" } }).success).toBe(false);
  });
  it("allows Class A only on a life-safety input type wired with an end-of-line scheme", () => {
    const fire = fixtureCatalog.inputTypes.find((t) => t.lifeSafety)!;
    const intruder = fixtureCatalog.inputTypes.find((t) => !t.lifeSafety)!;
    expect(classAAllowed(fire, "double-eol")).toBe(true);
    expect(classAAllowed(fire, "single-eol")).toBe(true);
    expect(classAAllowed(fire, "none")).toBe(false);
    expect(classAAllowed(fire, "shared")).toBe(false);
    expect(classAAllowed(intruder, "double-eol")).toBe(false);
    expect(classAAllowed(undefined, "double-eol")).toBe(false);
  });
  it("reorders boards", () => {
    const doc = withBoards();
    const r = reorderBoards(doc, ctx, 1, 0);
    expect(r.layout.boards.map((b) => b.key)).toEqual(["b2", "b1"]);
    expect(r.message).toBe("Expansion board 2 moved to position 1 of 2");
  });
  it("keeps every document valid and every detector placed at most once over random edits", () => {
    const refs = [
      ...Array.from({ length: 8 }, (_, i) => ({ boardKey: "panel", input: i + 1 })),
      ...Array.from({ length: 4 }, (_, i) => ({ boardKey: "b1", input: i + 1 })),
      ...Array.from({ length: 4 }, (_, i) => ({ boardKey: "b2", input: i + 1 })),
    ];
    const ids = schedule.map((d) => d.id);
    const op = fc.oneof(
      fc.record({ t: fc.constant("assign" as const), d: fc.constantFrom(...ids), r: fc.constantFrom(...refs) }),
      fc.record({ t: fc.constant("share" as const), d: fc.constantFrom(...ids), r: fc.constantFrom(...refs) }),
      fc.record({ t: fc.constant("unassign" as const), d: fc.constantFrom(...ids) }),
      fc.record({ t: fc.constant("move" as const), a: fc.constantFrom(...refs), r: fc.constantFrom(...refs) }),
    );
    fc.assert(
      fc.property(fc.array(op, { maxLength: 30 }), (ops) => {
        let doc = withBoards();
        for (const o of ops) {
          const r =
            o.t === "assign" ? assign(doc, ctx, o.d, o.r) : o.t === "share" ? makeShared(doc, ctx, o.d, o.r) : o.t === "unassign" ? unassign(doc, ctx, o.d) : moveBetween(doc, ctx, o.a, o.r);
          expect(r.message.length).toBeGreaterThan(0);
          doc = r.layout;
          expect(layoutDocumentSchema.safeParse(doc).success).toBe(true);
          const placed = doc.inputs.flatMap((i) => i.detectorIds);
          expect(placed.length + unplacedDetectorIds(doc, schedule).length).toBe(ids.length);
          expect(doc.inputs.every((i) => i.detectorIds.length > 0 && (i.scheme === "shared" ? i.detectorIds.length === 2 : i.detectorIds.length === 1))).toBe(true);
        }
      }),
      { numRuns: 200 },
    );
  });
});

describe("the data bus cable of a new bus device", () => {
  it("adds the run to the new board to the layout's bus cable total and says so", () => {
    const doc = { ...emptyLayout("fx-panel-small"), busCableM: 12 };
    const r = addBoard(doc, ctx, "expansion", "fx-exp-8", undefined, 25.5);
    expect(r).toMatchObject({ ok: true, message: "Expansion board 1 added at bus address 1; data bus cable now 37.5 m" });
    expect(r.layout.busCableM).toBe(37.5);
  });
  it("refuses a run of 0 m or less, or not a number, and changes nothing", () => {
    const doc = emptyLayout("fx-panel-small");
    for (const bad of [0, -3, Number.NaN, Number.POSITIVE_INFINITY]) {
      const r = addBoard(doc, ctx, "expansion", "fx-exp-8", undefined, bad);
      expect(r.ok, String(bad)).toBe(false);
      expect(r.layout).toBe(doc);
      expect(r.message).toBe("Give the length of data bus cable to the new board, more than 0 m");
    }
  });
  it("holds for any positive run: the total grows by exactly that run, to the centimetre", () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 50_000 }), fc.integer({ min: 1, max: 50_000 }), (startCm, runCm) => {
        const doc = { ...emptyLayout("fx-panel-small"), busCableM: startCm / 100 };
        const r = addBoard(doc, ctx, "expansion", "fx-exp-8", undefined, runCm / 100);
        expect(Math.round(r.layout.busCableM * 100)).toBe(startCm + runCm);
      }),
    );
  });
});
