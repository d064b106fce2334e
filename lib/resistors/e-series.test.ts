import { describe, expect, it } from "vitest";
import { closestPreferred, E12_MANTISSAS, E24_MANTISSAS, isPreferred, nearestPreferred, preferredSeriesOf, seriesValues } from "./e-series";

describe("IEC 60063 preferred values", () => {
  it("E12 series", () => {
    // IEC 60063 E12 series
    expect(E12_MANTISSAS.map((m) => m / 10)).toEqual([1.0, 1.2, 1.5, 1.8, 2.2, 2.7, 3.3, 3.9, 4.7, 5.6, 6.8, 8.2]);
  });
  it("E24 series", () => {
    // IEC 60063 E24 series
    expect(E24_MANTISSAS.map((m) => m / 10)).toEqual([
      1.0, 1.1, 1.2, 1.3, 1.5, 1.6, 1.8, 2.0, 2.2, 2.4, 2.7, 3.0, 3.3, 3.6, 3.9, 4.3, 4.7, 5.1, 5.6, 6.2, 6.8, 7.5, 8.2, 9.1,
    ]);
  });
  it("E12 is every other E24 value", () => {
    // IEC 60063: each series En is every other value of E2n
    expect(E24_MANTISSAS.filter((_, i) => i % 2 === 0)).toEqual(E12_MANTISSAS);
  });
  it("stock range 1 Ω to 10 MΩ, exact decimal values", () => {
    const e12 = seriesValues("E12");
    expect(e12.length).toBe(7 * 12 + 1);
    expect(e12[0]).toBe(1);
    expect(e12[e12.length - 1]).toBe(10_000_000);
    expect(e12).toContain(4.7);
    expect(e12).toContain(4700);
    expect(e12).toContain(5600);
    expect(e12).toContain(820_000);
    expect(seriesValues("E24")).toContain(5100);
    expect(e12).not.toContain(5100);
    for (let i = 1; i < e12.length; i++) expect(e12[i]).toBeGreaterThan(e12[i - 1]);
  });
  it("membership and nearest values", () => {
    expect(isPreferred(4700, "E12")).toBe(true);
    expect(isPreferred(5100, "E12")).toBe(false);
    expect(preferredSeriesOf(5100)).toBe("E24");
    expect(preferredSeriesOf(5600)).toBe("E12");
    expect(preferredSeriesOf(0.47)).toBe("E12");
    expect(preferredSeriesOf(5000)).toBeNull();
    expect(nearestPreferred(5000, "E24")).toEqual([4700, 5100]);
    expect(nearestPreferred(5000, "E12")).toEqual([4700, 5600]);
    expect(nearestPreferred(9500, "E24")).toEqual([9100, 10000]);
    expect(nearestPreferred(9500, "E12")).toEqual([8200, 10000]);
    expect(closestPreferred(5000, "E12")).toBe(4700);
    expect(closestPreferred(5400, "E12")).toBe(5600);
  });
});
