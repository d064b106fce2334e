import type { Catalog } from "@/lib/catalog/schema";
import { analyzeLoop } from "@/lib/loop";
import type { LayoutDocument } from "@/lib/layout/schema";
import type { Schedule } from "@/lib/schedule/schema";
import { createSolverWith } from "@/lib/solver/create-solver";
import type { SolveResult, Solver } from "@/lib/solver/types";
import { withCapacityCheck } from "@/lib/solver/inputs-short-rule";

/** An incremental solver for the editor: keep one per (schedule, catalog) and call `solve` after every edit. */
export function createSolver(schedule: Schedule, catalog: Catalog): Solver {
  const solver = createSolverWith(analyzeLoop, schedule, catalog);
  return { ...solver, solve: (layout) => withCapacityCheck(solver.solve(layout)) };
}

/** One full solve with empty caches (the server on save). Gives the same result as an incremental solver. */
export function solveLayout(layout: LayoutDocument, schedule: Schedule, catalog: Catalog): SolveResult {
  return createSolver(schedule, catalog).solve(layout);
}

export type { BoardFigures, BusFigures, CapacityTotals, DetectorVoltage, InputFigures, LoopSummary, SharedInputFigures, SolveResult, Solver, SupplyFigures } from "@/lib/solver/types";
export { batteryAh } from "@/lib/solver/battery";
export { standbyProfiles, safetyFactors, standbyProfile, resolveStandby, CUSTOM_PROFILE_ID } from "@/lib/solver/standby-profiles";
export { loopSpecFor, LOOP_TEMP_MIN_C, LOOP_TEMP_MAX_C, CONTACT_OHMS } from "@/lib/solver/loop-rules";
export { suggestHardware, type SuggestOptions, type Suggestion, type SuggestionPart } from "@/lib/solver/suggest";
