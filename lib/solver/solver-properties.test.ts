import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { addBoard, assign, makeShared, moveBetween, removeBoard, setBusAddress, setInputWiring, setPoweredBy, unassign, type LayoutContext } from "@/lib/layout/operations";
import type { LayoutDocument } from "@/lib/layout/schema";
import type { Schedule } from "@/lib/schedule/schema";
import { createSolver, solveLayout } from "@/lib/solver";
import { fixtureCatalog } from "@/lib/solver/testing/fixture-catalog";
import { det, emptyLayout } from "@/lib/solver/testing/fixture-schedule";

const types = ["fx-door", "fx-pir", "fx-pir-hungry", "fx-smoke", "fx-heat"];
const schedule: Schedule = Array.from({ length: 14 }, (_, i) =>
  det(`d${i}`, types[i % types.length], { cableM: 5 + ((i * 37) % 120), area: `Area ${i % 3}`, supervision: i % 2 ? "shared-ok" : "double-eol", gauge: i % 4 ? { awg: 22 } : { mm2: 0.22 } }),
);
const ctx: LayoutContext = { schedule, catalog: fixtureCatalog };
const boardKinds = [
  ["expansion", "fx-exp-8"],
  ["expansion", "fx-exp-8-shared"],
  ["expansion", "fx-exp-8-psu"],
  ["keypad", "fx-keypad-2in"],
  ["keypad", "fx-keypad"],
  ["supply", "fx-psu-2a"],
] as const;
const keys = ["panel", "b1", "b2", "b3", "b4"];
const ref = fc.record({ boardKey: fc.constantFrom(...keys), input: fc.integer({ min: 1, max: 9 }) });
const id = fc.constantFrom(...schedule.map((d) => d.id));
const edit = fc.oneof(
  { weight: 4, arbitrary: fc.record({ t: fc.constant("assign" as const), d: id, r: ref }) },
  { weight: 2, arbitrary: fc.record({ t: fc.constant("share" as const), d: id, r: ref }) },
  { weight: 1, arbitrary: fc.record({ t: fc.constant("unassign" as const), d: id }) },
  { weight: 2, arbitrary: fc.record({ t: fc.constant("move" as const), a: ref, r: ref }) },
  { weight: 1, arbitrary: fc.record({ t: fc.constant("add" as const), k: fc.integer({ min: 0, max: boardKinds.length - 1 }) }) },
  { weight: 1, arbitrary: fc.record({ t: fc.constant("remove" as const), b: fc.constantFrom(...keys.slice(1)) }) },
  { weight: 1, arbitrary: fc.record({ t: fc.constant("power" as const), b: fc.constantFrom(...keys.slice(1)), s: fc.option(fc.constantFrom(...keys.slice(1))) }) },
  { weight: 1, arbitrary: fc.record({ t: fc.constant("wiring" as const), r: ref, p: fc.constantFrom("at-detector", "at-panel", "loop-back" as const), s: fc.constantFrom("double-eol", "single-eol", "none" as const) }) },
  { weight: 1, arbitrary: fc.record({ t: fc.constant("address" as const), b: fc.constantFrom(...keys.slice(1)), a: fc.option(fc.integer({ min: 0, max: 20 })) }) },
);
type Edit = typeof edit extends fc.Arbitrary<infer E> ? E : never;

function apply(doc: LayoutDocument, e: Edit): LayoutDocument {
  switch (e.t) {
    case "assign":
      return assign(doc, ctx, e.d, e.r).layout;
    case "share":
      return makeShared(doc, ctx, e.d, e.r).layout;
    case "unassign":
      return unassign(doc, ctx, e.d).layout;
    case "move":
      return moveBetween(doc, ctx, e.a, e.r).layout;
    case "add":
      return addBoard(doc, ctx, boardKinds[e.k][0], boardKinds[e.k][1]).layout;
    case "remove":
      return removeBoard(doc, ctx, e.b).layout;
    case "power":
      return setPoweredBy(doc, ctx, e.b, e.s).layout;
    case "wiring":
      return setInputWiring(doc, ctx, e.r, { placement: e.p, scheme: e.s }).layout;
    case "address":
      return setBusAddress(doc, ctx, e.b, e.a).layout;
  }
}

const start = (): LayoutDocument => emptyLayout("fx-panel-large", { power: { standbyProfileId: "nfpa72-fire", safetyFactor: 1.25 } });

describe("solver properties", () => {
  it("an incremental solver gives exactly the full solve after every edit", () => {
    fc.assert(
      fc.property(fc.array(edit, { minLength: 1, maxLength: 40 }), (edits) => {
        const solver = createSolver(schedule, fixtureCatalog);
        let doc = start();
        for (const e of edits) {
          doc = apply(doc, e);
          expect(solver.solve(doc)).toEqual(solveLayout(doc, schedule, fixtureCatalog));
        }
      }),
      { numRuns: 60 },
    );
  });

  it("re-analyses only the inputs an edit touched", () => {
    let doc = start();
    doc = addBoard(doc, ctx, "expansion", "fx-exp-8").layout;
    schedule.slice(0, 10).forEach((d, i) => (doc = assign(doc, ctx, d.id, { boardKey: i < 5 ? "panel" : "b1", input: (i % 5) + 1 }).layout));
    const solver = createSolver(schedule, fixtureCatalog);
    solver.solve(doc);
    const moved = assign(doc, ctx, "d0", { boardKey: "b1", input: 8 });
    expect(moved.ok).toBe(true);
    solver.solve(moved.layout);
    // d0 left panel input 1 and landed on board 1 input 8: one new loop, the other nine come from the cache
    expect(solver.stats()).toEqual({ inputsReused: 9, inputsRecomputed: 1, loopHits: 0, loopMisses: 1, patched: true });
  });

  it("counts inputs used as inputs holding detectors, and zones as detectors placed", () => {
    fc.assert(
      fc.property(fc.array(edit, { maxLength: 40 }), (edits) => {
        const doc = edits.reduce(apply, start());
        const r = solveLayout(doc, schedule, fixtureCatalog);
        const used = doc.inputs.filter((i) => i.detectorIds.length > 0);
        expect(r.totals.inputsUsed).toBe(used.length);
        expect(r.totals.zonesUsed).toBe(used.reduce((n, i) => n + i.detectorIds.length, 0));
        expect(r.totals.zonesUsed + r.totals.unplacedIds.length).toBe(schedule.length);
        for (const b of r.boards) expect(b.inputsUsed + b.inputsFree).toBe(b.inputsTotal);
        expect(r.boards.reduce((n, b) => n + b.inputsFree, 0)).toBe(r.totals.inputsFree);
        expect(r.coverage.used).toBe(used.length);
      }),
      { numRuns: 100 },
    );
  });

  it("adding a board never reduces free inputs", () => {
    fc.assert(
      fc.property(fc.array(edit, { maxLength: 30 }), fc.integer({ min: 0, max: boardKinds.length - 1 }), (edits, k) => {
        const doc = edits.reduce(apply, start());
        const before = solveLayout(doc, schedule, fixtureCatalog).totals;
        const added = addBoard(doc, ctx, boardKinds[k][0], boardKinds[k][1]);
        const after = solveLayout(added.layout, schedule, fixtureCatalog).totals;
        expect(after.inputsFree).toBeGreaterThanOrEqual(before.inputsFree);
        expect(after.inputsUsed).toBe(before.inputsUsed);
      }),
      { numRuns: 100 },
    );
  });
});
