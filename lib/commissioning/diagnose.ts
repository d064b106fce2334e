import type { Catalog, ContactType, WiringScheme } from "@/lib/catalog/schema";
import { conductorOhmsPerM } from "@/lib/loop/cable";
import { CONTACT_OHMS, LOOP_TEMP_MAX_C, LOOP_TEMP_MIN_C } from "@/lib/solver/loop-rules";
import { findFaults, type Explanation, type MeasuredReadings } from "@/lib/loop/fault-finder";
import type { CableGauge, LoopSpec, Placement } from "@/lib/loop/types";
import { closestPreferred } from "@/lib/resistors/e-series";
import { formatOhms } from "@/lib/resistors/format-ohms";
import type { ExpectedReading, SheetInput, TestKey } from "@/lib/sheet/sheet-types";
import { rangeText } from "@/lib/sheet/test-readings";
import type { DiagnosisCode } from "@/lib/finding-codes";

// A commissioning reading against the loop's expected readings: pass or fail, which other test it looks like,
// and what is probably wrong, in plain words. The diagnosis rules are trade rules of thumb.

export const TRADE_RULE_SOURCE = "common practice, no published source" as const;

export type MeasuredReading = { kind: "ohms"; ohms: number } | { kind: "open" };

export interface DiagnoseLoop {
  scheme: WiringScheme;
  placement: Placement;
  contact: ContactType;
  expected: Pick<ExpectedReading, "test" | "instruction" | "minOhms" | "maxOhms" | "nominalOhms">[];
  /** Fitted values by role. */
  resistors: { role: string; ohms: number }[];
  gauge?: CableGauge;
  /** The loop as the engine sees it, for ranking what a failed reading means (the fault finder). */
  spec?: LoopSpec;
}

export interface UsualValue {
  ohms: number;
  /** e.g. "the compact family's inputs (2.2 kΩ input)". */
  where: string;
}

export interface DiagnoseOptions {
  /** Meter accuracy allowance, percent of the reading and ohms (from memory: a handheld meter is within about ±(1 % + a few counts) on its resistance ranges). */
  slackPct?: number;
  slackOhms?: number;
  /** Resistor values other input types use, to name a resistor taken from another family's stock. */
  usualValues?: UsualValue[];
}

export type { DiagnosisCode };

export interface Diagnosis {
  code: DiagnosisCode;
  text: string;
  source: typeof TRADE_RULE_SOURCE;
}

export interface ReadingVerdict {
  test: TestKey;
  verdict: "pass" | "fail";
  readingText: string;
  expectedText: string;
  /** Other tests of this loop whose range holds the reading. */
  matches: TestKey[];
  diagnoses: Diagnosis[];
  /** One line for the record. */
  summary: string;
  /** Failed readings on a loop with `spec`: the fault finder's explanations, best fit first. */
  ranking?: Explanation[];
}

const diag = (code: DiagnosisCode, text: string): Diagnosis => ({ code, text, source: TRADE_RULE_SOURCE });

export function readingText(r: MeasuredReading): string {
  return r.kind === "open" ? "open (OL)" : formatOhms(r.ohms);
}

type Range = Pick<ExpectedReading, "minOhms" | "maxOhms">;

export function holds(e: Range, r: MeasuredReading, slackPct = 1, slackOhms = 1): boolean {
  if (r.kind === "open") return e.maxOhms === Infinity;
  if (e.minOhms === Infinity) return false;
  const k = slackPct / 100;
  const lo = e.minOhms * (1 - k) - slackOhms;
  const hi = e.maxOhms === Infinity ? Infinity : e.maxOhms * (1 + k) + slackOhms;
  return r.ohms >= lo && r.ohms <= hi;
}

/** NO contacts sit across the pair on single end-of-line and no-resistor loops; every other loop is a series chain. */
const acrossThePair = (loop: Pick<DiagnoseLoop, "scheme" | "contact">) => loop.contact === "NO" && (loop.scheme === "single-eol" || loop.scheme === "none");

/** The resistance the loop's resting reading is made of, besides the cable: what a wrong part would change. */
export function restingResistorOhms(loop: Pick<DiagnoseLoop, "scheme" | "contact" | "resistors">): number | null {
  const v = (role: string) => loop.resistors.find((r) => r.role === role)?.ohms;
  const eol = v("eol");
  if (loop.scheme === "none" || eol === undefined) return null;
  if (loop.scheme === "double-eol" && loop.contact === "NO") {
    const alarm = v("alarm");
    return alarm === undefined ? null : eol + alarm;
  }
  return eol;
}

const OTHER_TEST_WORDS: Partial<Record<TestKey, string>> = {
  rest: "the loop at rest",
  short: "a short across the pair at the far end",
  cut: "a cut conductor",
};

function describeTest(e: DiagnoseLoop["expected"][number]): string {
  return OTHER_TEST_WORDS[e.test] ?? e.instruction.replace(/:.*$/, "");
}

export function diagnoseReading(loop: DiagnoseLoop, test: TestKey, reading: MeasuredReading, options: DiagnoseOptions = {}): ReadingVerdict {
  const slackPct = options.slackPct ?? 1;
  const slackOhms = options.slackOhms ?? 1;
  const e = loop.expected.find((x) => x.test === test);
  if (!e) throw new RangeError(`this loop has no "${test}" test (it has: ${loop.expected.map((x) => x.test).join(", ")})`);
  const rt = readingText(reading);
  const et = rangeText(e.minOhms, e.maxOhms);
  const matches = loop.expected.filter((x) => x.test !== test && holds(x, reading, slackPct, slackOhms)).map((x) => x.test);
  if (holds(e, reading, slackPct, slackOhms)) return { test, verdict: "pass", readingText: rt, expectedText: et, matches, diagnoses: [], summary: `Pass: ${rt}, expected ${et}.` };

  const out: Diagnosis[] = [];
  const rest = loop.expected.find((x) => x.test === "rest");
  const restOhms = restingResistorOhms(loop);

  if (reading.kind === "open") {
    if (test === "rest")
      out.push(
        acrossThePair(loop)
          ? diag("open-at-rest-across", "Open at rest on a normally open loop: the end-of-line resistor across the contact is missing or not connected, or a conductor is broken or loose.")
          : diag("open-at-rest", "Open at rest on a normally closed loop: a broken or loose conductor, or a contact that is not closed (door or window open, cover off, detector in alarm)."),
      );
    else if (test === "short") out.push(diag("open-on-short-test", "Open with the pair shorted at the far end: the short was not made across cores 1 and 2, or a conductor is broken between the panel and the far end."));
    else if (test.startsWith("active") && (loop.scheme === "double-eol" || loop.scheme === "shared") && loop.contact === "NC")
      out.push(diag("resistor-across-contact-missing", "Open when the detector is active: the resistor across its contact is missing or not connected, so an alarm reads as a cut."));
    else out.push(diag("open-unexpected", `Open where ${et} was expected: a broken or loose conductor or terminal.`));
  } else {
    const r = reading.ohms;
    if ((test === "short" || test === "cut") && rest && holds(rest, reading, slackPct, slackOhms))
      out.push(
        diag(
          "resistor-not-at-end",
          `The ${test} test reads like the loop at rest (${rt}): the resistor is not at the end of the line. It is fitted at the panel or part-way along the cable, so it supervises nothing beyond it. Move it to the detector, or wire it as a loop-back resistor.`,
        ),
      );
    else if (test === "rest" && loop.scheme !== "none" && rest && rest.minOhms !== Infinity && r < 0.1 * rest.minOhms)
      out.push(diag("near-zero-at-rest", `About ${rt} at rest: a short in the cable, or the resistor is missing (the loop wired straight through without it).`));
    else if (e.minOhms === Infinity) out.push(diag("closed-when-open-expected", `${rt} where the loop should read open: another path across the pair (a resistor or a link at the terminals, or a damaged cable) carries current.`));

    if (matches.length && !out.some((d) => d.code === "resistor-not-at-end")) {
      const others = loop.expected.filter((x) => matches.includes(x.test)).map(describeTest);
      const hint =
        test === "rest" && matches.some((m) => m.startsWith("active"))
          ? " The detector may be in alarm (door open, someone in view), or its contact type is not the one on the sheet (NO where NC is expected, or the other way)."
          : "";
      out.push(diag("reads-as-other-test", `It reads like ${others.join(" or ")}.${hint}`));
    }

    if (e.minOhms !== Infinity && e.nominalOhms > 0 && out.every((d) => d.code !== "resistor-not-at-end" && d.code !== "near-zero-at-rest")) {
      const ratio = r / e.nominalOhms;
      if (ratio >= 1.8 && ratio <= 2.2) {
        const ex = restOhms ? ` (2 × ${formatOhms(restOhms)} = ${formatOhms(2 * restOhms)})` : "";
        out.push(diag("double-value", `About twice the expected ${formatOhms(e.nominalOhms)}: a double end-of-line pair wired in series, both resistors in line and none across the contact, or a resistor of twice the value${ex}.`));
      } else if (e.maxOhms !== Infinity && r > e.maxOhms) {
        // A little high: up to 15 % over the nominal reading, or a few tens of ohms over the range.
        const excess = r - e.maxOhms;
        if (r - e.nominalOhms <= 0.15 * e.nominalOhms || excess <= 50) {
          const perM = loop.gauge ? conductorOhmsPerM(loop.gauge, 20) : null;
          const metres = perM ? ` (about ${Math.round(excess / (2 * perM))} m more cable each way than the schedule says)` : "";
          out.push(diag("slightly-high", `${formatOhms(excess)} above the highest expected reading: a longer cable run${metres}, or a poor or corroded joint or terminal. Remake the joints and measure again; if it stays high, check the resistor's value.`));
        }
      }
      if (!out.length) out.push(wrongResistor(loop, test, r, e, rest, restOhms, options.usualValues ?? []));
    }
    if (!out.length) out.push(diag("open-unexpected", `${rt} where ${et} was expected: check the wiring against the core map.`));
  }
  const why = out[0] ? ` ${out[0].text}` : "";
  const ranking = loop.spec ? rankFaults(loop.spec, test, reading) : undefined;
  return { test, verdict: "fail", readingText: rt, expectedText: et, matches, diagnoses: out, summary: `Fail: ${rt}, expected ${et}.${why}`, ...(ranking ? { ranking } : {}) };
}

function wrongResistor(loop: DiagnoseLoop, test: TestKey, r: number, e: DiagnoseLoop["expected"][number], rest: DiagnoseLoop["expected"][number] | undefined, restOhms: number | null, usual: UsualValue[]): Diagnosis {
  if (test !== "rest" || restOhms === null || !rest)
    return diag("wrong-resistor", `${formatOhms(r)} is far from every expected reading of this loop (${formatOhms(e.nominalOhms)} here): check each resistor's value and where it is fitted.`);
  // The cable and contacts add (rest nominal − resistor value); what is left is the resistor actually fitted.
  const implied = r - (rest.nominalOhms - restOhms);
  const nearest = implied > 0 ? closestPreferred(implied, "E24") : null;
  if (!nearest) return diag("wrong-resistor", `${formatOhms(r)} at rest is far from ${formatOhms(rest.nominalOhms)}: check the resistor.`);
  const other = usual.find((u) => Math.abs(u.ohms - nearest) <= nearest * 0.005 && Math.abs(u.ohms - restOhms) > restOhms * 0.005);
  const family = other ? ` ${formatOhms(nearest)} is the usual value on ${other.where}: perhaps a resistor from another panel's stock.` : "";
  return diag(
    "wrong-resistor",
    `${formatOhms(r)} at rest is far from every expected reading: probably the wrong resistor. A ${formatOhms(nearest)} resistor (nearest E24 value) would read about this, where ${formatOhms(restOhms)} is needed.${family}`,
  );
}

/** The fault finder's reading for a test: at rest, first detector active, or the far end shorted. */
const FINDER_READING: Partial<Record<TestKey, keyof MeasuredReadings>> = { rest: "restOhms", active: "activeOhms", "active-a": "activeOhms", short: "farEndShortedOhms" };

/** The explanations the fault finder ranks for one failed reading, when the test is one it knows. */
export function rankFaults(spec: LoopSpec, test: TestKey, reading: MeasuredReading): Explanation[] | undefined {
  const key = FINDER_READING[test];
  if (!key) return undefined;
  return findFaults(spec, undefined, { [key]: reading.kind === "open" ? Infinity : reading.ohms });
}

/** The engine's loop description of a terminal sheet row. */
export function loopSpecOfRow(row: SheetInput): LoopSpec | undefined {
  if (!row.detectors.length) return undefined;
  const v = (role: string) => row.resistors.find((r) => r.role === role)?.ohms;
  const a = v("shared-a");
  const b = v("shared-b");
  return {
    scheme: row.scheme,
    placement: row.placement,
    detectors: row.detectors.map((d) => ({ label: d.label, contact: d.contact, tamper: d.tamper, lifeSafety: d.lifeSafety })),
    eolOhms: v("eol"),
    alarmOhms: v("alarm"),
    sharedOhms: a !== undefined && b !== undefined ? [a, b] : undefined,
    tolerancePct: row.resistors[0]?.tolerancePct ?? 5,
    cable: { gauge: row.cable.gauge, lengthM: row.cable.lengthM, tempMinC: LOOP_TEMP_MIN_C, tempMaxC: LOOP_TEMP_MAX_C },
    contactOhms: CONTACT_OHMS,
  };
}

/** The diagnosis view of a terminal sheet row. */
export function diagnoseLoopOf(row: SheetInput): DiagnoseLoop {
  return { scheme: row.scheme, placement: row.placement, contact: row.detectors[0]?.contact ?? "NC", expected: row.expected, resistors: row.resistors, gauge: row.cable.gauge, spec: loopSpecOfRow(row) };
}

/** Every input type's resistor values with the panel families that use it, for naming a resistor from another family's stock. */
export function usualValuesOf(catalog: Pick<Catalog, "inputTypes" | "panels">): UsualValue[] {
  const out: UsualValue[] = [];
  for (const t of catalog.inputTypes) {
    const families = [...new Set(catalog.panels.filter((p) => p.onboardInputs.inputType === t.id).map((p) => p.family))];
    const where = families.length ? `the ${families.join(" and ")} family's ${t.name}` : `the ${t.name}`;
    for (const ohms of [t.eolOhms, t.alarmOhms, ...(t.sharedOhms ?? [])]) if (ohms !== undefined && !out.some((u) => u.ohms === ohms && u.where === where)) out.push({ ohms, where });
  }
  return out;
}
