import { describe, expect, it } from "vitest";
import { fieldLabel, withFieldLabel } from "./field-labels";

describe("field labels", () => {
  it("names a field by its label, list positions counted from 1", () => {
    expect(fieldLabel("loop.cable.lengthM")).toBe("cable length");
    expect(fieldLabel(["detectors", 1, "contact"])).toBe("detector 2's contact");
    expect(fieldLabel("conductorFaults.0.atM")).toBe("position of conductor fault 1");
    expect(fieldLabel("document.boards.0.catalogId")).toBeNull();
  });
  it("puts the label before a message that does not already start with it, and never shows a path", () => {
    expect(withFieldLabel("loop.cable.lengthM", "cable length can't be negative (-5 m)")).toBe("cable length can't be negative (-5 m)");
    expect(withFieldLabel(["tolerancePct"], "must be more than 0 %")).toBe("Part tolerance: must be more than 0 %");
    expect(withFieldLabel("document.boards.0.catalogId", "not in the catalog")).toBe("not in the catalog");
  });
});
