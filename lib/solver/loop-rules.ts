import type { InputType } from "@/lib/catalog/schema";
import type { Finding, FindingTarget } from "@/lib/findings";
import type { AnalyzeLoop, Fault, LoopAnalysis, LoopSpec } from "@/lib/loop/types";
import { listNames } from "@/lib/solver/format";
import type { GenerationMemo } from "@/lib/solver/memo";
import { isLifeSafety, type Resolved, type ResolvedInput } from "@/lib/solver/resolve";
import type { InputFigures, SharedInputFigures, SolveResult } from "@/lib/solver/types";

// Every used input through the loop engine, plus the rules about sharing and life-safety devices.

/** Conductor temperature range assumed for a loop inside a building, °C (common practice, no published source). */
export const LOOP_TEMP_MIN_C = 10;
export const LOOP_TEMP_MAX_C = 40;
/** Resistance of one closed contact, ohms (from memory: a clean reed or relay contact is well under this). */
export const CONTACT_OHMS = 0.1;

/** The loop as the engine sees it: the input's wiring, its detectors, the longest cable run among them. */
export function loopSpecFor(ri: ResolvedInput, inputType: InputType): LoopSpec {
  const longest = ri.detectors.reduce((a, b) => (b.sched.cableM > a.sched.cableM ? b : a));
  const { input } = ri;
  const spec: LoopSpec = {
    scheme: input.scheme,
    placement: input.placement,
    detectors: ri.detectors.map((d) => ({ label: d.sched.label, contact: d.cat.contact, tamper: d.cat.tamper, lifeSafety: isLifeSafety(d.cat) })),
    tolerancePct: inputType.tolerancePct,
    cable: { gauge: longest.sched.gauge, lengthM: longest.sched.cableM, tempMinC: LOOP_TEMP_MIN_C, tempMaxC: LOOP_TEMP_MAX_C },
    contactOhms: CONTACT_OHMS,
  };
  if (input.eolOhms !== undefined) spec.eolOhms = input.eolOhms;
  if (input.alarmOhms !== undefined) spec.alarmOhms = input.alarmOhms;
  if (input.sharedOhms !== undefined) spec.sharedOhms = input.sharedOhms;
  return spec;
}

function analyzeInput(ri: ResolvedInput, type: InputType, analyze: AnalyzeLoop, memo: GenerationMemo<LoopAnalysis>): LoopAnalysis {
  const spec = loopSpecFor(ri, type);
  return memo.get(`${type.id}|${JSON.stringify(spec)}`, () => analyze(spec, type));
}

const FAULT_KINDS = ["short-panel", "short-detector", "cut"] as const;

export function isCovered(a: LoopAnalysis): boolean {
  return a.valid !== false && FAULT_KINDS.every((f) => a.faults[f] === "detected");
}

export function checkLoops(
  r: Resolved,
  analyze: AnalyzeLoop,
  memo: GenerationMemo<LoopAnalysis>,
  analyses: Map<string, LoopAnalysis>,
  out: Finding[],
): Pick<SolveResult, "inputs" | "shared" | "coverage"> {
  const inputs: InputFigures[] = [];
  const shared: SharedInputFigures[] = [];
  let anyLifeSafety = false;
  for (const ri of r.inputs) {
    const { input } = ri;
    const target: FindingTarget = { kind: "input", boardKey: input.boardKey, input: input.input };
    const where = `${ri.board.name}, input ${input.input}`;
    const type = ri.board.inputType;
    const longestCableM = Math.max(...ri.detectors.map((d) => d.sched.cableM));
    const fig: InputFigures = { boardKey: input.boardKey, input: input.input, detectorIds: ri.detectors.map((d) => d.sched.id), scheme: input.scheme, inputTypeId: ri.board.inputTypeId, longestCableM, loop: null, covered: false };
    inputs.push(fig);

    if (input.scheme === "shared")
      for (const d of ri.detectors)
        if (!isLifeSafety(d.cat) && d.sched.supervision !== "shared-ok")
          out.push({
            code: "shared-not-wanted",
            severity: "warning",
            message: `${d.sched.label} is on shared ${where}, but its schedule asks for ${d.sched.supervision}`,
            why: "The device schedule says this detector should have an input of its own.",
            target,
          });
    if (input.scheme !== "shared") {
      const rank = { none: 0, "single-eol": 1, "double-eol": 2, shared: 1 } as const;
      for (const d of ri.detectors)
        if (d.sched.supervision !== "shared-ok" && rank[input.scheme] < rank[d.sched.supervision])
          out.push({
            code: "supervision-below-preference",
            severity: "note",
            message: `${d.sched.label} is wired ${input.scheme} on ${where}; its schedule asks for ${d.sched.supervision}`,
            why: "The loop gives less supervision than the device schedule asks for.",
            target,
          });
    }

    // The engine's own findings where it can run: not on an unknown input type, a scheme the type lacks, or a detector count the capacity rules reject.
    const runnable = type && type.schemes.includes(input.scheme) && input.detectorIds.length <= (input.scheme === "shared" ? 2 : 1) && (input.scheme !== "shared" || ri.detectors.length === 2);
    const analysis = type && runnable ? analyzeInput(ri, type, analyze, memo) : null;
    const engineCodes = new Set(analysis?.findings.map((f) => f.code));
    if (analysis) {
      analyses.set(`${input.boardKey}#${input.input}`, analysis);
      for (const f of analysis.findings) out.push({ ...f, message: `${where}: ${f.message}`, target });
    }
    const life = ri.detectors.filter((d) => isLifeSafety(d.cat));
    if (life.length) anyLifeSafety = true;
    const lifeNames = listNames(life.map((d) => d.sched.label));
    if (life.length && input.scheme === "shared" && !engineCodes.has("life-safety-shared"))
      out.push({
        code: "life-safety-shared",
        severity: "error",
        message: `${where} shares one input between ${lifeNames} (a life-safety device) and another detector`,
        why: "A fault on a shared loop takes out both detectors, and a fire device must report on its own supervised input. Give it an input of its own; the local fire code and the authority having jurisdiction decide how fire devices are wired.",
        target,
      });
    if (life.length && type && !type.lifeSafety && !engineCodes.has("life-safety-input-type"))
      out.push({
        code: "life-safety-input-type",
        severity: "error",
        message: `${lifeNames} on ${where}, an input of type ${type.name}, which is not rated for life-safety devices`,
        why: "Only an input type rated for fire devices supervises and reports them as the fire code expects. Move it to such an input; the local fire code and the authority having jurisdiction decide.",
        target,
      });
    if (!analysis) continue;
    fig.loop = {
      faults: analysis.faults,
      maxCableM: analysis.maxCableM,
      uncertain: analysis.rows.some((row) => row.uncertain),
      errors: analysis.findings.filter((f) => f.severity === "error").length,
      warnings: analysis.findings.filter((f) => f.severity === "warning").length,
    };
    fig.covered = isCovered(analysis);
    if (input.scheme === "shared") {
      const lost = FAULT_KINDS.filter((f) => analysis.faults[f] !== "detected") as Fault[];
      shared.push({ boardKey: input.boardKey, input: input.input, detectorIds: fig.detectorIds, lost });
      out.push({
        code: "shared-input-tradeoff",
        severity: "note",
        message: `${where} carries ${listNames(ri.detectors.map((d) => d.sched.label))}: saves 1 input; ${lost.length ? `${lost.join(", ")} not reported as such` : "shorts and cuts are still reported"}, and one cable fault silences both`,
        why: analysis.sharedLost?.length ? analysis.sharedLost.join(" ") : "Two detectors on one loop share its faults: a cut or short on the common cable takes both out at once.",
        target,
      });
    }
  }
  if (anyLifeSafety)
    out.push({
      code: "life-safety-caution",
      severity: "note",
      message: "This layout includes life-safety (fire) devices",
      why: "Fire detection wiring, supervision and power are governed by the local fire code and the authority having jurisdiction, and must be designed, installed and commissioned under licensed practice. Loopwright is an aid, not an approval.",
      target: { kind: "layout" },
    });
  const used = inputs.length;
  const covered = inputs.filter((i) => i.covered).length;
  if (used > covered)
    out.push({
      code: "supervision-coverage",
      severity: "note",
      message: `${covered} of ${used} used inputs (${Math.round((100 * covered) / used)} %) report both a short and a cut as themselves`,
      why: "On the other inputs some wiring faults read as normal or as an alarm, so a damaged or tampered loop can go unnoticed.",
      target: { kind: "layout" },
    });
  return {
    inputs,
    shared: { inputs: shared.length, inputsSaved: shared.length, entries: shared },
    coverage: { used, covered, share: used ? covered / used : null },
  };
}
