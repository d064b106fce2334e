import type { TestKey } from "@/lib/sheet/sheet-types";

// Names of the commissioning tests as the sheet and the commissioning screen show them.
export const TEST_WORDS: Record<TestKey, string> = {
  rest: "At rest",
  active: "Active",
  "active-a": "Detector A active",
  "active-b": "Detector B active",
  "active-both": "Both active",
  tamper: "Tamper",
  "tamper-a": "Tamper of A",
  "tamper-b": "Tamper of B",
  short: "Short at the far end",
  cut: "Cut at the far end",
};
