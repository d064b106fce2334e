import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { seriesValues } from "@/lib/resistors/e-series";
import { formatOhms } from "@/lib/resistors/format-ohms";
import { letterCode, ohmsText, parseOhms } from "@/lib/resistors/parse-ohms";

describe("parseOhms", () => {
  it("reads plain figures, SI prefixes and the IEC 60062 letter code", () => {
    // IEC 60062 letter and digit code: R, K, M stand for the decimal point and the multiplier
    const cases: [string, number][] = [
      ["4700", 4700],
      ["4700 Ω", 4700],
      ["4.7k", 4700],
      ["4.7 kΩ", 4700],
      ["4,7k", 4700],
      ["4k7", 4700],
      ["4K7", 4700],
      ["470R", 470],
      ["0R47", 0.47],
      ["1M2", 1_200_000],
      ["2.2M", 2_200_000],
      ["5k6 ohms", 5600],
      [".5k", 500],
    ];
    for (const [text, ohms] of cases) expect(parseOhms(text), text).toBe(ohms);
  });
  it("refuses what is not a positive resistance", () => {
    for (const text of ["", "  ", "0", "-5", "abc", "4k7k", "1e3", "5 V", "k"]) expect(parseOhms(text), text).toBeNull();
  });
  it("writes values back so they read the same", () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 9_999_999 }), (ohms) => {
        expect(parseOhms(ohmsText(ohms))).toBeCloseTo(ohms, 6);
      }),
    );
  });
  it("reads 0 Ω only when asked to (a meter across a short), never a negative or an overflow", () => {
    expect(parseOhms("0")).toBeNull();
    expect(parseOhms("0", { allowZero: true })).toBe(0);
    expect(parseOhms("0R0", { allowZero: true })).toBe(0);
    expect(parseOhms("-5", { allowZero: true })).toBeNull();
    expect(parseOhms(`${"9".repeat(400)}M`)).toBeNull();
  });
  it("writes the letter code as resistor bodies and drawings print it", () => {
    // IEC 60062 letter code: the multiplier letter stands for the decimal point
    expect([4700, 470, 1e6, 2.2, 0.47, 1.2e6, 10_000].map(letterCode)).toEqual(["4k7", "470R", "1M", "2R2", "0R47", "1M2", "10k"]);
  });
  it("reads back every E12 and E24 value from 1 Ω to 10 MΩ however it is written", () => {
    // IEC 60063 E24 series (E12 is its every other value), the stock range 1 Ω – 10 MΩ
    for (const series of ["E12", "E24"] as const) {
      const values = seriesValues(series);
      expect(values.length).toBe(series === "E12" ? 12 * 7 + 1 : 24 * 7 + 1);
      for (const ohms of values) for (const format of [ohmsText, letterCode, formatOhms]) expect(parseOhms(format(ohms)), format(ohms)).toBe(ohms);
      // as people type it: any letter case, spaces around the unit, a decimal comma
      const typed = fc.tuple(fc.constantFrom(...values), fc.constantFrom(ohmsText, letterCode, formatOhms), fc.boolean(), fc.boolean(), fc.boolean());
      fc.assert(
        fc.property(typed, ([ohms, format, upper, spaced, comma]) => {
          let text = format(ohms);
          text = upper ? text.toUpperCase() : text.toLowerCase();
          if (spaced) text = ` ${text.replace(/(\d)([^\d.,])/, "$1 $2")} `;
          if (comma) text = text.replace(".", ",");
          expect(parseOhms(text), JSON.stringify(text)).toBe(ohms);
        }),
        { numRuns: 500 },
      );
    }
  });
});
