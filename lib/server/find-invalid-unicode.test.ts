import { describe, expect, it } from "vitest";
import { findInvalidUnicode } from "./route";

describe("findInvalidUnicode", () => {
  it("names the first string or key holding a lone surrogate", () => {
    expect(findInvalidUnicode({ name: "ok", areas: [{ rooms: ["Hall", "x\ud800"] }] })).toBe("areas.0.rooms.1");
    expect(findInvalidUnicode({ a: { ["k\udfff"]: 1 } })).toBe("a.k\udfff");
    expect(findInvalidUnicode("\ud83d")).toBe("(body)");
  });
  it("accepts well-formed text, surrogate pairs included", () => {
    expect(findInvalidUnicode({ name: "Depot \u{1F525}", n: 1, b: null, list: ["é", "東"] })).toBeNull();
  });
  it("walks 200,000 levels of nesting without overflowing the stack", () => {
    let deep: unknown = "end\ud800";
    for (let i = 0; i < 200_000; i++) deep = [deep];
    expect(findInvalidUnicode(deep)).toMatch(/^(0\.){199999}0$/);
    expect(findInvalidUnicode(JSON.parse("[".repeat(200_000) + "]".repeat(200_000)))).toBeNull();
  });
});
