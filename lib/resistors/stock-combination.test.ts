import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { combineFromStock, type StockCombination } from "./stock-combination";
import { seriesValues } from "./e-series";

const par = (a: number, b: number) => (a * b) / (a + b);

/** Recompute a network's resistance from its parts, independently of the solver. */
function valueOf(c: StockCombination): number {
  const [a, b, d] = c.parts;
  switch (c.topology) {
    case "single":
      return a;
    case "series":
      return a + b;
    case "parallel":
      return par(a, b);
    case "series-3":
      return a + b + d;
    case "parallel-3":
      return par(par(a, b), d);
    case "series-pair-in-parallel":
      return par(a + b, d);
    case "parallel-pair-in-series":
      return par(a, b) + d;
  }
}

describe("making a value from stock", () => {
  it("a stock value is one part", () => {
    const s = combineFromStock(5600, { series: "E12" });
    expect(s.best).toMatchObject({ parts: [5600], topology: "single", errorPct: 0 });
  });
  it("6.04 kΩ from E12 within 0.1 %", () => {
    const s = combineFromStock(6040, { series: "E12", tolerancePct: 0.1 });
    expect(s.best).not.toBeNull();
    expect(Math.abs(s.best!.errorPct)).toBeLessThanOrEqual(0.1);
    expect(valueOf(s.best!)).toBeCloseTo(s.best!.ohms, 9);
    for (const p of s.best!.parts) expect(seriesValues("E12")).toContain(p);
  });
  it("every reported network's value matches its parts, and best meets the tolerance", () => {
    fc.assert(
      fc.property(fc.double({ min: 10, max: 1e6, noNaN: true }), fc.constantFrom("E12", "E24") as fc.Arbitrary<"E12" | "E24">, (t, series) => {
        const s = combineFromStock(t, { series, tolerancePct: 0.5, exhaustive: true });
        for (const c of s.byParts) {
          if (!c) continue;
          expect(Math.abs(valueOf(c) - c.ohms)).toBeLessThanOrEqual(1e-9 * c.ohms);
          expect(c.errorPct).toBeCloseTo(((c.ohms - t) / t) * 100, 9);
        }
        if (s.best) expect(Math.abs(s.best.errorPct)).toBeLessThanOrEqual(0.5 + 1e-9);
        // more parts can't do worse than the best one- or two-part network here: 3 parts include R + tiny
        expect(Math.abs(s.byParts[2]!.errorPct)).toBeLessThanOrEqual(Math.abs(s.byParts[1]!.errorPct) + 1e-9);
      }),
      { numRuns: 25 },
    );
  });
  it("matches brute force over every 2- and 3-part network of a restricted stock", () => {
    const stock = seriesValues("E12", 100, 100_000);
    for (const t of [777, 3333, 6040, 12_345, 47_123]) {
      let best2 = Infinity;
      let best3 = Infinity;
      for (const a of stock)
        for (const b of stock) {
          for (const v of [a + b, par(a, b)]) best2 = Math.min(best2, Math.abs(v - t));
          for (const d of stock) for (const v of [a + b + d, par(par(a, b), d), par(a + b, d), par(a, b) + d]) best3 = Math.min(best3, Math.abs(v - t));
        }
      const s = combineFromStock(t, { series: "E12", minOhms: 100, maxOhms: 100_000, exhaustive: true, tolerancePct: 0 });
      expect(Math.abs(s.byParts[1]!.ohms - t)).toBeCloseTo(best2, 6);
      expect(Math.abs(s.byParts[2]!.ohms - t)).toBeCloseTo(best3, 6);
    }
  });
});
