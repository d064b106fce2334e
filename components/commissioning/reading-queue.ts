import { plural } from "@/lib/vocabulary/plural";
// Readings that could not be sent yet, kept in the browser's storage so a reading taken in a plant room without
// signal is never lost. Each has the client id it was made with: the server stores a client id once, so sending
// one again after a lost answer is safe.

export interface QueuedReading {
  clientId: string;
  boardKey: string;
  input: number;
  test: string;
  /** As typed: "4k7", "4.71k", "OL". */
  reading: string;
  queuedAt: string;
  attempts: number;
  lastError: string | null;
}

export interface RefusedReading extends QueuedReading {
  refusedAt: string;
  reason: string;
}

/** The part of the Storage API used here (localStorage in the browser, a map in tests). */
export interface KeyValueStore {
  getItem(key: string): string | null;
  setItem(key: string, value: string): void;
}

export const queueKey = (layoutId: number) => `loopwright:readings-waiting:${layoutId}`;
export const refusedKey = (layoutId: number) => `loopwright:readings-refused:${layoutId}`;

function readList<T extends QueuedReading>(store: KeyValueStore, key: string): T[] {
  try {
    const v = JSON.parse(store.getItem(key) ?? "[]");
    return Array.isArray(v) ? v.filter((x): x is T => !!x && typeof x.clientId === "string" && typeof x.reading === "string") : [];
  } catch {
    return [];
  }
}

function writeList(store: KeyValueStore, key: string, list: readonly QueuedReading[]): boolean {
  try {
    store.setItem(key, JSON.stringify(list));
    return true;
  } catch {
    return false; // storage full or disabled: the caller keeps the list in memory
  }
}

export const readQueue = (store: KeyValueStore, layoutId: number) => readList<QueuedReading>(store, queueKey(layoutId));
export const readRefused = (store: KeyValueStore, layoutId: number) => readList<RefusedReading>(store, refusedKey(layoutId));

/** Adds a reading to the waiting list (once per client id); returns the list. */
export function enqueue(store: KeyValueStore, layoutId: number, r: Omit<QueuedReading, "attempts" | "lastError" | "queuedAt"> & Partial<Pick<QueuedReading, "queuedAt" | "lastError">>, now = new Date()): QueuedReading[] {
  const list = readQueue(store, layoutId);
  if (!list.some((x) => x.clientId === r.clientId)) list.push({ queuedAt: now.toISOString(), lastError: null, ...r, attempts: 0 });
  writeList(store, queueKey(layoutId), list);
  return list;
}

export function dismissRefused(store: KeyValueStore, layoutId: number, clientId: string): RefusedReading[] {
  const list = readRefused(store, layoutId).filter((x) => x.clientId !== clientId);
  writeList(store, refusedKey(layoutId), list);
  return list;
}

export type SendOutcome<T> = { kind: "saved"; result: T } | { kind: "retry"; error: string } | { kind: "refused"; error: string };

/** Whether a failed send is worth trying again: no answer, a server fault, a timeout or a rate limit. A 4xx refusal is final. */
export function isRetryable(status: number | null): boolean {
  return status === null || status >= 500 || status === 408 || status === 429;
}

export interface FlushResult<T> {
  saved: { item: QueuedReading; result: T }[];
  refused: RefusedReading[];
  waiting: QueuedReading[];
}

/**
 * Sends the waiting readings oldest first. A saved one leaves the list; a refused one moves to the refused list
 * with its reason; at the first one that should be retried (no network) the rest wait for the next try.
 */
export async function flushQueue<T>(store: KeyValueStore, layoutId: number, send: (r: QueuedReading) => Promise<SendOutcome<T>>, now: () => Date = () => new Date()): Promise<FlushResult<T>> {
  const saved: FlushResult<T>["saved"] = [];
  const refused: RefusedReading[] = [];
  const pending = readQueue(store, layoutId).sort((a, b) => a.queuedAt.localeCompare(b.queuedAt));
  for (const item of pending) {
    const out = await send(item);
    // Re-read each time: another tab, or a reading queued meanwhile, may have changed the list.
    const list = readQueue(store, layoutId);
    if (out.kind === "retry") {
      writeList(store, queueKey(layoutId), list.map((x) => (x.clientId === item.clientId ? { ...x, attempts: x.attempts + 1, lastError: out.error } : x)));
      break;
    }
    writeList(store, queueKey(layoutId), list.filter((x) => x.clientId !== item.clientId));
    if (out.kind === "saved") saved.push({ item, result: out.result });
    else {
      const r: RefusedReading = { ...item, attempts: item.attempts + 1, lastError: out.error, refusedAt: now().toISOString(), reason: out.error };
      refused.push(r);
      writeList(store, refusedKey(layoutId), [...readRefused(store, layoutId).filter((x) => x.clientId !== r.clientId), r]);
    }
  }
  return { saved, refused, waiting: readQueue(store, layoutId) };
}

export function waitingText(n: number): string {
  return n === 0 ? "Every reading is sent." : `${plural(n, "reading")} waiting to send`;
}
