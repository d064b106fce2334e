import type { Severity } from "@/lib/findings";
import type { LayoutDocument } from "@/lib/layout/schema";
import type { SolveResult } from "@/lib/solver";

// What is stored with each layout revision: the server's solve of it, in brief.

export interface LayoutSolveSummary {
  counts: Record<Severity, number>;
  inputsUsed: number;
  inputsTotal: number;
  zonesUsed: number;
  maxZones: number;
  detectorsPlaced: number;
  unplaced: number;
  sharedInputs: number;
  /** Share of used inputs on which a short and a cut are both reported as themselves; null with no inputs used. */
  coverage: number | null;
  panelId: string;
  boards: number;
  /** The first findings, for lists and the history; the editor solves the whole layout itself. */
  findings: { code: string; severity: Severity; message: string }[];
}

const MAX_SUMMARY_FINDINGS = 20;

export function summarizeSolve(doc: LayoutDocument, r: SolveResult): LayoutSolveSummary {
  return {
    counts: r.counts,
    inputsUsed: r.totals.inputsUsed,
    inputsTotal: r.totals.inputsTotal,
    zonesUsed: r.totals.zonesUsed,
    maxZones: r.totals.maxZones,
    detectorsPlaced: r.totals.detectorsPlaced,
    unplaced: r.totals.unplacedIds.length,
    sharedInputs: r.shared.inputs,
    coverage: r.coverage.share,
    panelId: doc.panelId,
    boards: doc.boards.length,
    findings: r.findings.slice(0, MAX_SUMMARY_FINDINGS).map((f) => ({ code: f.code, severity: f.severity, message: f.message })),
  };
}
