import type { Catalog } from "@/lib/catalog/schema";
import type { CommissioningProgressReport } from "@/lib/commissioning/progress";
import type { LayoutDocument } from "@/lib/layout/schema";
import type { Schedule } from "@/lib/schedule/schema";
import { buildTerminalSheet } from "@/lib/sheet/build-sheet";
import { highsSolver } from "@/lib/solver/highs-loader";
import { suggestExact, type ExactOptions, type ExactSuggestion } from "@/lib/solver/suggest-exact";
import { commissioningReportPdf, type ReportMeta, type ReportPhoto } from "@/lib/server/pdf/commissioning-report-pdf";
import type { PageSize } from "@/lib/server/pdf/pdf-kit";
import { terminalSheetPdf, type SheetMeta } from "@/lib/server/pdf/terminal-sheet-pdf";

// The CPU-heavy jobs, by name, each from plain data to plain data: what the worker thread runs, and what runs in
// place where there is no worker (tests and scripts run the TypeScript sources, see off-loop.ts).

export interface HeavyJobs {
  /** The exact model (HiGHS); the older search only as a fallback, said so in `proof`. */
  suggest: { input: { schedule: Schedule; catalog: Catalog; opts: ExactOptions }; output: ExactSuggestion };
  /** The sheet is built here too: for a few dozen loops that is tens of milliseconds of loop analysis. */
  terminalSheetPdf: { input: { document: LayoutDocument; schedule: Schedule; catalog: Catalog; meta: SheetMeta; size: PageSize }; output: Uint8Array };
  commissioningReportPdf: { input: { report: CommissioningProgressReport; meta: ReportMeta; photos: ReportPhoto[]; size: PageSize }; output: Uint8Array };
}

export type HeavyJobName = keyof HeavyJobs;

const jobs: { [K in HeavyJobName]: (input: HeavyJobs[K]["input"]) => HeavyJobs[K]["output"] | Promise<HeavyJobs[K]["output"]> } = {
  suggest: async ({ schedule, catalog, opts }) => suggestExact(await highsSolver(), schedule, catalog, opts),
  terminalSheetPdf: ({ document, schedule, catalog, meta, size }) => terminalSheetPdf(buildTerminalSheet(document, schedule, catalog), meta, size),
  commissioningReportPdf: ({ report, meta, photos, size }) => commissioningReportPdf(report, meta, photos, size),
};

export function isHeavyJobName(name: string): name is HeavyJobName {
  return Object.hasOwn(jobs, name);
}

export async function runHeavyJob<K extends HeavyJobName>(name: K, input: HeavyJobs[K]["input"]): Promise<HeavyJobs[K]["output"]> {
  return (jobs[name] as (i: HeavyJobs[K]["input"]) => HeavyJobs[K]["output"] | Promise<HeavyJobs[K]["output"]>)(input);
}
