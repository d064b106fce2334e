import { describe, expect, it } from "vitest";
import { formatOhms, formatOhmsRange } from "./format-ohms";

describe("formatting ohms", () => {
  it("three significant figures with SI prefixes", () => {
    // SI prefixes k = 10³, M = 10⁶
    expect(formatOhms(5600)).toBe("5.6 kΩ");
    expect(formatOhms(5323.03)).toBe("5.32 kΩ");
    expect(formatOhms(11_200)).toBe("11.2 kΩ");
    expect(formatOhms(820)).toBe("820 Ω");
    expect(formatOhms(999.7)).toBe("1 kΩ");
    expect(formatOhms(1.06)).toBe("1.06 Ω");
    expect(formatOhms(0)).toBe("0 Ω");
    expect(formatOhms(0.004)).toBe("0.0040 Ω");
    expect(formatOhms(4_700_000)).toBe("4.7 MΩ");
    expect(formatOhms(Infinity)).toBe("∞ Ω");
  });
  it("ranges", () => {
    expect(formatOhmsRange(5320, 5880)).toBe("5.32–5.88 kΩ");
    expect(formatOhmsRange(980, 1020)).toBe("980 Ω – 1.02 kΩ");
    expect(formatOhmsRange(5600, Infinity)).toBe("5.6 kΩ – ∞");
    expect(formatOhmsRange(Infinity, Infinity)).toBe("∞ Ω");
  });
});

describe("formatting agrees with toFixed", () => {
  it("on a sweep of values", () => {
    // reference: the mantissa rounded by Number.prototype.toFixed, trailing zeros dropped
    const ref = (x: number) => {
      const s = x >= 100 ? x.toFixed(0) : x >= 10 ? x.toFixed(1) : x.toFixed(2);
      return s.includes(".") ? s.replace(/0+$/, "").replace(/\.$/, "") : s;
    };
    for (let i = 0; i < 20000; i++) {
      const x = 0.01 + i * 0.0497;
      const tie = (y: number) => Math.abs(y - Math.floor(y) - 0.5) < 1e-6;
      if (tie(x * 100) || tie(x * 10) || tie(x)) continue; // exact halves may round either way
      expect(formatOhms(x)).toBe(`${ref(x)} Ω`);
    }
  });
});
