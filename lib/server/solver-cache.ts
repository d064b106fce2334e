import { createHash } from "node:crypto";
import type { Catalog } from "@/lib/catalog/schema";
import type { LayoutDocument } from "@/lib/layout/schema";
import type { Schedule } from "@/lib/schedule/schema";
import { createSolver, type Solver, type SolveResult } from "@/lib/solver";

// A save re-solves the whole layout, yet most of it is what the layout's previous save solved. One solver per
// recently saved layout keeps its analyses between saves (the solver re-analyses only the inputs that changed;
// solver-properties.test.ts holds it to the full solve). A solver is bound to one schedule and one catalog, so
// a changed schedule (by content) or another catalog object starts a fresh one. Per process; bounded.

const MAX_LAYOUTS = 32;

interface Entry {
  solver: Solver;
  scheduleSha: string;
  catalog: Catalog;
}

const solvers = new Map<number, Entry>();

function scheduleSha(schedule: Schedule): string {
  return createHash("sha256").update(JSON.stringify(schedule)).digest("base64");
}

/** Solve a layout's document with the solver kept for that layout, or a fresh one when its inputs changed. */
export function solveLayoutKept(layoutId: number, doc: LayoutDocument, schedule: Schedule, catalog: Catalog): SolveResult {
  const sha = scheduleSha(schedule);
  let entry = solvers.get(layoutId);
  if (!entry || entry.scheduleSha !== sha || entry.catalog !== catalog) entry = { solver: createSolver(schedule, catalog), scheduleSha: sha, catalog };
  solvers.delete(layoutId); // re-inserted last: the map's order is least recently used first
  solvers.set(layoutId, entry);
  while (solvers.size > MAX_LAYOUTS) solvers.delete(solvers.keys().next().value!);
  return entry.solver.solve(doc);
}

/** How many layouts have a kept solver, and what the last solve of one reused (for tests). */
export function keptSolvers(): { count: number; statsOf: (layoutId: number) => ReturnType<Solver["stats"]> | null } {
  return { count: solvers.size, statsOf: (layoutId) => solvers.get(layoutId)?.solver.stats() ?? null };
}
