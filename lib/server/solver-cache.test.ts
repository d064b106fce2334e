import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { addBoard, assign, type LayoutContext } from "@/lib/layout/operations";
import type { LayoutDocument } from "@/lib/layout/schema";
import type { Schedule } from "@/lib/schedule/schema";
import { solveLayout } from "@/lib/solver";
import { fixtureCatalog } from "@/lib/solver/testing/fixture-catalog";
import { det, emptyLayout } from "@/lib/solver/testing/fixture-schedule";
import { keptSolvers, solveLayoutKept } from "./solver-cache";

const schedule: Schedule = Array.from({ length: 12 }, (_, i) => det(`d${i}`, i % 3 ? "fx-pir" : "fx-door", { cableM: 10 + i * 7, supervision: "double-eol" }));
const ctx: LayoutContext = { schedule, catalog: fixtureCatalog };

function placed(): LayoutDocument {
  let doc = addBoard(emptyLayout("fx-panel-large"), ctx, "expansion", "fx-exp-8").layout;
  schedule.slice(0, 10).forEach((d, i) => (doc = assign(doc, ctx, d.id, { boardKey: i < 5 ? "panel" : "b1", input: (i % 5) + 1 }).layout));
  return doc;
}

describe("solvers kept between a layout's saves", () => {
  it("answer exactly what a fresh solve answers, save after save", () => {
    const target = fc.record({ d: fc.constantFrom(...schedule.map((d) => d.id)), boardKey: fc.constantFrom("panel", "b1"), input: fc.integer({ min: 1, max: 8 }) });
    fc.assert(
      fc.property(fc.integer({ min: 1000, max: 1_000_000 }), fc.array(target, { minLength: 1, maxLength: 15 }), (layoutId, moves) => {
        let doc = placed();
        for (const m of moves) {
          doc = assign(doc, ctx, m.d, { boardKey: m.boardKey, input: m.input }).layout;
          expect(solveLayoutKept(layoutId, doc, schedule, fixtureCatalog)).toEqual(solveLayout(doc, schedule, fixtureCatalog));
        }
      }),
      { numRuns: 40 },
    );
  });

  it("re-analyse only what the save changed", () => {
    const doc = placed();
    solveLayoutKept(1, doc, schedule, fixtureCatalog);
    const moved = assign(doc, ctx, "d0", { boardKey: "b1", input: 8 }).layout;
    solveLayoutKept(1, moved, schedule, fixtureCatalog);
    // d0 left the panel's input 1 for board 1's input 8: one input re-analysed, the other nine kept
    expect(keptSolvers().statsOf(1)).toMatchObject({ inputsReused: 9, inputsRecomputed: 1 });
  });

  it("start afresh when the schedule changed, so a new cable length is never answered from the old one", () => {
    const doc = placed();
    const before = solveLayoutKept(2, doc, schedule, fixtureCatalog);
    const longer = schedule.map((d) => (d.id === "d3" ? { ...d, cableM: 900 } : d));
    const after = solveLayoutKept(2, doc, longer, fixtureCatalog);
    expect(after).toEqual(solveLayout(doc, longer, fixtureCatalog));
    expect(after).not.toEqual(before);
  });

  it("keep at most 32 layouts' solvers", () => {
    for (let id = 5000; id < 5040; id++) solveLayoutKept(id, placed(), schedule, fixtureCatalog);
    expect(keptSolvers().count).toBe(32);
  });
});
