import type { DetectorCategory, Report } from "@/lib/catalog/schema";
import type { DetectorState, Fault, LoopAnalysis, Reading } from "@/lib/loop/types";
import { formatOhmsRange } from "@/lib/resistors/format-ohms";
import type { ExpectedReading, TestKey } from "@/lib/sheet/sheet-types";

// The commissioning tests of one loop, each tied to the loop engine row with the same detector states and fault.

export interface TestDetector {
  label: string;
  category: DetectorCategory;
  tamper: boolean;
}

/** How to make a detector active for the test, by category (common practice, no published source). */
const ACTIVATE: Record<DetectorCategory, string> = {
  "door-contact": "open the door",
  "window-contact": "open the window",
  motion: "walk test it",
  "glass-break": "sound a glass-break tester near it",
  vibration: "tap beside it",
  panic: "press it, then reset it",
  water: "wet the probe",
  temperature: "trip it as its instructions say",
  smoke: "test it as its instructions and the local fire code allow",
  heat: "test it as its instructions and the local fire code allow",
};

export function rangeText(minOhms: number, maxOhms: number): string {
  if (minOhms === Infinity) return "open (meter shows OL)";
  return formatOhmsRange(minOhms, maxOhms);
}

interface TestPlan {
  test: TestKey;
  states: DetectorState[];
  fault: Fault;
  instruction: string;
}

/** The tests to make on a loop of these detectors (one, or the two of a shared input). */
export function testPlan(detectors: readonly TestDetector[]): TestPlan[] {
  const n = detectors.length;
  const rest = (): DetectorState[] => new Array<DetectorState>(n).fill("rest");
  const plans: TestPlan[] = [{ test: "rest", states: rest(), fault: "none", instruction: "Everything at rest: doors and windows shut, covers on, nobody in view" }];
  const suffix = n === 2 ? (["-a", "-b"] as const) : null;
  detectors.forEach((d, i) => {
    const s = rest();
    s[i] = "active";
    plans.push({ test: (suffix ? `active${suffix[i]}` : "active") as TestKey, states: s, fault: "none", instruction: `${d.label} active: ${ACTIVATE[d.category]}` });
  });
  if (n === 2) plans.push({ test: "active-both", states: ["active", "active"], fault: "none", instruction: `${detectors[0].label} and ${detectors[1].label} active together` });
  detectors.forEach((d, i) => {
    if (!d.tamper) return;
    const s = rest();
    s[i] = "tamper";
    plans.push({ test: (suffix ? `tamper${suffix[i]}` : "tamper") as TestKey, states: s, fault: "none", instruction: `${d.label} tamper: take its cover off` });
  });
  const far = n === 2 ? `${detectors[1].label} (the far end)` : `${detectors[0]?.label ?? "the detector"} (the far end)`;
  plans.push({ test: "short", states: rest(), fault: "short-detector", instruction: `Short cores 1 and 2 together at ${far}, everything at rest` });
  plans.push({ test: "cut", states: rest(), fault: "cut", instruction: `Lift core 1 off its terminal at ${far}, everything at rest` });
  return plans;
}

const sameStates = (a: readonly DetectorState[], b: readonly DetectorState[]) => a.length === b.length && a.every((s, i) => s === b[i]);

export function findRow(analysis: LoopAnalysis, states: readonly DetectorState[], fault: Fault): Reading | undefined {
  return analysis.rows.find((r) => r.fault === fault && sameStates(r.states, states));
}

/** The expected reading of each test, from the loop engine's rows. */
export function expectedReadings(analysis: LoopAnalysis, detectors: readonly TestDetector[]): ExpectedReading[] {
  const out: ExpectedReading[] = [];
  for (const p of testPlan(detectors)) {
    const row = findRow(analysis, p.states, p.fault);
    if (!row) continue;
    out.push({
      test: p.test,
      instruction: p.instruction,
      states: [...row.states],
      fault: row.fault,
      minOhms: row.minOhms,
      maxOhms: row.maxOhms,
      nominalOhms: row.nominalOhms ?? (row.minOhms + row.maxOhms) / 2,
      rangeText: rangeText(row.minOhms, row.maxOhms),
      reports: [...row.reports],
      expectedReport: row.expected,
      uncertain: row.uncertain,
      measured: null,
    });
  }
  return out;
}

/** The reports a detector's zone gives in the tests that concern it: rest, its own active and tamper, short and cut. */
export function zoneReports(expected: readonly ExpectedReading[], index: number, shared: boolean): Report[] {
  const mine = new Set<TestKey>(["rest", "short", "cut"]);
  if (shared) {
    const s = index === 0 ? "a" : "b";
    mine.add(`active-${s}` as TestKey).add(`tamper-${s}` as TestKey).add("active-both");
  } else mine.add("active").add("tamper");
  const out: Report[] = [];
  for (const e of expected) if (mine.has(e.test)) for (const r of e.reports) if (!out.includes(r)) out.push(r);
  return out;
}
