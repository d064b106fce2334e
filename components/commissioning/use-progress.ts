"use client";

import { useMemo } from "react";
import type { CommissioningView } from "@/lib/server/commissioning";
import type { TerminalSheet } from "@/lib/sheet/sheet-types";
import { allLoopsPassed, boardsToTest, isCommissioned, progressOf, rowsToTest } from "@/components/commissioning/progress-view";

/** Where commissioning stands, from the sheet and the readings on screen. */
export function useProgress(sheet: TerminalSheet | null, view: CommissioningView) {
  const rows = useMemo(() => rowsToTest(sheet), [sheet]);
  const boards = useMemo(() => boardsToTest(sheet), [sheet]);
  const progress = useMemo(() => progressOf(sheet, view.readings, view.progress), [sheet, view.readings, view.progress]);
  return { rows, boards, progress, allPassed: allLoopsPassed(progress), commissioned: isCommissioned(view.review, view.revision) };
}
