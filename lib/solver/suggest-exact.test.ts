import { beforeAll, describe, expect, it } from "vitest";
import fc from "fast-check";
import type { Highs } from "highs";
import type { Catalog } from "@/lib/catalog/schema";
import { shippedCatalog } from "@/lib/catalog/shipped";
import type { Schedule } from "@/lib/schedule/schema";
import { solveLayout } from "@/lib/solver";
import { highsSolver } from "@/lib/solver/highs-loader";
import { suggestHardware } from "@/lib/solver/suggest";
import { suggestExact } from "@/lib/solver/suggest-exact";
import { cheapestByBruteForce } from "@/lib/solver/testing/brute-force";
import { det } from "@/lib/solver/testing/fixture-schedule";
import { tinyCatalog } from "@/lib/solver/testing/tiny-catalog";

let highs: Highs;
let shipped: Catalog;
beforeAll(async () => {
  highs = await highsSolver();
  shipped = shippedCatalog().catalog;
});

const supervisions = ["double-eol", "single-eol", "shared-ok", "none"] as const;

/** The model's answer is a valid layout whose list price is its cost, and brute force finds nothing cheaper. */
function agreesWithBruteForce(schedule: Schedule, catalog: Catalog, allowShared: boolean, perItem: number) {
  const s = suggestExact(highs, schedule, catalog, { allowShared });
  fc.pre(s.found); // proving that nothing exists would need the unbounded brute force (hours); refusals have their own tests
  if (!s.found) return;
  expect(s.proof.method).toBe("exact-model");
  expect(s.proof.optimal).toBe(true);
  const again = solveLayout(s.layout, schedule, catalog);
  expect(again.counts.error).toBe(0);
  expect(again.totals.unplacedIds).toEqual([]);
  const share = (id: string) => allowShared && schedule.find((d) => d.id === id)!.supervision === "shared-ok";
  const brute = cheapestByBruteForce(schedule, catalog, s.layout.power, s.cost + 0.001, share, perItem);
  expect(brute?.cost).toBe(s.cost);
}

describe("suggestExact against exhaustive search", () => {
  it("costs what the cheapest valid layout costs, on the shipped catalog's families with every scheme and pairs", () => {
    const kinds = ["contact-door-surface", "contact-window-recessed", "panic-button-no", "water-probe-no", "motion-wall", "smoke-4wire-no"];
    const detector = fc.record({ kind: fc.constantFrom(...kinds), supervision: fc.constantFrom(...supervisions), cableM: fc.integer({ min: 5, max: 80 }), area: fc.constantFrom("A", "B") });
    fc.assert(
      fc.property(fc.array(detector, { minLength: 1, maxLength: 3 }), fc.boolean(), (ds, allowShared) => {
        const schedule = ds.map((d, i) => det(`x${i}`, d.kind, { cableM: d.cableM, area: d.area, supervision: d.supervision }));
        agreesWithBruteForce(schedule, shipped, allowShared, 1);
      }),
      { numRuns: 12 },
    );
  }, 120_000);

  it("costs what the cheapest valid layout costs on a catalog where inputs, pairs and supplies bind with a few detectors", () => {
    const detector = fc.record({ kind: fc.constantFrom("fx-door", "fx-pir", "fx-pir-hungry", "fx-smoke"), supervision: fc.constantFrom(...supervisions), cableM: fc.integer({ min: 5, max: 60 }), area: fc.constantFrom("A", "B") });
    fc.assert(
      fc.property(fc.array(detector, { minLength: 1, maxLength: 3 }), fc.boolean(), (ds, allowShared) => {
        const schedule = ds.map((d, i) => det(`x${i}`, d.kind, { cableM: d.cableM, area: d.area, supervision: d.supervision }));
        agreesWithBruteForce(schedule, tinyCatalog, allowShared, 3);
      }),
      { numRuns: 15 },
    );
  }, 120_000);
});

describe("suggestExact against the older search", () => {
  it("is never dearer on random schedules of up to 120 detectors", () => {
    const kinds = ["contact-door-surface", "motion-wall", "motion-dual", "panic-button-no", "water-probe-no", "glass-break-acoustic", "smoke-4wire-no"];
    const detector = fc.record({ kind: fc.constantFrom(...kinds), supervision: fc.constantFrom(...supervisions), cableM: fc.integer({ min: 5, max: 120 }), area: fc.constantFrom("A", "B", "C") });
    fc.assert(
      fc.property(fc.array(detector, { minLength: 5, maxLength: 120, size: "max" }), fc.boolean(), (ds, allowShared) => {
        const schedule = ds.map((d, i) => det(`x${i}`, d.kind, { cableM: d.cableM, area: d.area, supervision: d.supervision }));
        const old = suggestHardware(schedule, shipped, { allowShared, maxCandidates: 20_000 });
        const s = suggestExact(highs, schedule, shipped, { allowShared });
        if (old.found) {
          expect(s.found).toBe(true);
          if (s.found) expect(s.cost).toBeLessThanOrEqual(old.cost + 0.001);
        }
        if (s.found) expect(s.result.counts.error).toBe(0);
      }),
      { numRuns: 4 },
    );
  }, 240_000);

  it("wires detectors that ask for no supervision single end-of-line on the compact panel instead of a double end-of-line board", () => {
    // "none" reads with an error on these inputs; single end-of-line gives more supervision than asked and no error
    const schedule = Array.from({ length: 6 }, (_, i) => det(`n${i}`, "contact-door-surface", { supervision: "none" }));
    const old = suggestHardware(schedule, shipped, { allowShared: false });
    const s = suggestExact(highs, schedule, shipped, { allowShared: false });
    expect(s.found).toBe(true);
    if (!s.found) return;
    expect(s.layout.panelId).toBe("panel-compact-8");
    // compact panel 140 + compact keypad 60 (catalog/family-compact.yaml)
    expect(s.cost).toBe(200);
    expect(new Set(s.layout.inputs.map((i) => i.scheme))).toEqual(new Set(["single-eol"]));
    expect(old.found && old.cost).toBeGreaterThan(s.cost);
  });

  it("pairs alternating normally-closed and normally-open shareable detectors wherever a pair reads without an error", () => {
    // two door contacts (NC) share a 5.6 kΩ input, a door contact and a panic button (NO) do not; only the
    // large family has shared inputs, so the catalog is cut to it: 40 detectors, 32 on-board inputs
    const large: Catalog = { ...shipped, panels: shipped.panels.filter((p) => p.family === "large") };
    const schedule = Array.from({ length: 40 }, (_, i) => det(`p${i}`, i % 2 ? "panic-button-no" : "contact-door-surface", { supervision: "shared-ok", area: "Hall" }));
    const old = suggestHardware(schedule, large, { allowShared: true });
    const s = suggestExact(highs, schedule, large, { allowShared: true });
    expect(s.found && old.found).toBe(true);
    if (!s.found || !old.found) return;
    expect(s.sharedInputs).toBeGreaterThan(old.sharedInputs);
    expect(s.cost).toBeLessThan(old.cost);
    expect(s.result.counts.error).toBe(0);
  });

  it("within a price margin, buys more supervision than the cheapest answer", () => {
    const schedule = Array.from({ length: 6 }, (_, i) => det(`n${i}`, "contact-door-surface", { supervision: "none" }));
    const cheapest = suggestExact(highs, schedule, shipped, { allowShared: false });
    const supervised = suggestExact(highs, schedule, shipped, { allowShared: false, choice: { kind: "most-supervised", withinPct: 300 } });
    expect(cheapest.found && supervised.found).toBe(true);
    if (!cheapest.found || !supervised.found) return;
    const score = (l: typeof cheapest.layout) => l.inputs.filter((i) => i.scheme === "double-eol").length;
    expect(score(supervised.layout)).toBeGreaterThan(score(cheapest.layout));
    expect(supervised.cost).toBeLessThanOrEqual(cheapest.cost * 4 + 0.01);
  });
});

describe("suggestExact when nothing fits", () => {
  it("names the binding limit of each panel", () => {
    const schedule = Array.from({ length: 120 }, (_, i) => det(`s${i}`, "smoke-4wire-no", { supervision: "double-eol" }));
    const s = suggestExact(highs, schedule, shipped, { allowShared: false });
    expect(s.found).toBe(false);
    if (s.found) return;
    // large family: 30 bus devices, one a keypad, 29 fire boards × 4 inputs (catalog/family-large.yaml, family-mid.yaml)
    expect(s.reason).toContain("120 inputs of the Fire zone input, 1 kΩ + 4.7 kΩ kind needed; its family reaches 116 with its data bus full");
    expect(s.reason).toMatch(/Mid 16 control panel: 120 zones needed; it reports at most 64/);
  });
});
