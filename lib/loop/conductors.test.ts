import { describe, expect, it } from "vitest";
import { analyzeLoop } from "./analyze-loop";
import { readingAt } from "./loop-model";
import { loopSpecSchema } from "./loop-schema";
import { conductorReading, enumerateConductorFaults } from "./conductors";
import { conductorOhms } from "./cable";
import { compileLoop } from "./loop-model";
import { testInputType, testLifeSafetyInputType } from "./test-support/input-types";
import type { ConductorFault, LoopSpec } from "./types";

const base: LoopSpec = {
  scheme: "single-eol",
  placement: "at-detector",
  detectors: [{ label: "Front door", contact: "NC", tamper: false, lifeSafety: false }],
  tolerancePct: 5,
  cable: { gauge: { mm2: 0.22 }, lengthM: 40, tempMinC: 10, tempMaxC: 40 },
  contactOhms: 0.05,
};

describe("conductor faults", () => {
  it("a short across the contact alone on a single end-of-line loop with the resistor at the detector is a defeat", () => {
    const a = analyzeLoop({ ...base, conductorFaults: [{ kind: "part-short", part: "contact", detector: 0 }] }, testInputType);
    const f = a.conductors!.faults[0];
    expect(f.label).toBe("a short across Front door's contact alone");
    // 5.6 kΩ + two 40 m cores of 0.22 mm² (a few ohms) stays in the normal band, door open or shut
    expect(f.rows.map((r) => r.reports)).toEqual([["normal"], ["normal"]]);
    expect(f.verdict).toBe("defeat");
    expect(a.findings.some((x) => x.code === "conductor-defeat" && x.message.includes("Front door active"))).toBe(true);
  });

  it("a short across the resistor alone reads as a short at rest; the opened contact still reads active", () => {
    const a = analyzeLoop({ ...base, conductorFaults: [{ kind: "part-short", part: "eol" }] }, testInputType);
    expect(a.conductors!.faults[0].rows.map((r) => r.reports)).toEqual([["short"], ["active"]]);
    // as with the input-pair faults, a short row read as anything but short or trouble is "mistaken"
    expect(a.conductors!.faults[0].verdict).toBe("mistaken");
  });

  it("without a fault the separate cores give the lumped model's readings", () => {
    for (const placement of ["at-detector", "at-panel", "loop-back"] as const)
      for (const scheme of ["single-eol", "double-eol", "shared"] as const)
        for (const contact of ["NC", "NO"] as const) {
          const n = scheme === "shared" ? 2 : 1;
          const loop: LoopSpec = { ...base, scheme, placement, detectors: Array.from({ length: n }, (_, i) => ({ label: `D${i}`, contact, tamper: true, lifeSafety: false })) };
          const m = compileLoop(loop, testInputType);
          const st = new Uint8Array(n).fill(1);
          const lumped = readingAt(loop, new Array(n).fill("active"), "none", { tempC: 25 }, testInputType);
          const cores = placement === "loop-back" ? "four-core-loop-back" : "two-core";
          const got = conductorReading(m, cores, st, 25, 1, null);
          if (lumped === Infinity) expect(got).toBe(Infinity);
          else expect(Math.abs(got - lumped)).toBeLessThan(1e-9 * lumped);
        }
  });

  it("shorts at the ends of the input pair read as the input-pair faults", () => {
    const loop: LoopSpec = { ...base, placement: "loop-back" };
    const m = compileLoop(loop, testInputType);
    const st = new Uint8Array(1);
    const at = (atM: number) => conductorReading(m, "four-core-loop-back", st, 25, 1, { kind: "short", cores: ["yellow", "blue"], atM });
    const close = (x: number, y: number) => expect(Math.abs(x - y)).toBeLessThanOrEqual(1e-9 * Math.max(1, y));
    close(at(0), readingAt(loop, ["rest"], "short-panel", { tempC: 25 }, testInputType));
    close(at(40), readingAt(loop, ["rest"], "short-detector", { tempC: 25 }, testInputType));
  });

  it("a four-core loop-back: yellow–green at the detector end bypasses the contact alone (defeat), green–white bypasses the resistor", () => {
    const a = analyzeLoop({ ...base, placement: "loop-back", conductorFaults: "all" }, testInputType);
    const find = (label: string) => a.conductors!.faults.find((f) => f.label === label)!;
    expect(a.conductors!.colours).toEqual(["yellow", "blue", "green", "white"]);
    expect(find("a short between the yellow and green cores at the detector end").verdict).toBe("defeat");
    expect(find("a short between the green and white cores at the detector end").rows[0].reports).toEqual(["short"]);
    // white and blue are joined at the detector: touching there changes nothing
    expect(find("a short between the blue and white cores at the detector end").verdict).toBe("no-effect");
    expect(find("the green core open 20 m from the panel").rows[0].reports).toEqual(["active"]);
    expect(find("the yellow core to earth at the panel end").verdict).toBe("not-supervised");
    // 6 pairs × 3 points, 4 cores open × 3, 4 cores to earth × 3, the contact and the resistor
    expect(a.conductors!.faults).toHaveLength(18 + 12 + 12 + 2);
  });

  it("an input that watches earth reports a core to earth", () => {
    const a = analyzeLoop({ ...base, conductorFaults: [{ kind: "earth", core: "blue", atM: 10 }] }, { ...testInputType, earthFaultMonitor: true });
    expect(a.conductors!.faults[0].verdict).toBe("detected");
  });

  it("an alarm and tamper cable: a short across the tamper pair at the detector hides the tamper", () => {
    const loop: LoopSpec = { ...base, cores: "four-core-alarm-tamper", detectors: [{ label: "Hall", contact: "NC", tamper: true, lifeSafety: false }], conductorFaults: [{ kind: "short", cores: ["green", "white"], atM: 40 }] };
    const f = analyzeLoop(loop, testInputType).conductors!.faults[0];
    const tamperRow = f.rows.find((r) => r.states[0] === "tamper")!;
    expect(tamperRow.reports).toEqual(["normal"]);
    expect(f.verdict).toBe("defeat");
  });

  it("enumerates two-core faults at three points", () => {
    const faults = enumerateConductorFaults(base);
    expect(faults.filter((f) => f.kind === "short")).toHaveLength(3);
    expect(faults.filter((f) => f.kind === "open")).toHaveLength(6);
  });

  it("an open core is never taken for an unchanged reading", () => {
    const a = analyzeLoop({ ...base, conductorFaults: [{ kind: "open", core: "blue", atM: 20 }] }, testInputType);
    // ∞ in every state; on this input the band above normal is an alarm, so the open is reported, as something else
    expect(a.conductors!.faults[0].rows.map((r) => r.maxOhms)).toEqual([Infinity, Infinity]);
    expect(a.conductors!.faults[0].verdict).toBe("mistaken");
  });

  describe("six-core cable: alarm, tamper and supply pairs", () => {
    const six: LoopSpec = { ...base, scheme: "double-eol", cores: "six-core-alarm-tamper", detectors: [{ label: "Hall", contact: "NC", tamper: true, lifeSafety: false }] };
    const fault = (f: NonNullable<LoopSpec["conductorFaults"]>, loop = six) => analyzeLoop({ ...loop, conductorFaults: f }, testInputType).conductors!.faults;

    it("enumerates every pair of its six cores, each core open and to earth, at three points", () => {
      const faults = enumerateConductorFaults(six);
      // 6 cores: 15 pairs × 3 positions; 6 × 3 opens; 6 × 3 earth faults
      expect(faults.filter((f) => f.kind === "short")).toHaveLength(45);
      expect(faults.filter((f) => f.kind === "open")).toHaveLength(18);
      expect(faults.filter((f) => f.kind === "earth")).toHaveLength(18);
      const a = analyzeLoop({ ...six, conductorFaults: "all" }, testInputType);
      expect(a.valid).toBe(true);
      expect(a.conductors!.colours).toEqual(["yellow", "blue", "green", "white", "red", "black"]);
      expect(a.conductors!.faults.every((f) => f.rows.length === 3)).toBe(true);
    });

    it("the supply cut drops the relay to its alarm position: every row without a tamper reads R + Ra through four cores", () => {
      for (const f of [{ kind: "open", core: "red", atM: 40 }, { kind: "open", core: "black", atM: 0 }, { kind: "short", cores: ["red", "black"], atM: 20 }] satisfies ConductorFault[]) {
        const [r] = fault([f]);
        expect(r.label).toMatch(/cutting the detectors' supply$/);
        // nominal: R 5.6 kΩ + Ra 5.6 kΩ (contact open) + 4 cores of 40 m 0.22 mm² at 25 °C + the closed tamper contact
        const rc = conductorOhms({ mm2: 0.22 }, 40, 25); // IEC 60028: 1/58 Ω·mm²/m at 20 °C, α = 0.00393/°C
        expect(r.rows[0].nominalOhms).toBeCloseTo(5600 + 5600 + 4 * rc + 0.05, 6);
        expect(r.rows.map((x) => x.reports)).toEqual([["active"], ["active"], ["open"]]);
        // reported, but as an alarm rather than a fault
        expect(r.verdict).toBe("mistaken");
      }
    });

    it("a short from the alarm pair's return to the supply's 0 V bypasses the tamper pair: a defeat", () => {
      const [r] = fault([{ kind: "short", cores: ["blue", "black"], atM: 40 }]);
      expect(r.rows.find((x) => x.states[0] === "tamper")!.reports).toEqual(["normal"]);
      expect(r.verdict).toBe("defeat");
    });

    it("a short from the feeding core to either supply core reads as a short", () => {
      for (const other of ["red", "black"] as const) expect(fault([{ kind: "short", cores: ["yellow", other], atM: 40 }])[0].verdict).toBe("detected");
    });

    it("a supply core to earth is watched only where the input watches earth", () => {
      expect(fault([{ kind: "earth", core: "red", atM: 20 }])[0].verdict).toBe("not-supervised");
      expect(analyzeLoop({ ...six, conductorFaults: [{ kind: "earth", core: "red", atM: 20 }] }, { ...testInputType, earthFaultMonitor: true }).conductors!.faults[0].verdict).toBe("detected");
    });

    it("needs the resistor at the detector and a tamper contact; the request schema takes it", () => {
      const a = analyzeLoop({ ...six, detectors: [{ ...six.detectors[0], tamper: false }] }, testInputType);
      expect(a.valid).toBe(false);
      expect(a.findings[0].message).toContain("a six-core, alarm, tamper and supply pairs cable needs at least one detector with a tamper contact");
      expect(loopSpecSchema.safeParse({ ...six, conductorFaults: [{ kind: "short", cores: ["red", "yellow"], atM: 0 }] }).success).toBe(true);
    });
  });

  it("the schema names unknown cores and impossible positions", () => {
    const r = loopSpecSchema.safeParse({ ...base, conductorFaults: [{ kind: "short", cores: ["yellow", "green"], atM: 5 }, { kind: "open", core: "blue", atM: 99 }, { kind: "open", core: "purple", atM: 1 }] });
    expect(r.success).toBe(false);
    const msgs = r.error!.issues.map((i) => `${i.path.join(".")}: ${i.message}`);
    expect(msgs).toContain("conductorFaults.2.core: a core is yellow, blue, green, white, red or black");
    // the shape check stops at the unknown colour; a known colour not in this cable is named with the cable's cores
    const r2 = loopSpecSchema.safeParse({ ...base, conductorFaults: [{ kind: "short", cores: ["yellow", "green"], atM: 5 }, { kind: "open", core: "blue", atM: 99 }] });
    const m2 = r2.error!.issues.map((i) => `${i.path.join(".")}: ${i.message}`);
    expect(m2).toContain("conductorFaults.0.cores.1: there is no green core in a two-core cable (its cores: yellow, blue)");
    expect(m2).toContain("conductorFaults.1.atM: the fault's position must be from 0 m (panel end) to 40 m (detector end), got 99");
  });
});

describe("Class A", () => {
  const fire = {
    ...testLifeSafetyInputType,
    // laid out for NO contacts on double end-of-line: rest 11.2 kΩ, active 5.6 kΩ (test profile, our own)
    bands: {
      "double-eol": [
        { report: "short" as const, fromOhms: 0, toOhms: 2800 },
        { report: "active" as const, fromOhms: 2800, toOhms: 8400 },
        { report: "normal" as const, fromOhms: 8400, toOhms: 16800 },
        { report: "open" as const, fromOhms: 16800, toOhms: null },
      ],
    },
  };
  const loop: LoopSpec = {
    ...base,
    scheme: "double-eol",
    pathway: "class-a",
    detectors: ["Hall", "Stair", "Loft"].map((label) => ({ label, contact: "NO" as const, tamper: false, lifeSafety: true })),
  };

  it("a Class A fire loop with one open still reports every device", () => {
    const a = analyzeLoop(loop, fire);
    expect(a.valid).toBe(true);
    const c = a.classA!;
    // two cores × four segments (panel–Hall, Hall–Stair, Stair–Loft, Loft–return)
    expect(c.opens).toHaveLength(8);
    for (const o of c.opens) {
      expect(o.rest.reports).toEqual(["open"]);
      expect(o.devices.every((d) => d.reported && d.reading.reports[0] === "active")).toBe(true);
    }
    const cut = c.opens.find((o) => o.label === "the yellow core open between Hall and Stair")!;
    expect(cut.devices.map((d) => d.side)).toEqual(["out", "return", "return"]);
    expect(c.everyDeviceReported).toBe(true);
    expect(a.findings.some((f) => f.code === "class-a-device-lost")).toBe(false);
  });

  it("on a single end-of-line input a closed contact reads as a short from either end: not Class A", () => {
    const a = analyzeLoop({ ...loop, scheme: "single-eol" }, testLifeSafetyInputType);
    expect(a.classA!.everyDeviceReported).toBe(false);
    expect(a.findings.find((f) => f.code === "class-a-device-lost")?.severity).toBe("error");
  });

  it("refuses NC contacts on a Class A loop", () => {
    const a = analyzeLoop({ ...loop, detectors: [{ label: "Hall", contact: "NC", tamper: false, lifeSafety: true }] }, fire);
    expect(a.valid).toBe(false);
  });
});
