import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { addBoard, assign, makeShared, moveBetween, setPoweredBy, unassign, type LayoutContext } from "@/lib/layout/operations";
import { addArea, setGrade, setZoneProgram } from "@/lib/layout/zone-output-operations";
import type { InputRef, LayoutDocument } from "@/lib/layout/schema";
import type { Schedule } from "@/lib/schedule/schema";
import { createSolver, solveLayout } from "@/lib/solver";
import { fixtureCatalog } from "@/lib/solver/testing/fixture-catalog";
import { det, emptyLayout } from "@/lib/solver/testing/fixture-schedule";

// A re-solve after a move patches the previous result (only the inputs, boards and supplies the move touched are
// worked out again); whatever the layout and the move, the patched result is exactly the full solve.

const types = ["fx-door", "fx-pir", "fx-pir-hungry", "fx-smoke", "fx-heat"];
const schedule: Schedule = Array.from({ length: 30 }, (_, i) =>
  det(`d${i}`, types[(i * 7) % types.length], { label: i % 4 ? `Detector ${i}` : `Detector ${i} by the long north corridor`, cableM: 5 + ((i * 37) % 160), supervision: i % 3 ? "shared-ok" : "double-eol", gauge: i % 4 ? { awg: 22 } : { mm2: 0.22 } }),
);
const ctx: LayoutContext = { schedule, catalog: fixtureCatalog };
const boardKinds = [
  ["expansion", "fx-exp-8"],
  ["expansion", "fx-exp-8-shared"],
  ["expansion", "fx-exp-8-psu"],
  ["keypad", "fx-keypad-2in"],
  ["supply", "fx-psu-2a"],
] as const;

const id = fc.constantFrom(...schedule.map((d) => d.id));
const input = fc.integer({ min: 1, max: 16 });
const slot = fc.record({ b: fc.integer({ min: 0, max: 5 }), input });

/** A random layout: boards (one feeding from a supply), detectors placed alone or shared, some zones programmed, maybe a grade. */
const layoutArb = fc.record({
  boards: fc.array(fc.integer({ min: 0, max: boardKinds.length - 1 }), { minLength: 1, maxLength: 5 }),
  placements: fc.array(fc.record({ d: id, at: slot, share: fc.boolean() }), { minLength: 5, maxLength: 40 }),
  programs: fc.array(fc.record({ d: id, type: fc.constantFrom("instant", "entry-exit", "24-hour", "fire" as const), entryS: fc.integer({ min: 10, max: 90 }), label: fc.option(fc.constantFrom("Back door", "Store room by the loading bay")) }), { maxLength: 8 }),
  grade: fc.option(fc.constantFrom(2, 3 as const)),
  area: fc.boolean(),
});

type Move = { t: "assign" | "share"; d: string; at: { b: number; input: number } } | { t: "unassign"; d: string } | { t: "swap"; a: { b: number; input: number }; at: { b: number; input: number } };
const moveArb: fc.Arbitrary<Move> = fc.oneof(
  { weight: 4, arbitrary: fc.record({ t: fc.constant("assign" as const), d: id, at: slot }) },
  { weight: 2, arbitrary: fc.record({ t: fc.constant("share" as const), d: id, at: slot }) },
  { weight: 1, arbitrary: fc.record({ t: fc.constant("unassign" as const), d: id }) },
  { weight: 2, arbitrary: fc.record({ t: fc.constant("swap" as const), a: slot, at: slot }) },
);

const refOf = (doc: LayoutDocument, s: { b: number; input: number }): InputRef => ({ boardKey: s.b === 0 || s.b > doc.boards.length ? "panel" : doc.boards[s.b - 1].key, input: s.input });

type LayoutSpec = typeof layoutArb extends fc.Arbitrary<infer L> ? L : never;

function build(l: LayoutSpec): LayoutDocument {
  let doc = emptyLayout("fx-panel-large", { power: { standbyProfileId: "intruder-grade-2", safetyFactor: 1.25 } });
  for (const k of l.boards) doc = addBoard(doc, ctx, boardKinds[k][0], boardKinds[k][1]).layout;
  const supply = doc.boards.find((b) => b.kind === "supply");
  const fed = doc.boards.find((b) => b.kind === "expansion" && b.catalogId !== "fx-exp-8-psu");
  if (supply && fed) doc = setPoweredBy(doc, ctx, fed.key, supply.key).layout;
  for (const p of l.placements) doc = (p.share ? makeShared : assign)(doc, ctx, p.d, refOf(doc, p.at)).layout;
  if (l.area) doc = addArea(doc, ctx, "Offices").layout;
  for (const p of l.programs) doc = setZoneProgram(doc, ctx, p.d, { type: p.type, ...(p.type === "entry-exit" ? { entryS: p.entryS } : {}), ...(p.label ? { keypadLabel: p.label } : {}) }).layout;
  if (l.grade) doc = setGrade(doc, ctx, l.grade).layout;
  return doc;
}

function move(doc: LayoutDocument, m: Move): LayoutDocument {
  if (m.t === "assign") return assign(doc, ctx, m.d, refOf(doc, m.at)).layout;
  if (m.t === "share") return makeShared(doc, ctx, m.d, refOf(doc, m.at)).layout;
  if (m.t === "swap") return moveBetween(doc, ctx, refOf(doc, m.a), refOf(doc, m.at)).layout;
  return unassign(doc, ctx, m.d).layout;
}

const seen = { solves: 0, patched: 0 };

describe("re-solve by patching", () => {
  it("gives exactly the full solve for random layouts and random moves", () => {
    fc.assert(
      fc.property(layoutArb, fc.array(moveArb, { minLength: 1, maxLength: 25 }), (l, moves) => {
        let doc = build(l);
        const solver = createSolver(schedule, fixtureCatalog);
        solver.solve(doc);
        for (const m of moves) {
          doc = move(doc, m);
          const patched = solver.solve(doc);
          seen.solves++;
          if (solver.stats().patched) seen.patched++;
          expect(patched).toEqual(solveLayout(doc, schedule, fixtureCatalog));
        }
      }),
      { numRuns: 120 },
    );
  });

  it("solves a layout with a finding about an input's placement in full, and patches again once it is gone", () => {
    const base = assign(emptyLayout("fx-panel-large"), ctx, "d0", { boardKey: "panel", input: 1 }).layout;
    // The same detector on two inputs: only a full solve can say which one is the first.
    const twice: LayoutDocument = { ...base, inputs: [...base.inputs, { ...base.inputs[0], input: 2 }] };
    const solver = createSolver(schedule, fixtureCatalog);
    solver.solve(twice);
    const next = assign(twice, ctx, "d1", { boardKey: "panel", input: 3 }).layout;
    expect(solver.solve(next)).toEqual(solveLayout(next, schedule, fixtureCatalog));
    expect(solver.stats().patched).toBe(false);
    const fixed: LayoutDocument = { ...next, inputs: next.inputs.filter((i) => i.input !== 2) };
    solver.solve(fixed);
    const moved = assign(fixed, ctx, "d1", { boardKey: "panel", input: 4 }).layout;
    expect(solver.solve(moved)).toEqual(solveLayout(moved, schedule, fixtureCatalog));
    expect(solver.stats().patched).toBe(true);
  });

  it("took the patch path for most of those re-solves, so the property is about patches", () => {
    expect(seen.solves).toBeGreaterThan(0);
    expect(seen.patched).toBeGreaterThan(seen.solves / 2);
  });
});
