// Fault finder: rankings on readings worked out by hand.
import { describe, expect, it } from "vitest";
import { distanceToShort, findFaults, readingFit } from "./fault-finder";
import { testInputType } from "./test-support/input-types";
import type { CableGauge, LoopSpec } from "./types";

const loop = (over: Partial<LoopSpec> = {}, gauge: CableGauge = { awg: 22 }, lengthM = 50): LoopSpec => ({
  scheme: "single-eol",
  placement: "at-detector",
  detectors: [{ label: "Front door", contact: "NC", tamper: false, lifeSafety: false }],
  eolOhms: 5600,
  tolerancePct: 1,
  // one temperature so the arithmetic below is exact; the spread is tested separately
  cable: { gauge, lengthM, tempMinC: 20, tempMaxC: 20 },
  contactOhms: 0,
  ...over,
});

// 22 AWG per ASTM B258: d = 0.127 mm × 92^(14/39) = 0.64380 mm, area 0.32553 mm²;
// copper per IEC 60028: 1/58 Ω·mm²/m → r = 0.017241 / 0.32553 = 0.052963 Ω/m.
const R22 = 0.052963;
// 0.22 mm²: r = 1 / (58 × 0.22) = 0.078370 Ω/m (IEC 60028 copper).
const R022 = 0.07837;

describe("fault finder", () => {
  it("a reading as designed ranks 'as designed' first", () => {
    // 5.6 kΩ + 2 × 50 m × 0.052963 Ω/m = 5600 + 5.296 = 5605.3 Ω; active: open
    const ranked = findFaults(loop(), testInputType, { restOhms: 5605.3, activeOhms: Infinity });
    expect(ranked[0].kind).toBe("as-designed");
    expect(ranked[0].fit).toBeGreaterThan(0.95);
  });

  it("a 4.7 kΩ resistor in place of 5.6 kΩ", () => {
    // 4700 + 5.296 = 4705.3 Ω; 4705.3 / 5605.3 is 16 % low, far outside 1 % parts
    const ranked = findFaults(loop(), testInputType, { restOhms: 4705.3 });
    expect(ranked[0]).toMatchObject({ kind: "wrong-value", label: "A 4.7 kΩ end-of-line resistor fitted instead of 5.6 kΩ" });
    expect(ranked[0].fit).toBeGreaterThan(0.95);
    expect(ranked.find((e) => e.kind === "as-designed")!.fit).toBeLessThan(1e-6);
  });

  it("resistor at the panel: the far-end short still reads the resistor", () => {
    // at rest both wirings read 5600 + 5.296 = 5605.3 Ω; far end shorted: as designed 2 × 50 × 0.052963 = 5.296 Ω,
    // resistor at the panel 5600 + 5.296 = 5605.3 Ω
    const ranked = findFaults(loop(), testInputType, { restOhms: 5605.3, farEndShortedOhms: 5605.3 });
    expect(ranked[0].kind).toBe("resistor-at-panel");
    expect(ranked.find((e) => e.kind === "as-designed")!.fit).toBe(0);
    const designed = findFaults(loop(), testInputType, { restOhms: 5605.3, farEndShortedOhms: 5.3 });
    expect(designed[0].kind).toBe("as-designed");
  });

  it("swapped resistors on a shared input", () => {
    // shared 2.2 kΩ (Hall) / 4.7 kΩ (Office) + 5.6 kΩ line resistor; Hall active as designed: 5600 + 2200 + 5.296 = 7805.3 Ω;
    // swapped: 5600 + 4700 + 5.296 = 10305.3 Ω
    const spec = loop({
      scheme: "shared",
      sharedOhms: [2200, 4700],
      detectors: [
        { label: "Hall", contact: "NC", tamper: false, lifeSafety: false },
        { label: "Office", contact: "NC", tamper: false, lifeSafety: false },
      ],
    });
    const ranked = findFaults(spec, testInputType, { restOhms: 5605.3, activeOhms: 10305.3 });
    expect(ranked[0].kind).toBe("swapped-resistors");
    expect(ranked[0].label).toMatch(/4\.7 kΩ on Hall, 2\.2 kΩ on Office/);
  });

  it("distance to a short on 0.22 mm² cable", () => {
    // short 20 m out on a 50 m run: x = 2 × 20 × 0.078370 = 3.1348 Ω, in parallel with the rest of the loop
    // 2 × 30 × 0.078370 + 5600 = 5604.70 Ω → the panel reads 3.1348 × 5604.70 / 5607.84 = 3.1330 Ω.
    // First order: d = R / (2 r) = 3.1330 / 0.15674 = 19.99 m; with the parallel path: 20.00 m.
    const ranked = findFaults(loop({}, { mm2: 0.22 }), testInputType, { restOhms: 3.133, activeOhms: 3.133 });
    expect(ranked[0].kind).toBe("short-at-distance");
    expect(ranked[0].distance!.metres).toBeCloseTo(20.0, 1);
    expect(3.133 / (2 * R022)).toBeCloseTo(19.99, 2);
    expect(ranked[0].label).toBe("A short across the pair about 20 m from the panel");
  });

  it("distance to a short on 22 AWG cable, with its spread over 0–40 °C and 5 % parts", () => {
    // short 35 m out: x = 2 × 35 × 0.052963 = 3.7074 Ω ∥ (2 × 15 × 0.052963 + 5600 = 5601.59 Ω) = 3.7050 Ω.
    const spec = loop({ tolerancePct: 5 }, { awg: 22 });
    const ranked = findFaults(spec, testInputType, { restOhms: 3.705 });
    expect(ranked[0].kind).toBe("short-at-distance");
    expect(ranked[0].distance!.metres).toBeCloseTo(35.0, 1);
    expect(distanceToShort(3.705, R22, 50, 5600)).toBeCloseTo(35.0, 1);
    expect(distanceToShort(3.705, R22, 50, Infinity)).toBeCloseTo(3.705 / (2 * R22), 9); // d = R / (2 r) exactly
    // 0–40 °C: r × (1 ∓ 0.00393 × 20) = r × 0.9214 … 1.0786 → d from 35.0 / 1.0786 = 32.45 m to 35.0 / 0.9214 = 37.99 m
    const wide = findFaults({ ...spec, cable: { ...spec.cable, tempMinC: 0, tempMaxC: 40 } }, testInputType, { restOhms: 3.705 })[0];
    expect(wide.distance!.minM).toBeCloseTo(32.45, 1);
    expect(wide.distance!.maxM).toBeCloseTo(37.99, 1);
  });

  it("an open loop at rest and with the far end shorted is a conductor open", () => {
    const ranked = findFaults(loop(), testInputType, { restOhms: Infinity, farEndShortedOhms: 2e7 });
    expect(ranked[0].kind).toBe("open-at-distance");
    expect(ranked[0].fit).toBe(1);
    expect(ranked.find((e) => e.kind === "as-designed")!.fit).toBe(0);
  });

  it("no readings, no ranking; the fit is 1 on the value and falls off outside the interval", () => {
    expect(findFaults(loop(), testInputType, {})).toEqual([]);
    const p = { nominalOhms: 1000, minOhms: 990, maxOhms: 1010 };
    expect(readingFit(1000, p)).toBeCloseTo(1, 3);
    expect(readingFit(1010, p)).toBeCloseTo(Math.exp(-0.5), 2); // at the interval's edge
    expect(readingFit(1100, p)).toBeLessThan(1e-6);
  });
});
