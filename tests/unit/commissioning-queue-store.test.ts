import { describe, expect, it } from "vitest";
import { createQueueStore } from "@/components/commissioning/queue-store";
import { queueKey, readQueue, readRefused, type KeyValueStore, type QueuedReading, type SendOutcome } from "@/components/commissioning/reading-queue";

// The store behind the commissioning screen's waiting list: one per mount, its listeners inside it.

function memoryStore(): KeyValueStore {
  const data = new Map<string, string>();
  return { getItem: (k) => data.get(k) ?? null, setItem: (k, v) => void data.set(k, v) };
}

const reading = (clientId: string, test = "rest") => ({ clientId, boardKey: "panel", input: 3, test, reading: "4k7" });
const at = (s: number) => new Date(Date.UTC(2026, 11, 1, 9, 0, s));

/** A send the test answers by hand, to hold a round open. */
function heldSend() {
  const calls: { item: QueuedReading; answer: (o: SendOutcome<string>) => void }[] = [];
  const send = (item: QueuedReading) => new Promise<SendOutcome<string>>((answer) => calls.push({ item, answer }));
  return { calls, send };
}

const tick = () => new Promise((r) => setTimeout(r, 0));

describe("the queue store", () => {
  it("gives the same snapshot while nothing changed, and a new one after a change", () => {
    const storage = memoryStore();
    const store = createQueueStore({ storage, layoutId: 7, send: async () => ({ kind: "retry", error: "offline" }) });
    const first = store.getSnapshot();
    expect(store.getSnapshot()).toBe(first);
    expect(first).toEqual({ waiting: [], refused: [], lastTry: null });
    store.add(reading("a"));
    const second = store.getSnapshot();
    expect(second).not.toBe(first);
    expect(second.waiting.map((r) => r.clientId)).toEqual(["a"]);
    expect(store.getSnapshot()).toBe(second);
  });

  it("tells its subscribers of an added and a dismissed reading, until they unsubscribe", () => {
    const store = createQueueStore({ storage: memoryStore(), layoutId: 7, send: async () => ({ kind: "saved", result: "" }) });
    let heard = 0;
    const off = store.subscribe(() => heard++);
    store.add(reading("a"));
    store.dismiss("a");
    expect(heard).toBe(2);
    off();
    store.add(reading("b"));
    expect(heard).toBe(2);
  });

  it("reads a write from another tab once told to (a storage event)", () => {
    const storage = memoryStore();
    const store = createQueueStore({ storage, layoutId: 7, send: async () => ({ kind: "retry", error: "" }) });
    let heard = 0;
    store.subscribe(() => heard++);
    expect(store.getSnapshot().waiting).toEqual([]);
    const other = createQueueStore({ storage, layoutId: 7, send: async () => ({ kind: "retry", error: "" }) });
    other.add(reading("from-other-tab"));
    expect(heard).toBe(0); // stores share no listeners
    store.notify();
    expect(heard).toBe(1);
    expect(store.getSnapshot().waiting.map((r) => r.clientId)).toEqual(["from-other-tab"]);
  });

  it("sends what is waiting, passes the server's answers to its saved listeners and notes the time of the try", async () => {
    const storage = memoryStore();
    const store = createQueueStore({ storage, layoutId: 7, send: async (q) => ({ kind: "saved", result: q.clientId.toUpperCase() }), now: () => at(30) });
    const saved: string[][] = [];
    store.onSaved((r) => saved.push(r));
    store.add(reading("a"));
    store.add(reading("b", "short"));
    await store.flush();
    expect(saved).toEqual([["A", "B"]]);
    expect(readQueue(storage, 7)).toEqual([]);
    expect(store.getSnapshot()).toMatchObject({ waiting: [], lastTry: at(30) });
  });

  it("calls no saved listener for a round that stored nothing, and keeps the reading with its error", async () => {
    const store = createQueueStore({ storage: memoryStore(), layoutId: 7, send: async () => ({ kind: "retry", error: "no connection to the server" }) });
    let calls = 0;
    store.onSaved(() => calls++);
    store.add(reading("a"));
    await store.flush();
    expect(calls).toBe(0);
    expect(store.getSnapshot().waiting).toMatchObject([{ clientId: "a", attempts: 1, lastError: "no connection to the server" }]);
  });

  it("moves a refused reading to the refused list, and dismisses it", async () => {
    const storage = memoryStore();
    const store = createQueueStore({ storage, layoutId: 7, send: async () => ({ kind: "refused", error: "not a reading" }) });
    store.add(reading("a"));
    await store.flush();
    expect(store.getSnapshot().refused).toMatchObject([{ clientId: "a", reason: "not a reading" }]);
    store.dismiss("a");
    expect(readRefused(storage, 7)).toEqual([]);
    expect(store.getSnapshot().refused).toEqual([]);
  });

  it("sends one reading at a time: a flush during a round asks for one more round instead of a second send", async () => {
    const { calls, send } = heldSend();
    const store = createQueueStore({ storage: memoryStore(), layoutId: 7, send });
    store.add(reading("a"));
    const first = store.flush();
    await tick();
    expect(calls.map((c) => c.item.clientId)).toEqual(["a"]);
    store.add(reading("b"));
    await store.flush(); // returns at once: the running round will go round again
    expect(calls).toHaveLength(1);
    calls[0].answer({ kind: "saved", result: "A" });
    await tick();
    expect(calls.map((c) => c.item.clientId)).toEqual(["a", "b"]);
    calls[1].answer({ kind: "saved", result: "B" });
    await first;
    expect(store.getSnapshot().waiting).toEqual([]);
  });

  it("keeps each layout's list apart", () => {
    const storage = memoryStore();
    createQueueStore({ storage, layoutId: 7, send: async () => ({ kind: "retry", error: "" }) }).add(reading("a"));
    const eight = createQueueStore({ storage, layoutId: 8, send: async () => ({ kind: "retry", error: "" }) });
    expect(eight.getSnapshot().waiting).toEqual([]);
    expect(storage.getItem(queueKey(7))).toContain('"a"');
  });
});
