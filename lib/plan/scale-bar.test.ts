import { describe, expect, it } from "vitest";
import { scaleBar } from "./scale-bar";

describe("scale bar", () => {
  it("picks the largest round length that fits the wanted width", () => {
    // 0.02 m/px × 200 px = 4 m at most: 2 m, drawn 2 / 0.02 = 100 px
    expect(scaleBar(0.02, "metric")).toEqual({ px: 100, length: 2, unit: "m" });
    // 0.05 m/px × 200 px = 10 m: exactly 10 m, 200 px
    expect(scaleBar(0.05, "metric")).toEqual({ px: 200, length: 10, unit: "m" });
  });
  it("in feet for an imperial organisation", () => {
    // 0.03048 m/px × 200 px = 6.096 m = 20 ft: 20 ft = 6.096 m, drawn 200 px (1 ft = 0.3048 m)
    const b = scaleBar(0.03048, "imperial")!;
    expect(b.length).toBe(20);
    expect(b.px).toBeCloseTo(200, 9);
  });
  it("none without a scale", () => {
    expect(scaleBar(0, "metric")).toBeNull();
  });
});
