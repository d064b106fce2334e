import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { parallel, parallel2, series } from "./network";

const ohms = fc.double({ min: 1e-3, max: 1e7, noNaN: true });
const close = (a: number, b: number) => Math.abs(a - b) <= 1e-12 * Math.max(Math.abs(a), Math.abs(b));

describe("series and parallel laws", () => {
  // Kirchhoff's laws: series resistances add, parallel conductances add
  it("series adds and is order-free", () => {
    fc.assert(
      fc.property(ohms, ohms, ohms, (a, b, c) => {
        expect(close(series(a, b, c), series(c, a, b))).toBe(true);
        expect(close(series(series(a, b), c), series(a, series(b, c)))).toBe(true);
        expect(series(a, b)).toBeGreaterThanOrEqual(Math.max(a, b));
      }),
    );
  });
  it("parallel conductances add, and the result is below the smallest branch", () => {
    fc.assert(
      fc.property(ohms, ohms, ohms, (a, b, c) => {
        const p = parallel(a, b, c);
        expect(Math.abs(1 / p - (1 / a + 1 / b + 1 / c))).toBeLessThanOrEqual(1e-9 * (1 / p));
        expect(p).toBeLessThanOrEqual(Math.min(a, b, c));
        expect(close(parallel(a, b), parallel(b, a))).toBe(true);
        expect(close(parallel(a, a), a / 2)).toBe(true);
      }),
    );
  });
  it("an open drops out, a dead short takes over", () => {
    fc.assert(
      fc.property(ohms, (a) => {
        expect(parallel2(a, Infinity)).toBe(a);
        expect(parallel2(Infinity, a)).toBe(a);
        expect(parallel2(a, 0)).toBe(0);
        expect(series(a, Infinity)).toBe(Infinity);
        expect(series(a, 0)).toBe(a);
      }),
    );
    expect(parallel2(Infinity, Infinity)).toBe(Infinity);
    expect(parallel2(0, Infinity)).toBe(0);
  });
});
