import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { analyzeLoop } from "./analyze-loop";
import { conductorOhmsPerM } from "./cable";
import { readingAt } from "./loop-model";
import { cableArb, gaugeArb, loopArb } from "./test-support/loop-arbitraries";
import { testInputType } from "./test-support/input-types";

describe("loop reading properties", () => {
  it("a reading never decreases as the cable gets longer", () => {
    fc.assert(
      fc.property(loopArb, fc.nat(), fc.double({ min: 0, max: 1, noNaN: true }), fc.double({ min: 0, max: 3000, noNaN: true }), (loop, k, u, extra) => {
        const a = analyzeLoop(loop, testInputType);
        const r = a.rows[k % a.rows.length];
        const tempC = loop.cable.tempMinC + u * (loop.cable.tempMaxC - loop.cable.tempMinC);
        const short = readingAt(loop, r.states, r.fault, { tempC }, testInputType);
        const long = readingAt(loop, r.states, r.fault, { tempC, lengthM: loop.cable.lengthM + extra }, testInputType);
        // a run longer by a fraction of a nanometre may round one ulp lower: allow 1e-12 relative
        expect(long).toBeGreaterThanOrEqual(short * (1 - 1e-12));
      }),
      { numRuns: 300 },
    );
  });

  it("every reading at any part value and temperature inside the ranges lies inside its interval", () => {
    const unit = fc.double({ min: -1, max: 1, noNaN: true });
    fc.assert(
      fc.property(loopArb, fc.nat(), fc.double({ min: 0, max: 1, noNaN: true }), fc.tuple(unit, unit, unit, unit), (loop, k, u, [e, al, sa, sb]) => {
        const a = analyzeLoop(loop, testInputType);
        const r = a.rows[k % a.rows.length];
        const tol = loop.tolerancePct / 100;
        const v = readingAt(
          loop,
          r.states,
          r.fault,
          {
            tempC: loop.cable.tempMinC + u * (loop.cable.tempMaxC - loop.cable.tempMinC),
            eolOhms: loop.eolOhms && loop.eolOhms * (1 + e * tol),
            alarmOhms: loop.alarmOhms && loop.alarmOhms * (1 + al * tol),
            sharedOhms: loop.sharedOhms && [loop.sharedOhms[0] * (1 + sa * tol), loop.sharedOhms[1] * (1 + sb * tol)],
          },
          testInputType,
        );
        const eps = 1e-9 * (Number.isFinite(r.maxOhms) ? r.maxOhms : 0);
        expect(v).toBeGreaterThanOrEqual(r.minOhms - eps);
        expect(v).toBeLessThanOrEqual(r.maxOhms + eps);
        expect(r.nominalOhms!).toBeGreaterThanOrEqual(r.minOhms - eps);
        expect(r.nominalOhms!).toBeLessThanOrEqual(r.maxOhms + eps);
      }),
      { numRuns: 500 },
    );
  });

  it("single series EOL at the detector tells a short from normal while the cable stays inside maxLoopOhms", () => {
    fc.assert(
      fc.property(
        gaugeArb,
        fc.double({ min: 0, max: 1, noNaN: true }),
        cableArb,
        fc.constantFrom(1, 2, 5),
        fc.boolean(),
        fc.double({ min: 0, max: 0.5, noNaN: true }),
        (gauge, u, c, tolerancePct, tamper, contactOhms) => {
          const hot = conductorOhmsPerM(gauge, c.tempMaxC);
          const lengthM = (u * testInputType.maxLoopOhms) / (2 * hot); // conductors within the limit when hottest
          const loop = {
            scheme: "single-eol" as const,
            placement: "at-detector" as const,
            detectors: [{ label: "Door", contact: "NC" as const, tamper, lifeSafety: false }],
            eolOhms: 5600,
            tolerancePct,
            cable: { ...c, gauge, lengthM },
            contactOhms,
          };
          const a = analyzeLoop(loop, testInputType);
          expect(a.rows[0].reports).toEqual(["normal"]);
          for (const r of a.rows) if (r.fault === "short-panel" || r.fault === "short-detector") expect(r.reports).toEqual(["short"]);
          expect(a.faults["short-panel"]).toBe("detected");
          expect(a.faults["short-detector"]).toBe("detected");
          expect(a.indistinguishable.some(([i, j]) => i === 0 || j === 0)).toBe(false);
        },
      ),
      { numRuns: 300 },
    );
  });
});
