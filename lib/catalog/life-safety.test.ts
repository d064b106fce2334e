import { describe, expect, it } from "vitest";
import { shippedCatalog } from "@/lib/catalog/shipped";
import { isLifeSafety, isLifeSafetyEntry } from "@/lib/catalog/life-safety";

const { catalog } = shippedCatalog();

describe("the life-safety rule", () => {
  it("holds for a detector marked life-safety and for any smoke or heat detector, marked or not", () => {
    expect(isLifeSafety({ lifeSafety: true, category: "water" })).toBe(true);
    expect(isLifeSafety({ lifeSafety: false, category: "smoke" })).toBe(true);
    expect(isLifeSafety({ lifeSafety: false, category: "heat" })).toBe(true);
    expect(isLifeSafety({ lifeSafety: false, category: "door-contact" })).toBe(false);
  });
  it("marks the shipped catalog's fire devices, the fire input type and the hardware with fire inputs, and nothing else", () => {
    const fireTypes = new Set(catalog.inputTypes.filter((t) => t.lifeSafety).map((t) => t.id));
    expect(fireTypes.size).toBeGreaterThan(0);
    for (const d of catalog.detectors) expect(isLifeSafetyEntry(catalog, "detectors", d), d.id).toBe(isLifeSafety(d));
    expect(catalog.detectors.some((d) => isLifeSafetyEntry(catalog, "detectors", d))).toBe(true);
    for (const t of catalog.inputTypes) expect(isLifeSafetyEntry(catalog, "inputTypes", t), t.id).toBe(t.lifeSafety);
    for (const p of catalog.panels) expect(isLifeSafetyEntry(catalog, "panels", p), p.id).toBe(fireTypes.has(p.onboardInputs.inputType));
    for (const b of catalog.expansionBoards) expect(isLifeSafetyEntry(catalog, "expansionBoards", b), b.id).toBe(!!b.inputs && fireTypes.has(b.inputs.inputType));
    expect(catalog.expansionBoards.some((b) => isLifeSafetyEntry(catalog, "expansionBoards", b))).toBe(true);
    for (const s of catalog.powerSupplies) expect(isLifeSafetyEntry(catalog, "powerSupplies", s)).toBe(false);
  });
});
