import type { Worker } from "node:worker_threads";

// A small pool of worker threads for CPU-heavy jobs, so that they never hold the request loop. Jobs queue in
// order; the queue is bounded, a job waits in it for a bounded time and runs for a bounded time. Each refusal
// is a WorkerPoolBusy error, which the caller turns into 503 "busy, try again". Inputs and outputs are plain
// data (structured clone).

export interface WorkerPoolOptions {
  /** Threads at most, made when first needed. */
  size: number;
  /** Jobs waiting for a thread at most; one more is refused at once. */
  maxQueue: number;
  /** How long a job may wait for a thread, ms. */
  queueTimeoutMs: number;
  /** How long a job may run, ms; past it the thread is ended and replaced. */
  runTimeoutMs: number;
  create: () => Worker;
}

export type WorkerPoolBusyReason = "queue-full" | "queue-timeout" | "run-timeout" | "closed";

export class WorkerPoolBusy extends Error {
  constructor(readonly reason: WorkerPoolBusyReason) {
    super(`worker pool refused the job: ${reason}`);
  }
}

/** The job threw in the worker, or the worker stopped under it: a fault of the program, not of the request. */
export class WorkerJobFailed extends Error {}

export interface JobRequest {
  id: number;
  job: string;
  input: unknown;
}

export type JobReply = { id: number; ok: true; value: unknown } | { id: number; ok: false; error: string };

interface Task {
  id: number;
  job: string;
  input: unknown;
  resolve: (v: unknown) => void;
  reject: (e: Error) => void;
  timer?: NodeJS.Timeout;
}

interface Slot {
  worker: Worker;
  task: Task | null;
  /** The thread has loaded its code; its start-up does not count against a job's run time. */
  online: boolean;
}

export class WorkerPool {
  private slots: Slot[] = [];
  private queue: Task[] = [];
  private nextId = 1;
  private closed = false;

  constructor(private readonly o: WorkerPoolOptions) {}

  /** Figures for tests and benches. */
  stats() {
    return { threads: this.slots.length, busy: this.slots.filter((s) => s.task).length, queued: this.queue.length };
  }

  run<T>(job: string, input: unknown): Promise<T> {
    if (this.closed) return Promise.reject(new WorkerPoolBusy("closed"));
    const idle = this.slots.some((s) => !s.task) || this.slots.length < this.o.size;
    if (!idle && this.queue.length >= this.o.maxQueue) return Promise.reject(new WorkerPoolBusy("queue-full"));
    return new Promise<T>((resolve, reject) => {
      const task: Task = { id: this.nextId++, job, input, resolve: resolve as (v: unknown) => void, reject };
      task.timer = setTimeout(() => {
        const i = this.queue.indexOf(task);
        if (i >= 0) this.queue.splice(i, 1);
        reject(new WorkerPoolBusy("queue-timeout"));
      }, this.o.queueTimeoutMs);
      this.queue.push(task);
      this.dispatch();
    });
  }

  /** Ends every thread; queued and running jobs are refused. */
  async close(): Promise<void> {
    this.closed = true;
    for (const t of this.queue.splice(0)) {
      clearTimeout(t.timer);
      t.reject(new WorkerPoolBusy("closed"));
    }
    const slots = this.slots.splice(0);
    for (const s of slots) this.settle(s, (t) => t.reject(new WorkerPoolBusy("closed")));
    await Promise.all(slots.map((s) => s.worker.terminate()));
  }

  private dispatch(): void {
    while (this.queue.length) {
      const slot = this.slots.find((s) => !s.task) ?? (this.slots.length < this.o.size ? this.spawn() : null);
      if (!slot) return;
      const task = this.queue.shift()!;
      clearTimeout(task.timer);
      slot.task = task;
      slot.worker.ref();
      if (slot.online) this.startRunTimer(slot);
      try {
        slot.worker.postMessage({ id: task.id, job: task.job, input: task.input } satisfies JobRequest);
      } catch (e) {
        // the input cannot be cloned: the caller's mistake, the thread is fine
        this.settle(slot, (t) => t.reject(e instanceof Error ? e : new Error(String(e))));
      }
    }
  }

  private startRunTimer(slot: Slot): void {
    if (slot.task) slot.task.timer = setTimeout(() => this.retire(slot, new WorkerPoolBusy("run-timeout")), this.o.runTimeoutMs);
  }

  private spawn(): Slot {
    const slot: Slot = { worker: this.o.create(), task: null, online: false };
    slot.worker.unref();
    slot.worker.once("online", () => {
      slot.online = true;
      this.startRunTimer(slot);
    });
    slot.worker.on("message", (m: JobReply) => {
      if (!slot.task || m.id !== slot.task.id) return;
      this.settle(slot, (t) => (m.ok ? t.resolve(m.value) : t.reject(new WorkerJobFailed(m.error))));
      this.dispatch();
    });
    slot.worker.on("error", (e) => this.retire(slot, new WorkerJobFailed(`worker thread failed: ${e.message}`), false));
    slot.worker.on("exit", (code) => this.retire(slot, new WorkerJobFailed(`worker thread exited with code ${code}`), false));
    this.slots.push(slot);
    return slot;
  }

  /** The slot's task is done: clear its timer, free the slot, then tell the caller. */
  private settle(slot: Slot, finish: (t: Task) => void): void {
    const t = slot.task;
    if (!t) return;
    clearTimeout(t.timer);
    slot.task = null;
    slot.worker.unref();
    finish(t);
  }

  /** Take the slot out of the pool (ending its thread when asked), refuse its task, and go on with the queue. */
  private retire(slot: Slot, why: Error, terminate = true): void {
    const i = this.slots.indexOf(slot);
    if (i < 0) return;
    this.slots.splice(i, 1);
    this.settle(slot, (t) => t.reject(why));
    if (terminate) void slot.worker.terminate();
    if (!this.closed) this.dispatch();
  }
}
