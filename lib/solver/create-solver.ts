import type { Catalog } from "@/lib/catalog/schema";
import { severityRank, type Finding } from "@/lib/findings";
import type { AnalyzeLoop, LoopAnalysis } from "@/lib/loop/types";
import { indexCatalog } from "@/lib/layout/catalog-index";
import type { InputRef, LayoutDocument } from "@/lib/layout/schema";
import type { Schedule, ScheduleDetector } from "@/lib/schedule/schema";
import { checkBus } from "@/lib/solver/bus-rules";
import { capacityFigures, checkInputContents } from "@/lib/solver/capacity-rules";
import { checkLoops } from "@/lib/solver/loop-rules";
import { GenerationMemo } from "@/lib/solver/memo";
import { checkPower, type VoltageFigure } from "@/lib/solver/power-rules";
import { resolveLayout, unplacedFinding } from "@/lib/solver/resolve";
import type { SolveResult, Solver } from "@/lib/solver/types";

// The solver with its caches. Loop analyses are cached by the loop's content (input type and loop description),
// board current sums by the board's detectors, detector voltages by detector and supply voltage, so an edit
// re-analyses only the inputs it touched.

export function createSolverWith(analyze: AnalyzeLoop, schedule: Schedule, catalog: Catalog): Solver {
  const ix = indexCatalog(catalog);
  const byId = new Map<string, ScheduleDetector>(schedule.map((d) => [d.id, d]));
  const loopMemo = new GenerationMemo<LoopAnalysis>();
  const boardSums = new GenerationMemo<{ restMa: number; alarmMa: number }>();
  const voltage = new GenerationMemo<VoltageFigure>();
  let analyses = new Map<string, LoopAnalysis>();
  let lastStats = { loopHits: 0, loopMisses: 0 };

  function solve(layout: LayoutDocument): SolveResult {
    const out: Finding[] = [];
    const nextAnalyses = new Map<string, LoopAnalysis>();
    const r = resolveLayout(layout, ix, byId, out);
    let result: SolveResult;
    if (!r) {
      const un = unplacedFinding(schedule);
      if (un) out.push(un);
      result = {
        findings: out,
        counts: { error: 0, warning: 0, note: 0 },
        boards: [],
        totals: { inputsTotal: 0, inputsUsed: 0, inputsFree: 0, zonesUsed: 0, maxZones: 0, detectorsPlaced: 0, unplacedIds: schedule.map((d) => d.id) },
        bus: null,
        supplies: [],
        detectors: [],
        inputs: [],
        shared: { inputs: 0, inputsSaved: 0, entries: [] },
        coverage: { used: 0, covered: 0, share: null },
        battery: null,
      };
    } else {
      checkInputContents(r, out);
      const { boards, totals } = capacityFigures(r, schedule, out);
      const bus = checkBus(r, layout.busCableM, out);
      const power = checkPower(r, layout.power, { boardSums, voltage }, out);
      const loops = checkLoops(r, analyze, loopMemo, nextAnalyses, out);
      result = { findings: out, counts: { error: 0, warning: 0, note: 0 }, boards, totals, bus, ...power, ...loops };
    }
    // Stable sort: errors first, rule order kept within a severity.
    result.findings = out.map((f, i) => [f, i] as const).sort((a, b) => severityRank[a[0].severity] - severityRank[b[0].severity] || a[1] - b[1]).map(([f]) => f);
    for (const f of result.findings) result.counts[f.severity]++;
    lastStats = { loopHits: loopMemo.hits, loopMisses: loopMemo.misses };
    loopMemo.endGeneration();
    boardSums.endGeneration();
    voltage.endGeneration();
    analyses = nextAnalyses;
    return result;
  }

  return {
    solve,
    analysisFor: (ref: InputRef) => analyses.get(`${ref.boardKey}#${ref.input}`) ?? null,
    stats: () => lastStats,
  };
}
