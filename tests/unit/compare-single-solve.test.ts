import { describe, expect, it, vi } from "vitest";
import type { LayoutDocument } from "@/lib/layout/schema";

// The compare page asks the server layer once: each compared layout is solved exactly once, and that one solve
// carries its findings and the life-safety flag to the page. Every solve path (the incremental solver and the
// one-shot solveLayout) goes through createSolverWith, so counting its solves counts them all.

const solved = vi.hoisted(() => [] as LayoutDocument[]);
vi.mock("@/lib/solver/create-solver", async (importOriginal) => {
  const real = await importOriginal<typeof import("@/lib/solver/create-solver")>();
  return {
    ...real,
    createSolverWith: (...args: Parameters<typeof real.createSolverWith>) => {
      const solver = real.createSolverWith(...args);
      return {
        ...solver,
        solve: (layout: LayoutDocument) => {
          solved.push(layout);
          return solver.solve(layout);
        },
      };
    },
  };
});

const { compareLayouts } = await import("@/lib/compare/compare-layouts");
const { shippedCatalog } = await import("@/lib/catalog/shipped");
const { solveLayout } = await import("@/lib/solver");
const { severityRank } = await import("@/lib/findings");
const { largeLayout, largeSchedule } = await import("@/lib/sheet/testing/sample-layouts");

const { catalog } = shippedCatalog();
const separate: LayoutDocument = {
  ...largeLayout,
  inputs: [
    { boardKey: "panel", input: 1, detectorIds: ["l-door"], scheme: "single-eol", placement: "at-detector" },
    { boardKey: "panel", input: 2, detectorIds: ["l-win"], scheme: "single-eol", placement: "at-detector" },
    largeLayout.inputs[1],
  ],
};
const empty: LayoutDocument = { ...largeLayout, inputs: [] };
const candidates = [
  { id: 1, name: "A shared", layout: largeLayout },
  { id: 2, name: "B separate", layout: separate },
  { id: 3, name: "C empty", layout: empty },
];

describe("comparing layouts for the compare page", () => {
  it("solves each layout once", () => {
    solved.length = 0;
    compareLayouts(candidates, largeSchedule, catalog);
    expect(solved).toEqual([largeLayout, separate, empty]);
  });

  it("lists every finding of that solve, errors first, agreeing with the counts and a solve of its own", () => {
    const { columns } = compareLayouts(candidates, largeSchedule, catalog);
    columns.forEach((c, i) => {
      expect(c.findingList).toHaveLength(c.findings.error + c.findings.warning + c.findings.note);
      const ranks = c.findingList.map((f) => severityRank[f.severity]);
      expect(ranks).toEqual([...ranks].sort((a, b) => a - b));
      const own = solveLayout(candidates[i].layout, largeSchedule, catalog).findings.map((f) => f.message);
      expect([...c.findingList.map((f) => f.message)].sort()).toEqual([...own].sort());
    });
    // the empty layout leaves every detector unplaced, which the solver reports
    expect(columns[2].findingList.length).toBeGreaterThan(0);
  });

  it("flags the life-safety caution only when the schedule holds a smoke, heat or life-safety device", () => {
    const lifeSafetyIds = new Set(catalog.detectors.filter((d) => d.lifeSafety || d.category === "smoke" || d.category === "heat").map((d) => d.id));
    const intruderOnly = largeSchedule.filter((d) => !lifeSafetyIds.has(d.catalogId));
    const smoke = catalog.detectors.find((d) => d.category === "smoke")!;
    const withSmoke = [...intruderOnly, { ...intruderOnly[0], id: "smoke-1", label: "Landing smoke", catalogId: smoke.id }];
    expect(compareLayouts([{ name: "plain", layout: empty }], intruderOnly, catalog).lifeSafety).toBe(false);
    expect(compareLayouts([{ name: "plain", layout: empty }], withSmoke, catalog).lifeSafety).toBe(true);
  });
});
