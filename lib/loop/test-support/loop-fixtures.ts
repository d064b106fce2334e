// Hand-built loops for the engine's tests: one NC detector, single end-of-line at the detector, 30 m of 22 AWG.
import type { LoopDetector, LoopSpec } from "../types";

export const det = (label: string, over: Partial<LoopDetector> = {}): LoopDetector => ({ label, contact: "NC", tamper: false, lifeSafety: false, ...over });

export const loop = (over: Partial<LoopSpec> = {}): LoopSpec => ({
  scheme: "single-eol",
  placement: "at-detector",
  detectors: [det("Front door")],
  tolerancePct: 5,
  cable: { gauge: { awg: 22 }, lengthM: 30, tempMinC: 0, tempMaxC: 40 },
  contactOhms: 0.05,
  ...over,
});
