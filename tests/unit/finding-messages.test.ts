import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { readFileSync, readdirSync } from "node:fs";
import { join } from "node:path";
import { shippedCatalog } from "@/lib/catalog/shipped";
import { catalogKinds, type InputType } from "@/lib/catalog/schema";
import { DIAGNOSIS_CODES, LOOP_FINDING_CODES, SOLVER_FINDING_CODES } from "@/lib/finding-codes";
import { analyzeLoop } from "@/lib/loop";
import { loopArb } from "@/lib/loop/test-support/loop-arbitraries";
import { testAlarmBothSidesInputType, testInputType, testLifeSafetyInputType } from "@/lib/loop/test-support/input-types";
import type { LoopSpec } from "@/lib/loop/types";
import { diagnoseLoopOf, diagnoseReading, usualValuesOf, type MeasuredReading } from "@/lib/commissioning/diagnose";
import { buildTerminalSheet } from "@/lib/sheet/build-sheet";
import type { SheetInput } from "@/lib/sheet/sheet-types";
import { midLayout, midSchedule } from "@/lib/sheet/testing/sample-layouts";
import { fixtureCatalog } from "@/lib/solver/testing/fixture-catalog";
import { solverSamples } from "./finding-samples";

// Every finding and diagnosis code, produced through the real engine, solver and diagnosis from sample data, and
// every message read for internal ids, field paths, enum values and counts that disagree in number.

interface Said {
  code: string;
  text: string;
}

const { catalog } = shippedCatalog();

// --- the loop engine: loops from the property-test generator, against every input type, plus the corner cases
function loopSamples(): Said[] {
  const out: Said[] = [];
  const types: InputType[] = [testInputType, testAlarmBothSidesInputType, testLifeSafetyInputType, ...catalog.inputTypes];
  const say = (spec: LoopSpec, type: InputType) => {
    for (const f of analyzeLoop(spec, type).findings) out.push({ code: f.code, text: `${f.message} — ${f.why}` });
  };
  const loops = fc.sample(loopArb, { numRuns: 150, seed: 11 });
  for (const spec of loops)
    for (const type of types) {
      say(spec, type);
      say({ ...spec, detectors: spec.detectors.map((d) => ({ ...d, lifeSafety: true })) }, type);
    }
  const door: LoopSpec = {
    scheme: "double-eol",
    placement: "at-detector",
    detectors: [{ label: "Front door", contact: "NC", tamper: true, lifeSafety: false }],
    tolerancePct: 5,
    cable: { gauge: { awg: 22 }, lengthM: 30, tempMinC: -10, tempMaxC: 40 },
    contactOhms: 0.1,
  };
  say({ ...door, cable: { ...door.cable, lengthM: -5 } }, testInputType); // loop-invalid
  say({ ...door, conductorFaults: "all" }, testInputType); // conductor faults and earth
  say({ ...door, scheme: "single-eol", pathway: "class-a", detectors: [{ label: "Hall", contact: "NO", tamper: false, lifeSafety: false }], eolOhms: 5600 }, testAlarmBothSidesInputType);
  const nos = ["Hall", "Stair"].map((label) => ({ label, contact: "NO" as const, tamper: false, lifeSafety: true }));
  say({ ...door, scheme: "single-eol", pathway: "class-a", detectors: nos }, testLifeSafetyInputType); // class-a-device-lost
  say({ ...door, eolOhms: 5623 }, testInputType); // no colour code at 5 %
  say({ ...door, scheme: "none", placement: "loop-back" }, testInputType); // loop-back-without-resistor
  say({ ...door, tolerancePct: 10, eolOhms: 5620 }, testInputType); // wider tolerance, a value off the E24 series
  say({ ...door, cable: { ...door.cable, lengthM: 2000, gauge: { awg: 26 } } }, testInputType); // over the loop-resistance limit
  return out;
}

// --- commissioning: every test of every loop of a sample sheet, read as open, shorted, and at many values
function diagnosisSamples(): Said[] {
  const sheet = buildTerminalSheet(midLayout, midSchedule, catalog);
  const usualValues = usualValuesOf(catalog);
  const out: Said[] = [];
  const rows = sheet.boards.flatMap((b) => b.rows).filter((r): r is SheetInput => !r.spare);
  for (const row of rows) {
    const loop = diagnoseLoopOf(row);
    const readings: MeasuredReading[] = [{ kind: "open" }, ...[0.5, 2.8, 1000, 2203, 3303, 5603, 9410, 20000].map((ohms) => ({ kind: "ohms", ohms }) as const)];
    for (const e of row.expected) if (Number.isFinite(e.nominalOhms)) for (const k of [0.05, 1.08, 1.12, 2, 3]) readings.push({ kind: "ohms", ohms: e.nominalOhms * k });
    for (const e of row.expected) if (Number.isFinite(e.maxOhms)) readings.push({ kind: "ohms", ohms: e.maxOhms + 30 });
    for (const e of row.expected)
      for (const r of readings) {
        const v = diagnoseReading(loop, e.test, r, { usualValues });
        for (const d of v.diagnoses) out.push({ code: d.code, text: `${d.text} ${v.summary}` });
      }
  }
  return out;
}

const said = { loop: loopSamples(), solver: solverSamples(), diagnosis: diagnosisSamples() };
const all = [...said.loop, ...said.solver, ...said.diagnosis];

/** Every code written as a literal where findings and diagnoses are made, read from the source. */
function codesInSource(): Set<string> {
  const files = ["lib/loop", "lib/solver", "lib/commissioning"].flatMap((dir) =>
    readdirSync(dir, { recursive: true, encoding: "utf8" })
      .filter((f) => f.endsWith(".ts") && !f.endsWith(".test.ts") && !f.includes("test-support") && !f.includes("testing"))
      .map((f) => join(dir, f)),
  );
  const out = new Set<string>();
  for (const f of files) {
    const src = readFileSync(f, "utf8");
    for (const m of src.matchAll(/\bcode: "([a-z0-9-]+)"/g)) if (m[1] !== "custom") out.add(m[1]); // "custom": zod's issue code
    for (const m of src.matchAll(/\bpush\(out, target, "([a-z0-9-]+)"/g)) out.add(m[1]);
    for (const m of src.matchAll(/\bdiag\("([a-z0-9-]+)"/g)) out.add(m[1]);
  }
  return out;
}

// Words a person must never read: catalog ids of every catalog used here, and enum values that are not words.
const ids = new Set<string>([
  ...[catalog, fixtureCatalog].flatMap((c) => catalogKinds.flatMap((k) => c[k] as { id: string }[]).map((e) => e.id)),
  testInputType.id,
  testAlarmBothSidesInputType.id,
  testLifeSafetyInputType.id,
]);
const ENUM_VALUES = ["single-eol", "double-eol", "shared-ok", "at-detector", "at-panel", "short-panel", "short-detector", "four-core-loop-back", "four-core-alarm-tamper", "active-a", "active-b", "active-both", "class-a", "class-b"];
const CODES = new Set<string>([...LOOP_FINDING_CODES, ...SOLVER_FINDING_CODES, ...DIAGNOSIS_CODES]);
const ID_LIKE = /\b[a-z]+(?:-[a-z]+)*-\d[a-z0-9]*(?:-[a-z0-9]+)*\b/; // input-5k6, panel-compact-8, fx-exp-8
const DOTTED_PATH = /\b[a-zA-Z][a-zA-Z]*\.(?:\d+\.)?[a-z]+[A-Z][a-zA-Z0-9]*\b|\b[a-z][a-zA-Z]*\.\d+\b/; // cable.lengthM, detectors.0
const NOUNS = "input|board|detector|zone|error|warning|note|reading|device|loop|case|keypad|problem|row|fault|resistor|supply|conductor|core|test";
const ONE_PLURAL = new RegExp(`(?<![\\d.,])\\b1 (?:${NOUNS})s\\b|\\b1 batteries\\b`);
const MANY_SINGULAR = new RegExp(`(?<![\\d.,])\\b(?:0|[2-9]|\\d{2,}) (?:${NOUNS})\\b(?!s|-| type| board| block| of| fault)`);
const A_BEFORE_VOWEL = /\b[Aa] (?:error|alarm|input|open|earth|end-of-line|other|expansion|input type)\b/;

function problemsOf(text: string): string[] {
  const out: string[] = [];
  const words = text.toLowerCase();
  for (const id of ids) if (new RegExp(`(^|[^a-z0-9-])${id}([^a-z0-9-]|$)`).test(words)) out.push(`catalog id ${id}`);
  for (const v of ENUM_VALUES) if (new RegExp(`(^|[^a-z0-9-])${v}([^a-z0-9-]|$)`).test(words)) out.push(`enum value ${v}`);
  for (const c of CODES) if (new RegExp(`(^|[^a-z0-9-])${c}([^a-z0-9-]|$)`).test(words) && c.includes("-") && !["end-of-line", "loop-back"].includes(c)) out.push(`code ${c}`);
  const idLike = text.match(ID_LIKE);
  if (idLike) out.push(`id-like ${idLike[0]}`);
  const path = text.match(DOTTED_PATH);
  if (path) out.push(`field path ${path[0]}`);
  const one = text.match(ONE_PLURAL);
  if (one) out.push(`"${one[0]}"`);
  const many = text.match(MANY_SINGULAR);
  if (many) out.push(`"${many[0]}"`);
  const a = text.match(A_BEFORE_VOWEL);
  if (a) out.push(`"${a[0]}"`);
  if (/\bthe detector [AB]'s\b/i.test(text)) out.push("“the detector A's”");
  return out;
}

describe("every finding code has a sample", () => {
  it("the registry lists every code the engine, the solver and the diagnosis write", () => {
    const declared = new Set<string>(CODES);
    expect([...codesInSource()].filter((c) => !declared.has(c)).sort()).toEqual([]);
  });
  it("the loop engine produces every loop code from the samples", () => {
    const produced = new Set(said.loop.map((s) => s.code));
    expect(LOOP_FINDING_CODES.filter((c) => !produced.has(c))).toEqual([]);
    expect([...produced].filter((c) => !(LOOP_FINDING_CODES as readonly string[]).includes(c))).toEqual([]);
  });
  it("the solver produces every solver code from the samples", () => {
    const produced = new Set(said.solver.map((s) => s.code));
    const known = new Set<string>([...SOLVER_FINDING_CODES, ...LOOP_FINDING_CODES]); // the solver passes the engine's on
    expect(SOLVER_FINDING_CODES.filter((c) => !produced.has(c))).toEqual([]);
    expect([...produced].filter((c) => !known.has(c))).toEqual([]);
  });
  it("the diagnosis produces every diagnosis code from the samples", () => {
    const produced = new Set(said.diagnosis.map((s) => s.code));
    expect(DIAGNOSIS_CODES.filter((c) => !produced.has(c))).toEqual([]);
  });
});

describe("every message reads as plain words", () => {
  it("holds no internal id, field path or enum value, and every count agrees in number", () => {
    const bad = new Map<string, string>();
    for (const s of all) {
      const p = problemsOf(s.text);
      if (p.length && !bad.has(`${s.code}: ${p.join(", ")}`)) bad.set(`${s.code}: ${p.join(", ")}`, s.text);
    }
    expect([...bad].map(([k, v]) => `${k}\n    ${v}`)).toEqual([]);
  });
  it("the checks bite on the slips they are for", () => {
    // the checks themselves, on messages as they were written before
    expect(problemsOf('Life-safety device on input type "input-5k6", which is not for life-safety devices')).toContain("catalog id input-5k6");
    expect(problemsOf("Cable.lengthM: cable length can't be negative")).toContain("field path Cable.lengthM".replace("Cable", "Cable"));
    expect(problemsOf("1 inputs short")).toContain('"1 inputs"');
    expect(problemsOf("Expansion with 1 boards")).toContain('"1 boards"');
    expect(problemsOf("2 input short")).toContain('"2 input"');
    expect(problemsOf("This is a error")).toContain('"a error"');
    expect(problemsOf("The detector B's resistor is 4.7 kΩ")).toContain("“the detector A's”");
    expect(problemsOf("Hall is wired single-eol")).toContain("enum value single-eol");
    expect(problemsOf("2 detectors, 1 input, 4.7 kΩ, e.g. the hall; 1 of 2 inputs")).toEqual([]);
  });
});
