import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { fieldToMetres, lengthCell, lengthUnit, metresToTyped, typedToMetres } from "./length-input";

describe("lengths typed in the organisation's unit, stored in metres", () => {
  it("converts feet with the exact international foot", () => {
    // NIST Handbook 44, Appendix C: 1 ft = 0.3048 m exactly
    expect(typedToMetres(1, "imperial")).toBe(0.3048);
    expect(typedToMetres(100, "imperial")).toBe(30.48);
    expect(typedToMetres(1000, "imperial")).toBe(304.8);
    expect(metresToTyped(30.48, "imperial")).toBe(100);
    // 14 m / 0.3048 = 45.931… ft, shown to the hundredth (arithmetic)
    expect(metresToTyped(14, "imperial")).toBe(45.93);
  });

  it("leaves metres as typed", () => {
    expect(typedToMetres(18.5, "metric")).toBe(18.5);
    expect(metresToTyped(18.5, "metric")).toBe(18.5);
    expect(lengthUnit("metric")).toBe("m");
    expect(lengthUnit("imperial")).toBe("ft");
  });

  it("keeps the stored metres when a field in feet is saved as it was shown, and converts a changed one", () => {
    expect(fieldToMetres("45.93", "imperial", 14)).toBe(14);
    expect(fieldToMetres("46", "imperial", 14)).toBe(typedToMetres(46, "imperial"));
    expect(fieldToMetres("100", "imperial")).toBe(30.48);
    // blank and non-numbers go on as text, so the schema gives its own message beside the field
    expect(fieldToMetres("", "imperial")).toBe("");
    expect(fieldToMetres("ten", "imperial")).toBe("ten");
    expect(fieldToMetres("12.5", "metric", 7)).toBe(12.5);
  });

  it("writes table cells in the unit", () => {
    expect(lengthCell(18.5, "metric")).toBe("18.5 m");
    expect(lengthCell(30.48, "imperial")).toBe("100 ft");
    expect(lengthCell(14, "imperial")).toBe("45.9 ft");
  });

  it("comes back within the shown precision for any length a schedule allows, and exactly for a field left alone", () => {
    fc.assert(
      fc.property(fc.double({ min: 0.01, max: 2000, noNaN: true }), (m) => {
        const shown = metresToTyped(m, "imperial");
        // a hundredth of a foot is 3.048 mm; half of it is the most the round trip may move
        expect(Math.abs(typedToMetres(shown, "imperial") - m)).toBeLessThanOrEqual(0.001524 + 1e-6);
        expect(fieldToMetres(String(shown), "imperial", m)).toBe(m);
      }),
    );
  });
});
