"use client";

import { useMemo } from "react";
import type { Catalog } from "@/lib/catalog/schema";
import type { LayoutDocument } from "@/lib/layout/schema";
import type { Schedule } from "@/lib/schedule/schema";
import { createSolver } from "@/lib/solver";
import { findingsByDomId, zoneNumbers } from "@/components/editor/editor-model";

/** The solve of the document being edited, redone on every change. */
export function useLiveSolve(doc: LayoutDocument, schedule: Schedule, catalog: Catalog) {
  // One solver per schedule and catalog: each edit re-analyses only the inputs it touched.
  const solver = useMemo(() => createSolver(schedule, catalog), [schedule, catalog]);
  const result = useMemo(() => solver.solve(doc), [solver, doc]);
  const zones = useMemo(() => zoneNumbers(result), [result]);
  const findingsAt = useMemo(() => findingsByDomId(result.findings), [result]);
  return { result, zones, findingsAt };
}
