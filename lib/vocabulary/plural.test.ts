import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { plural, pluralWord } from "./plural";

describe("plural", () => {
  it("agrees with the count", () => {
    expect(plural(0, "input")).toBe("0 inputs");
    expect(plural(1, "input")).toBe("1 input");
    expect(plural(2, "input")).toBe("2 inputs");
    expect(plural(1, "battery", "batteries")).toBe("1 battery");
    expect(plural(4, "battery", "batteries")).toBe("4 batteries");
    expect(pluralWord(1, "is", "are")).toBe("is");
    expect(pluralWord(7, "is", "are")).toBe("are");
  });
  it("uses the singular for exactly one and the plural for every other whole count", () => {
    fc.assert(
      fc.property(fc.nat(100_000), (n) => {
        expect(plural(n, "board")).toBe(n === 1 ? "1 board" : `${n} boards`);
      }),
    );
  });
});
