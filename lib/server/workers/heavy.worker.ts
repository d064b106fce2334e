import { getPriority, setPriority } from "node:os";
import { parentPort } from "node:worker_threads";
import type { JobReply, JobRequest } from "@/lib/server/workers/worker-pool";
import { isHeavyJobName, runHeavyJob } from "@/lib/server/workers/heavy-jobs";

// The worker thread's entry: one job at a time from the pool, answered with its result or its error message.
// Bundled by the production build as its own entry chunk (see off-loop.ts).

const port = parentPort;
if (!port) throw new Error("heavy.worker.ts runs only as a worker thread");

// Linux keeps a nice value per thread (pid 0 here is this thread), and the kernel shares a core between the threads
// of one process by it: a heavy job yields to the request loop whenever cores are short. Elsewhere pid 0 would
// mean the whole server, so the priority stays as it is.
if (process.platform === "linux") {
  try {
    setPriority(0, Math.min(19, getPriority(0) + 10));
  } catch {
    // not allowed here: the job runs at the server's priority
  }
}

port.on("message", async ({ id, job, input }: JobRequest) => {
  let reply: JobReply;
  try {
    if (!isHeavyJobName(job)) throw new Error(`no such job: ${job}`);
    reply = { id, ok: true, value: await runHeavyJob(job, input as never) };
  } catch (e) {
    reply = { id, ok: false, error: e instanceof Error ? `${e.message}\n${e.stack ?? ""}` : String(e) };
  }
  port.postMessage(reply);
});
