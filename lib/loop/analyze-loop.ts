// The loop supervision engine: every state × fault combination as a reading interval, its report,
// and verdicts on what the panel can and cannot see.
import type { InputType, Report } from "@/lib/catalog/schema";
import type { Finding, FindingTarget } from "@/lib/findings";
import { conductorAt, compileLoop, contactSums, evalFaultsFrom, FAULTS, SCHEME_SHARED, STATE_ACTIVE, STATE_TAMPER, stateCombos, type LoopModel } from "./loop-model";
import { acceptableFor, bandIndex, compileBands, marginOf, REPORT_BIT, reportsBetween } from "./loop-bands";
import { inputTypeProblems, loopShapeProblems, type LoopProblem } from "./loop-problems";
import { maxCableRun, type CableRow } from "./max-cable";
import { buildFindings } from "./loop-findings";
import { resistorUses } from "./resistor-uses";
import { attachWiring, wiringProblems } from "./wiring-analysis";
import { indistinguishableGroups } from "./indistinguishable";
import { ReadingRow } from "./reading-row";
import type { Fault, LoopAnalysis, LoopSpec, Reading } from "./types";
import { withFieldLabel } from "@/lib/vocabulary/field-labels";

const LAYOUT: FindingTarget = { kind: "layout" };
/** Situation index of each fault (FAULTS order: short at the panel end, at the detector end, cut), as the findings group them. */
const FAULT_SITUATION = [0, 4, 3, 5];
const OPEN_BIT = REPORT_BIT.open;
const NORMAL_BIT = REPORT_BIT.normal;
const SHORT_BIT = REPORT_BIT.short;
const OPEN_OK = acceptableFor("open");
const SHORT_OK = acceptableFor("short");
function expectedFor(m: LoopModel, code: readonly number[]): Report {
  let active = 0;
  for (let i = 0; i < code.length; i++) {
    if (code[i] === STATE_TAMPER) return "open";
    if (code[i] === STATE_ACTIVE) active++;
  }
  if (m.scheme === SCHEME_SHARED) {
    if (code[0] === STATE_ACTIVE && code[1] === STATE_ACTIVE) return "active-both";
    if (code[0] === STATE_ACTIVE) return "active-a";
    if (code[1] === STATE_ACTIVE) return "active-b";
    return "normal";
  }
  return active > 0 ? "active" : "normal";
}

// Per-call work arrays, reused: allocating typed arrays per loop showed in the profile. Used only within one call
// (the pair grouping reads the situations and the expected bits before analyzeLoop returns).
const scratchArrays = [new Int32Array(256), new Int32Array(256), new Int32Array(256)];
/** The four fault readings at: low parts and coldest, high parts and hottest, nominal, and both on a zero-length cable. */
const READINGS = [0, 1, 2, 3, 4].map(() => new Float64Array(4));
/** The contacts' share of the network for one state combination (contactSums). */
const CONTACTS = new Float64Array(3);
/** Situations a row can be in, as the findings group indistinguishable pairs (see FAULT_SITUATION). */
const SITUATIONS = 6;
function scratch(n: number, k = 0): Int32Array {
  if (scratchArrays[k].length < n) scratchArrays[k] = new Int32Array(Math.max(n, 2 * scratchArrays[k].length));
  return scratchArrays[k];
}

function invalidAnalysis(problems: LoopProblem[], target: FindingTarget): LoopAnalysis {
  return {
    rows: [],
    findings: problems.map((p) => ({
      code: "loop-invalid",
      severity: "error",
      message: withFieldLabel(p.path, p.message),
      why: "The loop as described can't be wired or measured, so nothing about its supervision can be said until this is fixed.",
      target,
    })),
    resistors: [],
    faults: { "short-panel": "defeat", "short-detector": "defeat", cut: "defeat" },
    indistinguishable: [],
    maxCableM: null,
    valid: false,
  };
}

export function analyzeLoop(loop: LoopSpec, inputType: InputType, target: FindingTarget = LAYOUT): LoopAnalysis {
  const problems: LoopProblem[] = wiringProblems(loop, inputTypeProblems(loop, inputType, loopShapeProblems(loop)));
  if (problems.length) return invalidAnalysis(problems, target);
  const m = compileLoop(loop, inputType);
  const cb = compileBands(inputType.bands[loop.scheme]!);
  const rcLo = conductorAt(m, m.tMin);
  const rcHi = conductorAt(m, m.tMax);
  const rcNom = conductorAt(m, (m.tMin + m.tMax) / 2);
  const lo = 1 - m.tol;
  const hi = 1 + m.tol;
  const eLo = m.eol * lo, aLo = m.alarm * lo, saLo = m.sa * lo, sbLo = m.sb * lo;
  const eHi = m.eol * hi, aHi = m.alarm * hi, saHi = m.sa * hi, sbHi = m.sb * hi;

  const { combos, codes } = stateCombos(loop.detectors);
  // each row's situation for the findings' grouping: 0 all at rest, 1 an alarm, 2 a tamper, then the faults
  const situations = scratch(combos.length * 4);
  const rows: Reading[] = [];
  const masks: number[] = [];
  const cableRows: CableRow[] = [];
  const [vLo, vHi, vNom, vLo0, vHi0] = READINGS;
  const k = CONTACTS;
  const expBits = scratch(combos.length * 4, 1);
  for (let c = 0; c < combos.length; c++) {
    const states = combos[c];
    const code = codes[c];
    const exp0 = expectedFor(m, code);
    const exp0Bit = REPORT_BIT[exp0];
    const exp0Ok = acceptableFor(exp0);
    const sit0 = exp0 === "normal" ? 0 : exp0 === "open" ? 2 : 1;
    contactSums(m, code, k);
    evalFaultsFrom(m, k, rcLo, eLo, aLo, saLo, sbLo, vLo);
    evalFaultsFrom(m, k, rcHi, eHi, aHi, saHi, sbHi, vHi);
    evalFaultsFrom(m, k, rcNom, m.eol, m.alarm, m.sa, m.sb, vNom);
    // The same rows on a zero-length cable: the longest run starts from readings in their band there.
    evalFaultsFrom(m, k, 0, eLo, aLo, saLo, sbLo, vLo0);
    evalFaultsFrom(m, k, 0, eHi, aHi, saHi, sbHi, vHi0);
    for (let f = 0; f < 4; f++) {
      const minOhms = vLo[f];
      const maxOhms = vHi[f];
      const iLo = bandIndex(cb, minOhms);
      const iHi = bandIndex(cb, maxOhms);
      const fault: Fault = FAULTS[f];
      const expected: Report = f === 0 ? exp0 : f === 3 ? "open" : "short";
      let mask = 0;
      for (let b = iLo; b <= iHi; b++) mask |= cb.masks[b];
      const i = rows.length;
      rows.push(new ReadingRow(states, fault, minOhms, maxOhms, reportsBetween(cb, iLo, iHi), iLo !== iHi, marginOf(cb, iLo, iHi, minOhms, maxOhms), expected, vNom[f], loop.detectors));
      expBits[i] = f === 0 ? exp0Bit : f === 3 ? OPEN_BIT : SHORT_BIT;
      situations[i] = f === 0 ? sit0 : FAULT_SITUATION[f];
      masks.push(mask);
      const hi0 = vHi0[f];
      if (hi0 < Infinity) {
        const b0 = bandIndex(cb, hi0);
        if (b0 === bandIndex(cb, vLo0[f]) && (cb.masks[b0] & ~(f === 0 ? exp0Ok : f === 3 ? OPEN_OK : SHORT_OK)) === 0) cableRows.push({ code, fault: f, maxAtZeroOhms: hi0, edgeOhms: cb.to[b0] });
      }
    }
  }

  const faults = { "short-panel": "detected", "short-detector": "detected", cut: "detected" } as LoopAnalysis["faults"];
  for (let f = 1; f < 4; f++) {
    let verdict: "detected" | "mistaken" | "defeat" = "detected";
    const ok = f === 3 ? OPEN_OK : SHORT_OK;
    for (let i = f; i < rows.length; i += 4) {
      if (masks[i] & NORMAL_BIT) {
        verdict = "defeat";
        break;
      }
      if (masks[i] & ~ok) verdict = "mistaken";
    }
    faults[FAULTS[f] as Exclude<Fault, "none">] = verdict;
  }

  const groups = indistinguishableGroups(masks, expBits, situations, SITUATIONS);

  const conductorOhms = { minOhms: m.conductors * rcLo, maxOhms: m.conductors * rcHi };
  const hotPerM = conductorAt(m, m.tMax, 1);
  const analysis: LoopAnalysis = {
    rows,
    findings: [],
    resistors: resistorUses(loop, inputType),
    faults,
    indistinguishable: groups.pairs,
    maxCableM: maxCableRun(m, cableRows, hi),
    valid: true,
    conductorOhms,
    maxCableByLoopOhmsM: hotPerM > 0 ? inputType.maxLoopOhms / (m.conductors * hotPerM) : null,
  };
  if (m.scheme === SCHEME_SHARED) {
    const decodeRows = [0, 1, 2, 3].map((k) => {
      const want = [k & 1 ? "active" : "rest", k & 2 ? "active" : "rest"];
      return rows.findIndex((r) => r.fault === "none" && r.states[0] === want[0] && r.states[1] === want[1]);
    });
    analysis.decode = decodeRows.map((i, k) => {
      const r = rows[i];
      const others = decodeRows.filter((_, kk) => kk !== k).reduce((acc, j) => acc | masks[j], 0);
      const report = r.reports.length === 1 ? r.reports[0] : cb.reports[bandIndex(cb, r.nominalOhms!)];
      // Unique means told apart and read as itself: a state landing alone in another state's band is not.
      return { states: r.states, minOhms: r.minOhms, maxOhms: r.maxOhms, report, unique: r.reports.length === 1 && report === r.expected && (masks[i] & others) === 0 };
    });
  }
  const findings: Finding[] = buildFindings({ loop, inputType, model: m, rows, masks, analysis, groups }, target);
  analysis.findings = findings;
  attachWiring(analysis, loop, inputType, m, target);
  return analysis;
}
