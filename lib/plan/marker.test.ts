import { describe, expect, it } from "vitest";
import type { Finding } from "@/lib/findings";
import { markerOf, markerStates } from "./marker";

const finding = (severity: Finding["severity"], target: Finding["target"]): Finding => ({ code: "sample", severity, message: "m", why: "w", target });

describe("detector markers on a plan", () => {
  const layout = {
    zones: [
      { number: 1, detectorId: "10" },
      { number: 2, detectorId: "11" },
    ],
    inputs: [
      { boardKey: "panel", input: 1, detectorIds: ["10"] },
      { boardKey: "panel", input: 2, detectorIds: ["11"] },
    ],
    findings: [finding("warning", { kind: "input", boardKey: "panel", input: 2 }), finding("error", { kind: "detector", detectorId: "11" }), finding("note", { kind: "detector", detectorId: "10" }), finding("error", { kind: "layout" })],
  };
  it("gives each detector its zone, and counts the errors and warnings aimed at it or its input (notes do not count)", () => {
    const s = markerStates(["10", "11", "12"], layout);
    expect(s.get("10")).toEqual({ kind: "assigned", zone: 1 });
    expect(s.get("11")).toEqual({ kind: "findings", zone: 2, errors: 1, warnings: 1 });
    expect(s.get("12")).toEqual({ kind: "unassigned" });
  });
  it("without a layout every detector is on no input", () => {
    expect([...markerStates(["1", "2"], null).values()]).toEqual([{ kind: "unassigned" }, { kind: "unassigned" }]);
  });
  it("tells the states apart by shape and by text, not colour", () => {
    expect(markerOf("Front door", { kind: "unassigned" })).toEqual({ shape: "circle", text: "–", description: "Front door: on no input yet" });
    expect(markerOf("Front door", { kind: "assigned", zone: 7 })).toEqual({ shape: "square", text: "7", description: "Front door: zone 7" });
    expect(markerOf("Hall motion", { kind: "findings", zone: 2, errors: 1, warnings: 2 })).toEqual({ shape: "triangle", text: "2!", description: "Hall motion: zone 2, 1 error and 2 warnings" });
    const shapes = new Set([markerOf("a", { kind: "unassigned" }), markerOf("a", { kind: "assigned", zone: 1 }), markerOf("a", { kind: "findings", zone: 1, errors: 1, warnings: 0 })].map((m) => m.shape));
    expect(shapes.size).toBe(3);
  });
});
