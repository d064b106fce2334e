import type { Catalog } from "@/lib/catalog/schema";
import { severityRank, type Finding } from "@/lib/findings";
import type { AnalyzeLoop, LoopAnalysis } from "@/lib/loop/types";
import { indexCatalog } from "@/lib/layout/catalog-index";
import type { InputRef, LayoutDocument } from "@/lib/layout/schema";
import type { Schedule, ScheduleDetector } from "@/lib/schedule/schema";
import { checkBus } from "@/lib/solver/bus-rules";
import { capacityFigures } from "@/lib/solver/capacity-rules";
import { collectLoops, inputKey, inputOutcome, type InputOutcome } from "@/lib/solver/loop-rules";
import { GenerationMemo } from "@/lib/solver/memo";
import { checkPower, type PowerMemo, type VoltageEntry } from "@/lib/solver/power-rules";
import { resolveLayout, unplacedFinding, type DetectorCache, type Resolved, type ResolvedInput } from "@/lib/solver/resolve";
import { patchResolve, resolveState, type ResolveState } from "@/lib/solver/resolve-patch";
import type { SolveResult, Solver } from "@/lib/solver/types";
import { checkGrade, gradeFigures } from "@/lib/solver/grade-rules";
import { checkOutputs } from "@/lib/solver/output-rules";
import { resolveWireless } from "@/lib/solver/wireless-rules";
import { checkZones, type ZoneMemo } from "@/lib/solver/zone-rules";
import { documentParts, type SecurityGrade } from "@/lib/layout/schema";

// The solver with its caches, all keyed by content: each input's whole outcome (its findings, figures, loop
// analysis and current) by what the input holds, loop analyses by the loop description, detector voltages by
// detector and supply voltage. An edit re-analyses only the inputs it touched; the rest is sums over cached parts.

/** Patches in a row before a full solve, which also lets the memos forget what no edit uses any more. */
const MAX_PATCHES_IN_A_ROW = 500;

export function createSolverWith(analyze: AnalyzeLoop, schedule: Schedule, catalog: Catalog): Solver {
  const ix = indexCatalog(catalog);
  const byId = new Map<string, ScheduleDetector>(schedule.map((d) => [d.id, d]));
  const loopMemo = new GenerationMemo<LoopAnalysis>();
  const outcomeMemo = new GenerationMemo<InputOutcome>();
  const detectorCache: DetectorCache = new WeakMap();
  const voltageCache = new Map<string, VoltageEntry>();
  let last: { inputs: ResolvedInput[]; outcomes: InputOutcome[] } = { inputs: [], outcomes: [] };
  let lastStats = { inputsReused: 0, inputsRecomputed: 0, loopHits: 0, loopMisses: 0, patched: false };

  let state: ResolveState | null = null;
  let outcomeOf = new Map<ResolvedInput, InputOutcome>();
  let patchesSinceFull = 0;
  const powerMemo: PowerMemo = { touched: null, supplies: new Map(), inputs: new Map() };
  const zoneMemo: ZoneMemo = { entries: new Map(), reuse: false };

  function emptyResult(layout: LayoutDocument): SolveResult {
    return {
      findings: [],
      counts: { error: 0, warning: 0, note: 0 },
      boards: [],
      totals: { inputsTotal: 0, inputsUsed: 0, inputsFree: 0, zonesUsed: 0, maxZones: 0, detectorsPlaced: 0, unplacedIds: schedule.map((d) => d.id), unplacedWirelessIds: schedule.filter((d) => ix.wirelessDetectors.has(d.catalogId)).map((d) => d.id) },
      bus: null,
      supplies: [],
      detectors: [],
      inputs: [],
      shared: { inputs: 0, inputsSaved: 0, entries: [] },
      coverage: { used: 0, covered: 0, share: null },
      battery: null,
      zones: [],
      areas: [],
      outputs: [],
      outputDevices: [],
      receivers: [],
      grade: layout.grade ? gradeFigures(layout.grade as SecurityGrade) : null,
    };
  }

  /** Every rule over a resolved layout; `out` already holds the resolution's findings. */
  function rules(layout: LayoutDocument, r: Resolved, outcomes: InputOutcome[], out: Finding[], touched: Set<string> | null): SolveResult {
    for (const o of outcomes) for (const f of o.contentFindings) out.push(f);
    const wireless = resolveWireless(r, byId, out);
    const learnt = new Map(wireless.receivers.map((w) => [w.boardKey, w.detectorIds.length]));
    const { boards, totals } = capacityFigures(r, schedule, out, learnt);
    const bus = checkBus(r, layout.busCableM, out);
    const { outputs, loads } = checkOutputs(r, out);
    powerMemo.touched = touched;
    const power = checkPower(r, outcomes, layout.power, voltageCache, out, loads, powerMemo);
    const loops = collectLoops(outcomes, out);
    const grade = layout.grade ? gradeFigures(layout.grade as SecurityGrade) : null;
    if (grade) checkGrade(grade, layout.power.standbyProfileId, r.inputs, out);
    zoneMemo.reuse = touched !== null;
    const { zones, areas } = checkZones(r, wireless.placed, grade, out, zoneMemo);
    return { findings: out, counts: { error: 0, warning: 0, note: 0 }, boards, totals, bus, ...power, ...loops, outputs, receivers: wireless.receivers, zones, areas, grade };
  }

  /** The previous solve patched: only the inputs the edit added are resolved and analysed. */
  function solvePatched(layout: LayoutDocument): { r: Resolved; outcomes: InputOutcome[]; out: Finding[]; touched: Set<string> | null } | null {
    const patch = state && patchesSinceFull < MAX_PATCHES_IN_A_ROW ? patchResolve(state, layout, ix, byId) : null;
    if (!patch) return null;
    patchesSinceFull++;
    state = patch.state;
    const r = patch.state.r;
    if (documentParts(layout).wireless.length) r.placed = new Set(r.placed); // the wireless rules add to it
    const next = new Map<ResolvedInput, InputOutcome>();
    let kept = 0;
    const outcomes = r.inputs.map((ri) => {
      let o = outcomeOf.get(ri);
      if (o) kept++;
      else o = outcomeMemo.get(inputKey(ri), () => inputOutcome(ri, analyze, loopMemo));
      next.set(ri, o);
      return o;
    });
    outcomeOf = next;
    lastStats = { inputsReused: kept + outcomeMemo.hits, inputsRecomputed: outcomeMemo.misses, loopHits: loopMemo.hits, loopMisses: loopMemo.misses, patched: true };
    return { r, outcomes, out: [...patch.state.findings], touched: patch.touched };
  }

  function solveFully(layout: LayoutDocument): { r: Resolved | null; outcomes: InputOutcome[]; out: Finding[]; touched: Set<string> | null } {
    const out: Finding[] = [];
    const r = resolveLayout(layout, ix, byId, out, detectorCache);
    const outcomes = r ? r.inputs.map((ri) => outcomeMemo.get(inputKey(ri), () => inputOutcome(ri, analyze, loopMemo))) : [];
    lastStats = { inputsReused: outcomeMemo.hits, inputsRecomputed: outcomeMemo.misses, loopHits: loopMemo.hits, loopMisses: loopMemo.misses, patched: false };
    state = r ? resolveState(layout, r, [...out]) : null;
    patchesSinceFull = 0;
    outcomeOf = new Map();
    if (r && state) for (let i = 0; i < outcomes.length; i++) outcomeOf.set(r.inputs[i], outcomes[i]);
    return { r, outcomes, out, touched: null };
  }

  function solve(layout: LayoutDocument): SolveResult {
    const { r, outcomes, out, touched } = solvePatched(layout) ?? solveFully(layout);
    let result: SolveResult;
    if (!r) {
      const un = unplacedFinding(schedule);
      if (un) out.push(un);
      result = emptyResult(layout);
    } else result = rules(layout, r, outcomes, out, touched);
    // Errors first, then warnings, then notes; rule order kept within a severity.
    const bySeverity: Finding[][] = [[], [], []];
    for (const f of out) bySeverity[severityRank[f.severity]].push(f);
    result.findings = bySeverity[0].concat(bySeverity[1], bySeverity[2]);
    result.counts = { error: bySeverity[0].length, warning: bySeverity[1].length, note: bySeverity[2].length };
    // A patch adds its few entries to the memos' live generation, so a later full solve still finds every input.
    const patched = patchesSinceFull > 0;
    loopMemo.endGeneration(patched);
    outcomeMemo.endGeneration(patched);
    last = { inputs: r?.inputs ?? [], outcomes };
    return result;
  }

  return {
    solve,
    analysisFor: (ref: InputRef) => {
      const i = last.inputs.findIndex((ri) => ri.input.boardKey === ref.boardKey && ri.input.input === ref.input);
      return i < 0 ? null : last.outcomes[i].analysis;
    },
    stats: () => lastStats,
  };
}
