import { commissioningProgress, type CommissioningProgressReport, type LoopProgress, type LoopStatus, type RecordedReading } from "@/lib/commissioning/progress";
import type { EffectiveReview } from "@/lib/review/effective-state";
import type { SheetBoard, SheetInput, TerminalSheet } from "@/lib/sheet/sheet-types";

export const STATUS_WORDS: Record<LoopStatus, string> = { untested: "not tested", incomplete: "some tests left", failed: "failed", passed: "passed", "cannot-test": "cannot be tested" };

/** The inputs to test: every used input of the sheet, board by board. */
export function rowsToTest(sheet: TerminalSheet | null): SheetInput[] {
  return sheet ? sheet.boards.flatMap((b) => b.rows.filter((r): r is SheetInput => !r.spare)) : [];
}

/** Boards with at least one used input. */
export function boardsToTest(sheet: TerminalSheet | null): SheetBoard[] {
  return sheet ? sheet.boards.filter((b) => b.rows.some((r) => !r.spare)) : [];
}

/** Progress from the readings on screen (so a saved reading counts at once); the server's figure when there is no sheet. */
export function progressOf(sheet: TerminalSheet | null, readings: readonly RecordedReading[], serverProgress: CommissioningProgressReport): CommissioningProgressReport {
  return sheet ? commissioningProgress(sheet, readings) : serverProgress;
}

export const loopsOfBoard = (progress: CommissioningProgressReport, boardKey: string): LoopProgress[] => progress.loops.filter((l) => l.boardKey === boardKey);

export const loopProgressOf = (progress: CommissioningProgressReport, boardKey: string, input: number): LoopProgress | null =>
  progress.loops.find((l) => l.boardKey === boardKey && l.input === input) ?? null;

export const allLoopsPassed = (progress: CommissioningProgressReport) => progress.totals.loops > 0 && progress.totals.passed === progress.totals.loops;

/** The approved revision has been marked commissioned: its record is closed to new readings. */
export const isCommissioned = (review: EffectiveReview, revision: number | null) => review.commissionedRevision !== null && review.commissionedRevision === revision;

/** The line under the site's count: what is left, in words. */
export function progressDetail(revision: number, t: CommissioningProgressReport["totals"]): string {
  return [
    `revision ${revision}`,
    t.failed ? ` · ${t.failed} failed` : "",
    t.incomplete ? ` · ${t.incomplete} with tests left` : "",
    t.untested ? ` · ${t.untested} not tested` : "",
    t.cannotTest ? ` · ${t.cannotTest} cannot be tested` : "",
  ].join("");
}
