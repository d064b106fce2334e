// Class A (NFPA 72: a pathway that returns to the panel keeps every device reporting after a single open).
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import type { InputType } from "@/lib/catalog/schema";
import { analyzeLoop } from "./analyze-loop";
import { classACircuit } from "./class-a";
import { compileBands, REPORT_BIT } from "./loop-bands";
import { compileLoop, conductorAt, STATE_ACTIVE } from "./loop-model";
import { resistanceBetween } from "./nodal";
import { cableArb } from "./test-support/loop-arbitraries";
import { testAlarmBothSidesInputType, testInputType, testLifeSafetyInputType } from "./test-support/input-types";
import type { LoopSpec } from "./types";

/** A single end-of-line fire input for NO contacts across the pair: a closed contact reads low (active), the
 * end-of-line resistor normal, anything above it trouble (test profile, our own; 5.6 kΩ ± 50 % normal band). */
const fireSingle: InputType = {
  ...testLifeSafetyInputType,
  id: "test-fire-single",
  schemes: ["single-eol"],
  bands: {
    "single-eol": [
      { report: "active", fromOhms: 0, toOhms: 2800 },
      { report: "normal", fromOhms: 2800, toOhms: 8400 },
      { report: "trouble", fromOhms: 8400, toOhms: null },
    ],
  },
};

const loop = (n: number, scheme: "single-eol" | "double-eol" = "single-eol"): LoopSpec => ({
  scheme,
  placement: "at-detector",
  pathway: "class-a",
  detectors: Array.from({ length: n }, (_, i) => ({ label: `Zone ${i + 1} smoke`, contact: "NO" as const, tamper: false, lifeSafety: true })),
  tolerancePct: 5,
  cable: { gauge: { mm2: 0.5 }, lengthM: 120, tempMinC: 0, tempMaxC: 40 },
  contactOhms: 0.05,
});

describe("Class A", () => {
  it("a single end-of-line fire loop with one open still reports every device, each from the side that reaches it", () => {
    const a = analyzeLoop(loop(3), fireSingle);
    expect(a.valid).toBe(true);
    const c = a.classA!;
    // 2 cores × 4 segments
    expect(c.opens).toHaveLength(8);
    for (const o of c.opens) {
      // the line ends at ∞ past the open: trouble, so the panel feeds from both ends
      expect(o.rest.reports).toEqual(["trouble"]);
      expect(o.openReported).toBe(true);
      expect(o.devices.every((d) => d.reported && d.reading.reports.join() === "active")).toBe(true);
    }
    const mid = c.opens.find((o) => o.label === "the blue core open between Zone 2 smoke and Zone 3 smoke")!;
    expect(mid.devices.map((d) => d.side)).toEqual(["out", "out", "return"]);
    expect(c.everyDeviceReported).toBe(true);
    expect(a.findings.some((f) => f.code === "class-a-device-lost")).toBe(false);
  });

  it("an input that reads an open as an alarm reports neither the open nor a device beyond it", () => {
    // testInputType's single end-of-line bands put everything above 8.4 kΩ in "active": an open reads as an alarm
    const a = analyzeLoop(loop(1), testInputType);
    for (const o of a.classA!.opens) {
      expect(o.rest.reports).toEqual(["active"]);
      expect(o.openReported).toBe(false);
      // past the open a side reads ∞ (active) whatever the detector does; the side that reaches it reads a
      // closed contact as a few ohms (short): neither side reports the detector
      expect(o.devices[0].reported).toBe(false);
      expect(o.devices[0].side).toBeNull();
    }
    expect(a.classA!.everyDeviceReported).toBe(false);
    const f = a.findings.find((x) => x.code === "class-a-device-lost")!;
    expect(f.severity).toBe("error");
    expect(f.message).toContain("not as an open or trouble");
  });

  it("an input that reads both sides of normal as an alarm: devices reach the panel, the open does not", () => {
    const c = analyzeLoop(loop(2), testAlarmBothSidesInputType).classA!;
    for (const o of c.opens) {
      expect(o.openReported).toBe(false);
      // each side at rest reads ∞ (active) after the open, so no alarm can be told from the line at rest
      expect(o.devices.every((d) => !d.reported)).toBe(true);
    }
    expect(c.everyDeviceReported).toBe(false);
  });

  it("a device counts as reported only when its side reads active with it active and not with every detector at rest", () => {
    const types = [fireSingle, testInputType, testAlarmBothSidesInputType, testLifeSafetyInputType];
    const arb = fc.record({ n: fc.integer({ min: 1, max: 4 }), t: fc.integer({ min: 0, max: types.length - 1 }), cable: cableArb, double: fc.boolean() });
    fc.assert(
      fc.property(arb, ({ n, t, cable, double }) => {
        const inputType = types[t];
        const scheme = double && inputType.schemes.includes("double-eol") ? "double-eol" : "single-eol";
        const spec = { ...loop(n, scheme), cable };
        const a = analyzeLoop(spec, inputType);
        const m = compileLoop(spec, inputType);
        const cb = compileBands(inputType.bands[scheme]!);
        // nominal values: the side's report at rest and with one detector active, solved here from the network
        const bandMask = (ohms: number) => {
          let i = 0;
          while (i < cb.to.length - 1 && !(ohms < cb.to[i])) i++;
          return cb.masks[i];
        };
        const rPerM = conductorAt(m, (m.tMin + m.tMax) / 2, 1);
        a.classA!.opens.forEach((o, k) => {
          const open = { core: (o.core === "yellow" ? 0 : 1) as 0 | 1, segment: k % (n + 1) };
          for (const d of o.devices) {
            if (!d.reported) continue;
            const st = new Uint8Array(n);
            const rest = resistanceBetween(classACircuit(m, st, rPerM, m.eol, m.alarm, d.side!, open));
            st[d.detector] = STATE_ACTIVE;
            const active = resistanceBetween(classACircuit(m, st, rPerM, m.eol, m.alarm, d.side!, open));
            expect(bandMask(rest) & REPORT_BIT.active).toBe(0);
            expect(bandMask(active)).toBe(REPORT_BIT.active);
          }
          if (o.openReported) expect(o.rest.reports.every((r) => r === "open" || r === "trouble")).toBe(true);
        });
      }),
      { numRuns: 150, seed: 14 },
    );
  });
});
