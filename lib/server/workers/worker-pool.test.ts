import { Worker } from "node:worker_threads";
import { afterEach, describe, expect, it } from "vitest";
import { WorkerJobFailed, WorkerPool, WorkerPoolBusy, type WorkerPoolOptions } from "@/lib/server/workers/worker-pool";

// The pool's rules with a small plain-JavaScript worker: answers, the bounded queue, both timeouts, a failing
// job and a dying thread.

const WORKER_CODE = `
const { parentPort } = require("node:worker_threads");
parentPort.on("message", ({ id, job, input }) => {
  if (job === "echo") parentPort.postMessage({ id, ok: true, value: input });
  else if (job === "spin") {
    const end = Date.now() + input;
    while (Date.now() < end);
    parentPort.postMessage({ id, ok: true, value: "spun " + input });
  } else if (job === "fail") parentPort.postMessage({ id, ok: false, error: "bad input" });
  else if (job === "exit") process.exit(3);
  else if (job === "thread") parentPort.postMessage({ id, ok: true, value: require("node:worker_threads").threadId });
});
`;

const pools: WorkerPool[] = [];
function makePool(o: Partial<WorkerPoolOptions> = {}): WorkerPool {
  const p = new WorkerPool({ size: 1, maxQueue: 4, queueTimeoutMs: 20_000, runTimeoutMs: 20_000, create: () => new Worker(WORKER_CODE, { eval: true }), ...o });
  pools.push(p);
  return p;
}
afterEach(async () => {
  await Promise.all(pools.splice(0).map((p) => p.close()));
});

const refusal = (p: Promise<unknown>) => p.then(() => null, (e: unknown) => e);

describe("WorkerPool", { timeout: 60_000 }, () => {
  it("answers each job with the worker's result, passed as structured clone", async () => {
    const p = makePool({ size: 2 });
    const input = { ohms: Infinity, at: new Date(0), bands: ["yellow", "violet"], nested: { m: new Map([["a", 1]]) } };
    const [a, b] = await Promise.all([p.run("echo", input), p.run("echo", 42)]);
    expect(a).toEqual(input);
    expect(a).not.toBe(input);
    expect(b).toBe(42);
    expect(p.stats()).toEqual({ threads: 2, busy: 0, queued: 0 });
  });

  it("runs queued jobs in order on the free thread and refuses one past the queue bound at once", async () => {
    const p = makePool({ size: 1, maxQueue: 2 });
    const running = p.run("spin", 300);
    const queued = [p.run("echo", 1), p.run("echo", 2)];
    expect(p.stats()).toMatchObject({ busy: 1, queued: 2 });
    const over = await refusal(p.run("echo", 3));
    expect(over).toBeInstanceOf(WorkerPoolBusy);
    expect((over as WorkerPoolBusy).reason).toBe("queue-full");
    expect(await running).toBe("spun 300");
    expect(await Promise.all(queued)).toEqual([1, 2]);
  });

  it("refuses a job that waited too long for a thread", async () => {
    const p = makePool({ size: 1, queueTimeoutMs: 100 });
    const running = p.run("spin", 600);
    const waited = await refusal(p.run("echo", 1));
    expect(waited).toBeInstanceOf(WorkerPoolBusy);
    expect((waited as WorkerPoolBusy).reason).toBe("queue-timeout");
    expect(await running).toBe("spun 600");
    expect(p.stats().queued).toBe(0);
  });

  it("ends a thread whose job runs too long, refuses that job, and carries on with a new thread", async () => {
    const p = makePool({ size: 1, runTimeoutMs: 200 });
    const first = await p.run<number>("thread", null);
    const stuck = await refusal(p.run("spin", 5_000));
    expect(stuck).toBeInstanceOf(WorkerPoolBusy);
    expect((stuck as WorkerPoolBusy).reason).toBe("run-timeout");
    const second = await p.run<number>("thread", null);
    expect(second).not.toBe(first);
    expect(p.stats().threads).toBe(1);
  });

  it("rejects a failing job with the worker's message, and survives a thread that exits", async () => {
    const p = makePool({ size: 1 });
    const failed = await refusal(p.run("fail", null));
    expect(failed).toBeInstanceOf(WorkerJobFailed);
    expect((failed as Error).message).toBe("bad input");
    const died = await refusal(p.run("exit", null));
    expect(died).toBeInstanceOf(WorkerJobFailed);
    expect((died as Error).message).toMatch(/exited with code 3/);
    expect(await p.run("echo", "still here")).toBe("still here");
  });

  it("refuses input that cannot be cloned without losing the thread", async () => {
    const p = makePool({ size: 1 });
    const bad = await refusal(p.run("echo", { f: () => 1 }));
    expect(bad).toBeInstanceOf(Error);
    expect(bad).not.toBeInstanceOf(WorkerPoolBusy);
    expect(await p.run("echo", 7)).toBe(7);
  });

  it("refuses everything after close", async () => {
    const p = makePool();
    await p.close();
    const r = await refusal(p.run("echo", 1));
    expect((r as WorkerPoolBusy).reason).toBe("closed");
  });
});
