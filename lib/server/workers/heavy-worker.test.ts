import { existsSync, mkdirSync, readdirSync, readFileSync } from "node:fs";
import { join } from "node:path";
import { Worker } from "node:worker_threads";
import { build } from "esbuild";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { shippedCatalog } from "@/lib/catalog/shipped";
import { commissioningProgress } from "@/lib/commissioning/progress";
import type { Schedule } from "@/lib/schedule/schema";
import { buildTerminalSheet } from "@/lib/sheet/build-sheet";
import { midLayout, midSchedule } from "@/lib/sheet/testing/sample-layouts";
import { highsSolver } from "@/lib/solver/highs-loader";
import { suggestExact } from "@/lib/solver/suggest-exact";
import { commissioningReportPdf } from "@/lib/server/pdf/commissioning-report-pdf";
import { terminalSheetPdf } from "@/lib/server/pdf/terminal-sheet-pdf";
import { pdfWithoutVolatile } from "@/lib/server/workers/testing/pdf-volatile";
import { suggestOffLoop, terminalSheetPdfOffLoop } from "@/lib/server/workers/off-loop";
import { WorkerJobFailed, WorkerPool } from "@/lib/server/workers/worker-pool";

// The real worker entry on a real thread: heavy.worker.ts bundled to JavaScript here (esbuild, as the production
// build does with Turbopack), its answers compared with the same functions run in this thread. The bundle goes
// under node_modules/.cache so its external packages (pdfkit) resolve as they do for the server.

const root = process.cwd();
const { catalog } = shippedCatalog();
const types = ["contact-door-surface", "motion-wall", "contact-window-surface", "motion-ceiling"];
const schedule: Schedule = Array.from({ length: 41 }, (_, i) => ({
  id: `d${i + 1}`,
  label: `Detector ${i + 1}`,
  catalogId: types[i % types.length],
  area: `Floor ${1 + Math.floor(i / 20)}`,
  room: `Room ${1 + (i % 20)}`,
  cableM: 10 + (i % 40),
  gauge: { awg: 22 },
  supervision: "single-eol",
}));
const sheet = buildTerminalSheet(midLayout, midSchedule, catalog);
const meta = { siteName: "Test depot", layoutName: "Option A", revision: 3, generatedAt: "2026-12-01" };

let pool: WorkerPool;
beforeAll(async () => {
  const dir = join(root, "node_modules", ".cache", "loopwright-worker-test");
  mkdirSync(dir, { recursive: true });
  const outfile = join(dir, "heavy.worker.mjs");
  await build({
    entryPoints: [join(root, "lib/server/workers/heavy.worker.ts")],
    outfile,
    bundle: true,
    platform: "node",
    format: "esm",
    target: "node20",
    packages: "external",
    // server-only as in the server's bundles, where it exports nothing
    alias: { "server-only": join(root, "tests/support/server-only-stub.ts") },
    tsconfig: join(root, "tsconfig.json"),
    logLevel: "error",
  });
  pool = new WorkerPool({ size: 1, maxQueue: 4, queueTimeoutMs: 120_000, runTimeoutMs: 120_000, create: () => new Worker(outfile) });
}, 120_000);
afterAll(() => pool?.close());

describe("heavy.worker.ts on a worker thread", { timeout: 120_000 }, () => {
  it("suggests the same hardware as the exact model in this thread, both ways (HiGHS loads inside the worker)", async () => {
    for (const allowShared of [false, true]) {
      const here = suggestExact(await highsSolver(), schedule, catalog, { allowShared });
      expect(here.proof).toMatchObject({ method: "exact-model", optimal: true });
      expect(here.found).toBe(true);
      expect(await pool.run("suggest", { schedule, catalog, opts: { allowShared } })).toEqual(here);
    }
  });

  it("builds and lays out the same terminal sheet PDF, byte for byte apart from its creation date and file id", async () => {
    const here = await terminalSheetPdf(sheet, meta, "LETTER");
    const there = await pool.run<Uint8Array>("terminalSheetPdf", { document: midLayout, schedule: midSchedule, catalog, meta, size: "LETTER" });
    expect(there.byteLength).toBe(here.byteLength);
    expect(pdfWithoutVolatile(there)).toBe(pdfWithoutVolatile(here));
  });

  it("lays out the same commissioning record PDF", async () => {
    const report = commissioningProgress(sheet, []);
    const rmeta = { ...meta, caution: sheet.caution };
    const photos = [{ boardKey: "panel", input: 1, fileName: "door.jpg", sizeBytes: 2048, takenBy: "Test installer", takenAt: "2026-12-01 10:12" }];
    const here = await commissioningReportPdf(report, rmeta, photos, "A4");
    const there = await pool.run<Uint8Array>("commissioningReportPdf", { report, meta: rmeta, photos, size: "A4" });
    expect(pdfWithoutVolatile(there)).toBe(pdfWithoutVolatile(here));
  });

  it.skipIf(!existsSync("/proc/self/task"))("runs at a lower priority than the thread that made it (Linux nice per thread)", async () => {
    await pool.run("suggest", { schedule: schedule.slice(0, 2), catalog, opts: { allowShared: false } });
    // proc(5): field 19 of /proc/[pid]/task/[tid]/stat is the nice value; the text after ") " starts at field 3
    const nice = (tid: string) => Number(readFileSync(`/proc/self/task/${tid}/stat`, "utf8").split(") ")[1].split(" ")[16]);
    const mine = nice(String(process.pid));
    expect(readdirSync("/proc/self/task").map(nice)).toContain(Math.min(19, mine + 10));
  });

  it("answers an unknown job with an error, and the thread goes on", async () => {
    await expect(pool.run("format-disk", {})).rejects.toThrow(WorkerJobFailed);
    await expect(pool.run("suggest", { schedule: [], catalog, opts: { allowShared: false } })).resolves.toMatchObject({ found: expect.any(Boolean) });
  });
});

describe("off-loop jobs outside the Next server", { timeout: 120_000 }, () => {
  it("run in place with the same results, as a Buffer for PDFs", async () => {
    expect(process.env.NEXT_RUNTIME).toBeUndefined();
    expect(await suggestOffLoop(schedule, catalog, { allowShared: true })).toEqual(suggestExact(await highsSolver(), schedule, catalog, { allowShared: true }));
    const pdf = await terminalSheetPdfOffLoop(midLayout, midSchedule, catalog, meta, "A4");
    expect(Buffer.isBuffer(pdf)).toBe(true);
    expect(pdfWithoutVolatile(pdf)).toBe(pdfWithoutVolatile(await terminalSheetPdf(sheet, meta, "A4")));
  });
});
