import { describe, expect, it } from "vitest";
import { dismissRefused, enqueue, flushQueue, isRetryable, readQueue, readRefused, queueKey, waitingText, type KeyValueStore, type QueuedReading } from "@/components/commissioning/reading-queue";

// The commissioning screen's waiting list: a reading that could not be sent stays in the browser until the server has it.

function memoryStore(): KeyValueStore & { data: Map<string, string> } {
  const data = new Map<string, string>();
  return { data, getItem: (k) => data.get(k) ?? null, setItem: (k, v) => void data.set(k, v) };
}

const reading = (clientId: string, test = "rest", reading = "4k7") => ({ clientId, boardKey: "panel", input: 3, test, reading });
const at = (s: number) => new Date(Date.UTC(2026, 11, 1, 9, 0, s));

describe("the waiting list", () => {
  it("keeps each client id once", () => {
    const s = memoryStore();
    enqueue(s, 7, reading("a"), at(1));
    enqueue(s, 7, reading("a", "short", "12"), at(2));
    expect(readQueue(s, 7)).toEqual([{ ...reading("a"), queuedAt: at(1).toISOString(), attempts: 0, lastError: null }]);
  });

  it("is kept per layout", () => {
    const s = memoryStore();
    enqueue(s, 7, reading("a"));
    enqueue(s, 8, reading("b"));
    expect(readQueue(s, 7).map((r) => r.clientId)).toEqual(["a"]);
    expect(readQueue(s, 8).map((r) => r.clientId)).toEqual(["b"]);
  });

  it("reads a damaged entry as empty instead of failing", () => {
    const s = memoryStore();
    s.setItem(queueKey(7), "{not json");
    expect(readQueue(s, 7)).toEqual([]);
    s.setItem(queueKey(7), JSON.stringify([{ clientId: 5 }, { ...reading("ok"), queuedAt: "x", attempts: 0, lastError: null }]));
    expect(readQueue(s, 7).map((r) => r.clientId)).toEqual(["ok"]);
  });

  it("still answers when the storage refuses to write (full or disabled)", () => {
    const s: KeyValueStore = { getItem: () => null, setItem: () => { throw new Error("QuotaExceededError"); } };
    expect(enqueue(s, 7, reading("a")).map((r) => r.clientId)).toEqual(["a"]);
  });

  it("counts in words", () => {
    expect(waitingText(0)).toBe("Every reading is sent.");
    expect(waitingText(1)).toBe("1 reading waiting to send");
    expect(waitingText(2)).toBe("2 readings waiting to send");
  });
});

describe("sending the waiting readings", () => {
  it("sends oldest first and drops each one the server stored", async () => {
    const s = memoryStore();
    enqueue(s, 7, reading("b"), at(2));
    enqueue(s, 7, reading("a"), at(1));
    const sent: string[] = [];
    const r = await flushQueue(s, 7, async (q) => (sent.push(q.clientId), { kind: "saved", result: q.clientId.toUpperCase() }));
    expect(sent).toEqual(["a", "b"]);
    expect(r.saved.map((x) => x.result)).toEqual(["A", "B"]);
    expect(r.waiting).toEqual([]);
    expect(readQueue(s, 7)).toEqual([]);
  });

  it("stops at the first reading that must be retried and keeps it and the rest, counting the attempt", async () => {
    const s = memoryStore();
    enqueue(s, 7, reading("a"), at(1));
    enqueue(s, 7, reading("b"), at(2));
    const sent: string[] = [];
    const r = await flushQueue(s, 7, async (q) => (sent.push(q.clientId), { kind: "retry", error: "no network" }));
    expect(sent).toEqual(["a"]);
    expect(r.waiting.map((x) => [x.clientId, x.attempts, x.lastError])).toEqual([
      ["a", 1, "no network"],
      ["b", 0, null],
    ]);
  });

  it("moves a refused reading to the refused list with the server's reason, and sends the next", async () => {
    const s = memoryStore();
    enqueue(s, 7, reading("a", "rest", "12 Ω?"), at(1));
    enqueue(s, 7, reading("b"), at(2));
    const r = await flushQueue(s, 7, async (q): Promise<{ kind: "saved"; result: string } | { kind: "refused"; error: string }> => (q.clientId === "a" ? { kind: "refused", error: "not a reading" } : { kind: "saved", result: "ok" }), () => at(9));
    expect(r.saved.map((x) => x.item.clientId)).toEqual(["b"]);
    expect(r.refused).toMatchObject([{ clientId: "a", reason: "not a reading", refusedAt: at(9).toISOString() }]);
    expect(readRefused(s, 7).map((x) => x.clientId)).toEqual(["a"]);
    expect(readQueue(s, 7)).toEqual([]);
    expect(dismissRefused(s, 7, "a")).toEqual([]);
  });

  it("keeps a reading queued while a send is under way", async () => {
    const s = memoryStore();
    enqueue(s, 7, reading("a"), at(1));
    await flushQueue(s, 7, async () => {
      enqueue(s, 7, reading("late"), at(5));
      return { kind: "saved", result: null };
    });
    expect(readQueue(s, 7).map((q: QueuedReading) => q.clientId)).toEqual(["late"]);
  });

  it("retries when there is no answer, a server fault, a timeout or a rate limit; a refusal is final", () => {
    for (const s of [null, 500, 502, 503, 504, 408, 429]) expect(isRetryable(s), String(s)).toBe(true);
    for (const s of [400, 401, 403, 404, 409, 413, 415, 422]) expect(isRetryable(s), String(s)).toBe(false);
  });
});
