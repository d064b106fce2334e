// fast-check generators for loop descriptions (tests and bench only).
import fc from "fast-check";
import { E24_MANTISSAS } from "@/lib/resistors/e-series";
import type { LoopDetector, LoopSpec } from "../types";

const detector = (contact: fc.Arbitrary<"NC" | "NO">) =>
  fc.record({ label: fc.constantFrom("Front door", "Hall", "Office", "Store"), contact, tamper: fc.boolean(), lifeSafety: fc.constant(false) }) as fc.Arbitrary<LoopDetector>;

const e24Ohms = (minDecade: number, maxDecade: number) =>
  fc.tuple(fc.constantFrom(...E24_MANTISSAS), fc.integer({ min: minDecade, max: maxDecade })).map(([m, d]) => m * 10 ** (d - 1));

export const gaugeArb = fc.oneof(
  fc.integer({ min: 14, max: 26 }).map((awg) => ({ awg })),
  fc.constantFrom(0.22, 0.5, 0.75, 1, 1.5).map((mm2) => ({ mm2 })),
);

export const cableArb = fc
  .record({ gauge: gaugeArb, lengthM: fc.oneof(fc.constant(0), fc.double({ min: 0.5, max: 2000, noNaN: true })), t1: fc.integer({ min: -20, max: 60 }), dt: fc.integer({ min: 0, max: 40 }) })
  .map(({ gauge, lengthM, t1, dt }) => ({ gauge, lengthM, tempMinC: t1, tempMaxC: t1 + dt }));

/** Any loop the engine accepts: every scheme and placement, NC or NO, 1–3 detectors (shared: 2, any contacts). */
export const loopArb: fc.Arbitrary<LoopSpec> = fc
  .record({
    scheme: fc.constantFrom("none", "single-eol", "double-eol", "shared") as fc.Arbitrary<LoopSpec["scheme"]>,
    placement: fc.constantFrom("at-detector", "at-panel", "loop-back") as fc.Arbitrary<LoopSpec["placement"]>,
    contact: fc.constantFrom("NC", "NO") as fc.Arbitrary<"NC" | "NO">,
    count: fc.integer({ min: 1, max: 3 }),
    eolOhms: e24Ohms(3, 4),
    alarmOhms: e24Ohms(3, 4),
    sharedOhms: fc.tuple(e24Ohms(3, 4), e24Ohms(3, 4)),
    tolerancePct: fc.constantFrom(1, 2, 5, 10),
    cable: cableArb,
    contactOhms: fc.double({ min: 0.01, max: 1, noNaN: true }),
    shortOhms: fc.double({ min: 0.01, max: 2, noNaN: true }),
    dets: fc.array(fc.boolean(), { minLength: 3, maxLength: 3 }),
    mixedShared: fc.tuple(fc.constantFrom("NC", "NO"), fc.constantFrom("NC", "NO")) as fc.Arbitrary<["NC" | "NO", "NC" | "NO"]>,
  })
  .map((r) => {
    const n = r.scheme === "shared" ? 2 : r.count;
    const detectors: LoopDetector[] = Array.from({ length: n }, (_, i) => ({
      label: `D${i + 1}`,
      contact: r.scheme === "shared" ? r.mixedShared[i] : r.contact,
      tamper: r.dets[i],
      lifeSafety: false,
    }));
    const spec: LoopSpec = {
      scheme: r.scheme,
      placement: r.placement,
      detectors,
      tolerancePct: r.tolerancePct,
      cable: r.cable,
      contactOhms: r.contactOhms,
      shortOhms: r.shortOhms,
    };
    if (r.scheme !== "none") spec.eolOhms = r.eolOhms;
    if (r.scheme === "double-eol") spec.alarmOhms = r.alarmOhms;
    if (r.scheme === "shared") spec.sharedOhms = r.sharedOhms;
    return spec;
  });

export { detector as detectorArb };
