import { describe, expect, it } from "vitest";
import * as resistorData from "resistor-data";
import { bandsToOhms, colourBands } from "./colour-code";
import { seriesValues } from "./e-series";

describe("IEC 60062 colour code", () => {
  it("worked examples", () => {
    // IEC 60062: 4.7 kΩ 5 % = yellow, violet, red, gold
    expect(colourBands(4700, 5)).toEqual(["yellow", "violet", "red", "gold"]);
    // IEC 60062: 10 kΩ 5 % = brown, black, orange, gold
    expect(colourBands(10_000, 5)).toEqual(["brown", "black", "orange", "gold"]);
    // IEC 60062: 5-band, 1 %: 4.7 kΩ = yellow, violet, black, brown, brown
    expect(colourBands(4700, 1)).toEqual(["yellow", "violet", "black", "brown", "brown"]);
    // IEC 60062: gold and silver multipliers are ×0.1 and ×0.01
    expect(colourBands(4.7, 5)).toEqual(["yellow", "violet", "gold", "gold"]);
    expect(colourBands(0.47, 5)).toEqual(["yellow", "violet", "silver", "gold"]);
    // IEC 60062: 20 % has no tolerance band
    expect(colourBands(5600, 20)).toEqual(["green", "blue", "red"]);
    // IEC 60062: 2 % = red, 10 % = silver
    expect(colourBands(5600, 2)).toEqual(["green", "blue", "black", "brown", "red"]);
    expect(colourBands(5600, 10)).toEqual(["green", "blue", "red", "silver"]);
  });
  it("a third significant figure at 5 % needs five bands; four figures can't be coded", () => {
    // IEC 60062: three significant figures use the 5-band code
    expect(colourBands(4990, 5)).toEqual(["yellow", "white", "white", "brown", "gold"]);
    expect(colourBands(12_345, 5)).toBeNull();
    expect(colourBands(5600, 3)).toBeNull(); // 3 % has no colour
  });
  it("decodes what it encodes, for every E24 value at 5 % and 1 %", () => {
    for (const v of seriesValues("E24", 1, 1e7))
      for (const tol of [5, 1]) {
        const bands = colourBands(v, tol)!;
        expect(bands).toHaveLength(tol === 5 ? 4 : 5);
        const back = bandsToOhms(bands);
        expect(back.tolerancePct).toBe(tol);
        expect(back.ohms).toBeCloseTo(v, 9);
      }
  });
  it("agrees with the resistor-data package on every E24 value from 10 Ω to 10 MΩ", () => {
    // second opinion: npm resistor-data. It parses its own notation with float arithmetic and parseInt
    // ("8m2" → 8 199 999 Ω), so compare only where its notation round-trips to the exact value.
    let checked = 0;
    for (const v of seriesValues("E24", 10, 1e7)) {
      const notation = resistorData.valueToNotation(v);
      if (resistorData.notationToValue(notation) !== v) continue;
      expect(colourBands(v, 5)).toEqual(resistorData.notationToBands([notation, 5], 4));
      expect(colourBands(v, 1)).toEqual(resistorData.notationToBands([notation, 1], 5));
      checked++;
    }
    expect(checked).toBeGreaterThanOrEqual(144); // of 145 values: only 8.2 MΩ trips its parser
  });
});
