import { describe, expect, it } from "vitest";
import { analyzeLoop, conductorFaultReading } from "@/lib/loop";
import { shippedCatalog } from "@/lib/catalog/shipped";
import { settingsFor, toLoopSpec } from "@/components/loop-bench/bench-state";
import { conductorFaultOf, toggleCore, withKind, type ConductorChoice } from "@/components/loop-bench/conductor-choice";

const t = shippedCatalog().catalog.inputTypes.find((x) => x.id === "input-2k2")!;

describe("the loop bench's conductor fault", () => {
  it("a short keeps the last two cores picked; an open or an earth fault keeps one", () => {
    let c: ConductorChoice = withKind(null, "short")!;
    for (const colour of ["yellow", "green", "white"] as const) c = toggleCore(c, colour);
    expect(c.cores).toEqual(["green", "white"]);
    expect(toggleCore(c, "green").cores).toEqual(["white"]);
    expect(withKind(c, "open")!.cores).toEqual(["white"]);
    expect(toggleCore(withKind(c, "earth")!, "blue").cores).toEqual(["blue"]);
    expect(withKind(c, "none")).toBeNull();
  });

  it("becomes the engine's fault only with its cores in the loop's cable, at the chosen point", () => {
    const s = { ...settingsFor(t), placement: "loop-back" as const, lengthM: 60 };
    const choice: ConductorChoice = { kind: "short", cores: ["yellow", "green"], position: "middle" };
    expect(conductorFaultOf(choice, toLoopSpec(s))).toEqual({ kind: "short", cores: ["yellow", "green"], atM: 30 });
    // a two-core cable has no green core: nothing to inject yet
    expect(conductorFaultOf(choice, toLoopSpec({ ...s, placement: "at-detector" }))).toBeNull();
    expect(conductorFaultOf({ ...choice, cores: ["yellow"] }, toLoopSpec(s))).toBeNull();
    expect(toLoopSpec({ ...s, conductor: choice }).conductorFaults).toEqual([{ kind: "short", cores: ["yellow", "green"], atM: 30 }]);
  });

  it("a mix of states the analysis doesn't list is worked out the same way as the listed rows", () => {
    const s = { ...settingsFor(t), placement: "loop-back" as const, detectorCount: 2, conductor: { kind: "open" as const, cores: ["green" as const], position: "panel" as const } };
    const loop = toLoopSpec(s);
    const a = analyzeLoop(loop, t);
    const f = a.conductors!.faults[0];
    for (const r of f.rows) {
      const again = conductorFaultReading(loop, t, f.fault, r.states);
      expect([again.minOhms, again.maxOhms, again.reports]).toEqual([r.minOhms, r.maxOhms, r.reports]);
    }
  });

  it("the six-core cable is chosen only where the loop can carry it, and its supply cores can be faulted", () => {
    const s = { ...settingsFor(t), tamper: true, cable: "six-core-alarm-tamper" as const, lengthM: 25 };
    const loop = toLoopSpec({ ...s, conductor: { kind: "open", cores: ["red"], position: "detector" } });
    expect(loop.cores).toBe("six-core-alarm-tamper");
    expect(loop.conductorFaults).toEqual([{ kind: "open", core: "red", atM: 25 }]);
    const a = analyzeLoop(loop, t);
    expect(a.valid).toBe(true);
    expect(a.conductors!.faults[0].label).toBe("the red core open at the detector end, cutting the detectors' supply");
    // without tamper contacts, or with the resistor elsewhere, the bench falls back to the pair the placement needs
    expect(toLoopSpec({ ...s, tamper: false }).cores).toBeUndefined();
    expect(toLoopSpec({ ...s, placement: "at-panel" }).cores).toBeUndefined();
  });
});
