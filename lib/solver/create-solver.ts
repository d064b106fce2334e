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
import { checkPower, type VoltageEntry } from "@/lib/solver/power-rules";
import { resolveLayout, unplacedFinding, type DetectorCache, type ResolvedInput } from "@/lib/solver/resolve";
import type { SolveResult, Solver } from "@/lib/solver/types";
import { checkGrade, gradeFigures } from "@/lib/solver/grade-rules";
import { checkOutputs } from "@/lib/solver/output-rules";
import { resolveWireless } from "@/lib/solver/wireless-rules";
import { checkZones } from "@/lib/solver/zone-rules";
import type { SecurityGrade } from "@/lib/layout/schema";

// The solver with its caches, all keyed by content: each input's whole outcome (its findings, figures, loop
// analysis and current) by what the input holds, loop analyses by the loop description, detector voltages by
// detector and supply voltage. An edit re-analyses only the inputs it touched; the rest is sums over cached parts.

export function createSolverWith(analyze: AnalyzeLoop, schedule: Schedule, catalog: Catalog): Solver {
  const ix = indexCatalog(catalog);
  const byId = new Map<string, ScheduleDetector>(schedule.map((d) => [d.id, d]));
  const loopMemo = new GenerationMemo<LoopAnalysis>();
  const outcomeMemo = new GenerationMemo<InputOutcome>();
  const detectorCache: DetectorCache = new WeakMap();
  const voltageCache = new Map<string, VoltageEntry>();
  let last: { inputs: ResolvedInput[]; outcomes: InputOutcome[] } = { inputs: [], outcomes: [] };
  let lastStats = { inputsReused: 0, inputsRecomputed: 0, loopHits: 0, loopMisses: 0 };

  function solve(layout: LayoutDocument): SolveResult {
    const out: Finding[] = [];
    const r = resolveLayout(layout, ix, byId, out, detectorCache);
    let result: SolveResult;
    let outcomes: InputOutcome[] = [];
    if (!r) {
      const un = unplacedFinding(schedule);
      if (un) out.push(un);
      result = {
        findings: out,
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
    } else {
      outcomes = r.inputs.map((ri) => outcomeMemo.get(inputKey(ri), () => inputOutcome(ri, analyze, loopMemo)));
      for (const o of outcomes) for (const f of o.contentFindings) out.push(f);
      const wireless = resolveWireless(r, byId, out);
      const learnt = new Map(wireless.receivers.map((w) => [w.boardKey, w.detectorIds.length]));
      const { boards, totals } = capacityFigures(r, schedule, out, learnt);
      const bus = checkBus(r, layout.busCableM, out);
      const { outputs, loads } = checkOutputs(r, out);
      const power = checkPower(r, outcomes, layout.power, voltageCache, out, loads);
      const loops = collectLoops(outcomes, out);
      const grade = layout.grade ? gradeFigures(layout.grade as SecurityGrade) : null;
      if (grade) checkGrade(grade, layout.power.standbyProfileId, r.inputs, out);
      const { zones, areas } = checkZones(r, wireless.placed, grade, out);
      result = { findings: out, counts: { error: 0, warning: 0, note: 0 }, boards, totals, bus, ...power, ...loops, outputs, receivers: wireless.receivers, zones, areas, grade };
    }
    // Errors first, then warnings, then notes; rule order kept within a severity.
    const bySeverity: Finding[][] = [[], [], []];
    for (const f of out) bySeverity[severityRank[f.severity]].push(f);
    result.findings = bySeverity.flat();
    result.counts = { error: bySeverity[0].length, warning: bySeverity[1].length, note: bySeverity[2].length };
    lastStats = { inputsReused: outcomeMemo.hits, inputsRecomputed: outcomeMemo.misses, loopHits: loopMemo.hits, loopMisses: loopMemo.misses };
    loopMemo.endGeneration();
    outcomeMemo.endGeneration();
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
