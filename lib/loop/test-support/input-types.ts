// Input types for tests and the bench: generic profiles of our own, with band tables a practitioner would
// recognise for 5.6 kΩ end-of-line resistors.
import type { InputType } from "@/lib/catalog/schema";

export const testInputType: InputType = {
  id: "test-universal-input",
  name: "Test input, every scheme",
  description: "5.6 kΩ end-of-line, 5.6 kΩ alarm resistor, shared 2.2 kΩ / 4.7 kΩ.",
  schemes: ["none", "single-eol", "double-eol", "shared"],
  eolOhms: 5600,
  alarmOhms: 5600,
  sharedOhms: [2200, 4700],
  bands: {
    none: [
      { report: "normal", fromOhms: 0, toOhms: 1000 },
      { report: "active", fromOhms: 1000, toOhms: null },
    ],
    "single-eol": [
      { report: "short", fromOhms: 0, toOhms: 2800 },
      { report: "normal", fromOhms: 2800, toOhms: 8400 },
      { report: "active", fromOhms: 8400, toOhms: null },
    ],
    "double-eol": [
      { report: "short", fromOhms: 0, toOhms: 2800 },
      { report: "normal", fromOhms: 2800, toOhms: 8400 },
      { report: "active", fromOhms: 8400, toOhms: 16800 },
      { report: "open", fromOhms: 16800, toOhms: null },
    ],
    shared: [
      { report: "short", fromOhms: 0, toOhms: 4000 },
      { report: "normal", fromOhms: 4000, toOhms: 6900 },
      { report: "active-a", fromOhms: 6900, toOhms: 9000 },
      { report: "active-b", fromOhms: 9000, toOhms: 11500 },
      { report: "active-both", fromOhms: 11500, toOhms: 15000 },
      { report: "open", fromOhms: 15000, toOhms: null },
    ],
  },
  tolerancePct: 5,
  maxLoopOhms: 100,
  lifeSafety: false,
};

/** A single end-of-line input that reads both sides of normal as an alarm (suits NO contacts). */
export const testAlarmBothSidesInputType: InputType = {
  ...testInputType,
  id: "test-seol-both-sides",
  name: "Test input, single end-of-line, alarm either side",
  schemes: ["single-eol"],
  bands: {
    "single-eol": [
      { report: "active", fromOhms: 0, toOhms: 2800 },
      { report: "normal", fromOhms: 2800, toOhms: 8400 },
      { report: "active", fromOhms: 8400, toOhms: null },
    ],
  },
};

/** A life-safety input: double end-of-line with short and open as trouble. */
export const testLifeSafetyInputType: InputType = {
  ...testInputType,
  id: "test-life-safety-input",
  name: "Test life-safety input",
  schemes: ["single-eol", "double-eol"],
  bands: {
    "single-eol": [
      { report: "trouble", fromOhms: 0, toOhms: 2800 },
      { report: "normal", fromOhms: 2800, toOhms: 8400 },
      { report: "trouble", fromOhms: 8400, toOhms: null },
    ],
    "double-eol": testInputType.bands["double-eol"],
  },
  lifeSafety: true,
};
