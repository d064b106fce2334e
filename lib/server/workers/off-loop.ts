import "server-only";
import { availableParallelism } from "node:os";
import { Worker } from "node:worker_threads";
import type { Catalog } from "@/lib/catalog/schema";
import type { CommissioningProgressReport } from "@/lib/commissioning/progress";
import type { LayoutDocument } from "@/lib/layout/schema";
import type { Schedule } from "@/lib/schedule/schema";
import type { ExactOptions, ExactSuggestion } from "@/lib/solver/suggest-exact";
import { ApiError } from "@/lib/server/errors";
import type { ReportMeta, ReportPhoto } from "@/lib/server/pdf/commissioning-report-pdf";
import type { PageSize } from "@/lib/server/pdf/pdf-kit";
import type { SheetMeta } from "@/lib/server/pdf/terminal-sheet-pdf";
import type { HeavyJobName, HeavyJobs } from "@/lib/server/workers/heavy-jobs";
import { WorkerPool, WorkerPoolBusy } from "@/lib/server/workers/worker-pool";

// Hardware suggestions and PDF layouts take up to seconds of CPU: in the server they run on worker threads, so
// another user's request is never held behind them.
//
// Why this works after `next build && next start`: Turbopack (Next 16.2 and later) recognises
// `new Worker(new URL("./x.ts", import.meta.url))` from node:worker_threads, bundles x.ts with everything it
// imports as its own entry chunk beside the server chunks, and rewrites the call to that chunk's path; so the
// worker runs compiled JavaScript, needs no TypeScript loader at run time, and reads pdfkit and its fonts from
// the same places the server does. The call must stay literally in that form for the build to see it.
// Outside Next (vitest, tsx scripts) there is no bundle and Node 20 cannot start a .ts worker, so the same jobs
// run in place, their inputs and outputs still passed through structuredClone like a worker's messages; the
// jobs' code (pdfkit and its fonts among it) is imported only then, so the server's own thread never loads it.

const POOL_KEY = Symbol.for("loopwright.heavyWorkPool");
/** The build may give each route its own copy of this module; the pool is one per process. */
const holder = globalThis as typeof globalThis & { [POOL_KEY]?: WorkerPool };

function pool(): WorkerPool {
  return (holder[POOL_KEY] ??= new WorkerPool({
    // one core stays with the request loop
    size: Math.max(1, availableParallelism() - 1),
    maxQueue: 16,
    queueTimeoutMs: 30_000,
    runTimeoutMs: 120_000,
    create: () => new Worker(new URL("./heavy.worker.ts", import.meta.url)),
  }));
}

/** Inside the Next server (dev or production) the worker entry is bundled; elsewhere it is not. */
const bundled = () => process.env.NEXT_RUNTIME === "nodejs";

const BUSY = "The server is busy with other hardware suggestions and PDFs right now; try again in a moment.";
const TOO_LONG = "This took too long and was stopped; try again in a moment.";

async function offLoop<K extends HeavyJobName>(name: K, input: HeavyJobs[K]["input"]): Promise<HeavyJobs[K]["output"]> {
  if (!bundled()) {
    const { runHeavyJob } = await import("@/lib/server/workers/heavy-jobs");
    return structuredClone(await runHeavyJob(name, structuredClone(input)));
  }
  try {
    return await pool().run<HeavyJobs[K]["output"]>(name, input);
  } catch (e) {
    if (e instanceof WorkerPoolBusy) throw new ApiError(503, e.reason === "run-timeout" ? TOO_LONG : BUSY, undefined, { retryAfterS: 5 });
    throw e;
  }
}

/** A PDF's bytes from a worker arrive as a plain Uint8Array. */
const asBuffer = (u: Uint8Array) => (Buffer.isBuffer(u) ? u : Buffer.from(u.buffer, u.byteOffset, u.byteLength));

/** suggestExact (lib/solver), off the request loop. */
export function suggestOffLoop(schedule: Schedule, catalog: Catalog, opts: ExactOptions): Promise<ExactSuggestion> {
  return offLoop("suggest", { schedule, catalog, opts });
}

/** buildTerminalSheet (lib/sheet) then terminalSheetPdf (lib/server/pdf), off the request loop. */
export async function terminalSheetPdfOffLoop(document: LayoutDocument, schedule: Schedule, catalog: Catalog, meta: SheetMeta, size: PageSize = "A4"): Promise<Buffer> {
  return asBuffer(await offLoop("terminalSheetPdf", { document, schedule, catalog, meta, size }));
}

/** commissioningReportPdf (lib/server/pdf), off the request loop. */
export async function commissioningReportPdfOffLoop(report: CommissioningProgressReport, meta: ReportMeta, photos: readonly ReportPhoto[] = [], size: PageSize = "A4"): Promise<Buffer> {
  return asBuffer(await offLoop("commissioningReportPdf", { report, meta, photos: [...photos], size }));
}
