import type { InputType } from "@/lib/catalog/schema";
import type { Finding, FindingTarget } from "@/lib/findings";
import { loopSpecKey } from "@/lib/loop/loop-key";
import type { AnalyzeLoop, Fault, LoopAnalysis, LoopSpec } from "@/lib/loop/types";
import { inputContentFindings } from "@/lib/solver/capacity-rules";
import { listNames } from "@/lib/solver/format";
import type { GenerationMemo } from "@/lib/solver/memo";
import { isLifeSafety, type ResolvedInput } from "@/lib/solver/resolve";
import type { InputFigures, SharedInputFigures, SolveResult } from "@/lib/solver/types";
import { FAULT_WORDS, SUPERVISION_WORDS, wiredWords } from "@/lib/vocabulary/words";

// Every used input through the loop engine, plus the rules about sharing and life-safety devices.

/** Conductor temperature range assumed for a loop inside a building, °C (common practice, no published source). */
export const LOOP_TEMP_MIN_C = 10;
export const LOOP_TEMP_MAX_C = 40;
/** Resistance of one closed contact, ohms (from memory: a clean reed or relay contact is well under this). */
export const CONTACT_OHMS = 0.1;

/** The loop as the engine sees it: the input's wiring, its detectors, the longest cable run among them. */
export function loopSpecFor(ri: Pick<ResolvedInput, "input" | "detectors">, inputType: InputType): LoopSpec {
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
  if (input.pathway === "class-a") spec.pathway = "class-a";
  return spec;
}

/** Text with its length in front, so joined keys cannot run into each other whatever the text holds. */
const part = (s: string) => `${s.length}:${s}`;

/** Everything the loop analysis depends on, as one string: the input type and the loop's canonical key. */
export function loopKey(type: InputType, spec: LoopSpec): string {
  return `${part(type.id)}|${loopSpecKey(spec)}`;
}

/** Everything an input's outcome depends on, given a fixed schedule and catalog. */
export function inputKey(ri: ResolvedInput): string {
  const c = keyCache.get(ri.input);
  if (c && sameInput(c, ri)) return c.key;
  const key = buildInputKey(ri);
  const { input } = ri;
  keyCache.set(input, { key, boardKey: input.boardKey, n: input.input, name: ri.board.name, typeId: ri.board.inputTypeId, scheme: input.scheme, placement: input.placement, pathway: input.pathway, eol: input.eolOhms, alarm: input.alarmOhms, shared: input.sharedOhms && [...input.sharedOhms], count: input.detectorIds.length, ids: ri.detectors.map((d) => d.sched.id) });
  return key;
}

// The key string of an input object, kept while the object lives, and checked field by field so that an input
// changed in place is still seen as changed. Reusing the same string also reuses its hash in the cache lookups.
interface KeyEntry {
  key: string;
  boardKey: string;
  n: number;
  name: string;
  typeId: string | null;
  scheme: string;
  placement: string;
  pathway: string | undefined;
  eol: number | undefined;
  alarm: number | undefined;
  shared: number[] | undefined;
  count: number;
  ids: string[];
}
const keyCache = new WeakMap<object, KeyEntry>();

function sameInput(c: KeyEntry, ri: ResolvedInput): boolean {
  const { input } = ri;
  if (c.boardKey !== input.boardKey || c.n !== input.input || c.name !== ri.board.name || c.typeId !== ri.board.inputTypeId) return false;
  if (c.scheme !== input.scheme || c.placement !== input.placement || c.pathway !== input.pathway || c.eol !== input.eolOhms || c.alarm !== input.alarmOhms || c.count !== input.detectorIds.length) return false;
  if ((c.shared === undefined) !== (input.sharedOhms === undefined) || (c.shared && (c.shared[0] !== input.sharedOhms![0] || c.shared[1] !== input.sharedOhms![1]))) return false;
  if (c.ids.length !== ri.detectors.length) return false;
  for (let i = 0; i < c.ids.length; i++) if (c.ids[i] !== ri.detectors[i].sched.id) return false;
  return true;
}

function buildInputKey(ri: ResolvedInput): string {
  const { input } = ri;
  let k = `${part(input.boardKey)}|${input.input}|${part(ri.board.name)}|${part(ri.board.inputTypeId ?? "")}|${input.scheme}|${input.placement}|${input.pathway ?? "class-b"}|${input.eolOhms}|${input.alarmOhms}|${input.sharedOhms}|${input.detectorIds.length}`;
  for (const d of ri.detectors) k += `|${part(d.sched.id)}`;
  return k;
}

const FAULT_KINDS = ["short-panel", "short-detector", "cut"] as const;

export function isCovered(a: LoopAnalysis): boolean {
  return a.valid !== false && FAULT_KINDS.every((f) => a.faults[f] === "detected");
}

/** What one input contributes to a solve. Cached whole, so an unchanged input costs one lookup. */
export interface InputOutcome {
  contentFindings: Finding[];
  loopFindings: Finding[];
  fig: InputFigures;
  shared: SharedInputFigures | null;
  lifeSafety: boolean;
  restMa: number;
  alarmMa: number;
  analysis: LoopAnalysis | null;
}

export function inputOutcome(ri: ResolvedInput, analyze: AnalyzeLoop, loopMemo: GenerationMemo<LoopAnalysis>): InputOutcome {
  const { input } = ri;
  const target: FindingTarget = { kind: "input", boardKey: input.boardKey, input: input.input };
  const where = `${ri.board.name}, input ${input.input}`;
  const type = ri.board.inputType;
  const out: Finding[] = [];
  let restMa = 0;
  let alarmMa = 0;
  let longestCableM = 0;
  for (const d of ri.detectors) {
    if (d.cat.power) {
      restMa += d.cat.power.standbyMa;
      alarmMa += d.cat.power.alarmMa;
    }
    if (d.sched.cableM > longestCableM) longestCableM = d.sched.cableM;
  }
  const fig: InputFigures = { boardKey: input.boardKey, input: input.input, detectorIds: ri.detectors.map((d) => d.sched.id), scheme: input.scheme, inputTypeId: ri.board.inputTypeId, pathway: input.pathway ?? "class-b", longestCableM, loop: null, covered: false };

  if (input.scheme === "shared")
    for (const d of ri.detectors)
      if (!isLifeSafety(d.cat) && d.sched.supervision !== "shared-ok")
        out.push({
          code: "shared-not-wanted",
          severity: "warning",
          message: `${d.sched.label} is on ${where}, a shared input, but its schedule asks for ${SUPERVISION_WORDS[d.sched.supervision]}`,
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
          message: `${d.sched.label} is ${wiredWords(input.scheme)} on ${where}; its schedule asks for ${SUPERVISION_WORDS[d.sched.supervision]}`,
          why: "The loop gives less supervision than the device schedule asks for.",
          target,
        });
  }

  // The engine runs unless the input type is unknown, lacks the scheme, or the detector count is wrong (the capacity rules say so).
  const runnable = type && type.schemes.includes(input.scheme) && input.detectorIds.length <= (input.scheme === "shared" ? 2 : 1) && (input.scheme !== "shared" || ri.detectors.length === 2);
  let analysis: LoopAnalysis | null = null;
  if (type && runnable) {
    const spec = loopSpecFor(ri, type);
    analysis = loopMemo.get(loopKey(type, spec), () => analyze(spec, type));
    for (const f of analysis.findings) out.push({ ...f, message: `${where}: ${f.message}`, target });
  }
  const life = ri.detectors.filter((d) => isLifeSafety(d.cat));
  if (life.length) {
    const engineCodes = new Set(analysis?.findings.map((f) => f.code));
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
  }
  let shared: SharedInputFigures | null = null;
  if (analysis) {
    let errors = 0;
    let warnings = 0;
    for (const f of analysis.findings) {
      if (f.severity === "error") errors++;
      else if (f.severity === "warning") warnings++;
    }
    fig.loop = { faults: analysis.faults, maxCableM: analysis.maxCableM, uncertain: analysis.rows.some((row) => row.uncertain), errors, warnings };
    if (analysis.classA) fig.loop.classAEveryDeviceReported = analysis.classA.everyDeviceReported;
    fig.covered = isCovered(analysis);
    if (input.scheme === "shared") {
      const lost = FAULT_KINDS.filter((f) => analysis.faults[f] !== "detected") as Fault[];
      shared = { boardKey: input.boardKey, input: input.input, detectorIds: fig.detectorIds, lost };
      out.push({
        code: "shared-input-tradeoff",
        severity: "note",
        message: `${where} carries ${listNames(ri.detectors.map((d) => d.sched.label))}: saves 1 input; ${lost.length ? `${lost.map((f) => FAULT_WORDS[f as keyof typeof FAULT_WORDS]).join(", ")} not reported as such` : "shorts and cuts are still reported"}, and one cable fault silences both`,
        why: analysis.sharedLost?.length ? analysis.sharedLost.join(" ") : "Two detectors on one loop share its faults: a cut or short on the common cable takes both out at once.",
        target,
      });
    }
  }
  return { contentFindings: inputContentFindings(ri), loopFindings: out, fig, shared, lifeSafety: life.length > 0, restMa, alarmMa, analysis };
}

/** Loop findings, figures and supervision coverage from the inputs' outcomes. */
export function collectLoops(outcomes: InputOutcome[], out: Finding[]): Pick<SolveResult, "inputs" | "shared" | "coverage"> {
  const inputs: InputFigures[] = [];
  const shared: SharedInputFigures[] = [];
  let anyLifeSafety = false;
  let covered = 0;
  for (const o of outcomes) {
    for (const f of o.loopFindings) out.push(f);
    inputs.push(o.fig);
    if (o.shared) shared.push(o.shared);
    if (o.lifeSafety) anyLifeSafety = true;
    if (o.fig.covered) covered++;
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
  if (used > covered)
    out.push({
      code: "supervision-coverage",
      severity: "note",
      message: `${covered} of ${used} used inputs (${Math.round((100 * covered) / used)} %) report both a short and a cut as themselves`,
      why: "On the other inputs some wiring faults read as normal or as an alarm, so a damaged or tampered loop can go unnoticed.",
      target: { kind: "layout" },
    });
  return { inputs, shared: { inputs: shared.length, inputsSaved: shared.length, entries: shared }, coverage: { used, covered, share: used ? covered / used : null } };
}
