import { dismissRefused, enqueue, flushQueue, readQueue, readRefused, queueKey, refusedKey, type KeyValueStore, type QueuedReading, type RefusedReading, type SendOutcome } from "@/components/commissioning/reading-queue";

// The waiting and refused lists of one layout as an external store for useSyncExternalStore: one store per mount of
// the screen, its listeners and its one-send-at-a-time flag held inside it rather than in the module.

/** How often the screen sends what is waiting, besides the browser's `online` event. */
export const RETRY_MS = 15_000;

export interface QueueSnapshot {
  waiting: QueuedReading[];
  refused: RefusedReading[];
  /** When the last round of sending ended; null before the first. */
  lastTry: Date | null;
}

export const EMPTY_QUEUE: QueueSnapshot = { waiting: [], refused: [], lastTry: null };

export interface QueueStoreOptions<T> {
  storage: KeyValueStore;
  layoutId: number;
  send: (r: QueuedReading) => Promise<SendOutcome<T>>;
  now?: () => Date;
}

export interface QueueStore<T> {
  readonly layoutId: number;
  subscribe(listener: () => void): () => void;
  /** The same object while nothing changed, as useSyncExternalStore requires. */
  getSnapshot(): QueueSnapshot;
  /** Called after each round of sending with what the server stored in it (never with an empty list). */
  onSaved(listener: (results: T[]) => void): () => void;
  /** Tell the subscribers to read again (another tab wrote to the storage). */
  notify(): void;
  add(r: Omit<QueuedReading, "attempts" | "lastError" | "queuedAt">): void;
  dismiss(clientId: string): void;
  /** Sends what is waiting; while a round runs, a second call asks for one more round instead of sending twice. */
  flush(): Promise<void>;
}

export function createQueueStore<T>({ storage, layoutId, send, now = () => new Date() }: QueueStoreOptions<T>): QueueStore<T> {
  const listeners = new Set<() => void>();
  const savedListeners = new Set<(results: T[]) => void>();
  let lastTry: Date | null = null;
  let cache: { waitingRaw: string; refusedRaw: string; lastTry: Date | null; snapshot: QueueSnapshot } | null = null;
  let flushing = false;
  let again = false;

  const notify = () => listeners.forEach((l) => l());

  function getSnapshot(): QueueSnapshot {
    const waitingRaw = storage.getItem(queueKey(layoutId)) ?? "[]";
    const refusedRaw = storage.getItem(refusedKey(layoutId)) ?? "[]";
    if (cache && cache.waitingRaw === waitingRaw && cache.refusedRaw === refusedRaw && cache.lastTry === lastTry) return cache.snapshot;
    const snapshot = { waiting: readQueue(storage, layoutId), refused: readRefused(storage, layoutId), lastTry };
    cache = { waitingRaw, refusedRaw, lastTry, snapshot };
    return snapshot;
  }

  async function flush(): Promise<void> {
    if (flushing) {
      again = true;
      return;
    }
    flushing = true;
    try {
      do {
        again = false;
        const r = await flushQueue(storage, layoutId, send, now);
        if (r.saved.length) {
          const results = r.saved.map((s) => s.result);
          savedListeners.forEach((l) => l(results));
        }
        lastTry = now();
        notify();
      } while (again);
    } finally {
      flushing = false;
    }
  }

  return {
    layoutId,
    subscribe(listener) {
      listeners.add(listener);
      return () => void listeners.delete(listener);
    },
    getSnapshot,
    onSaved(listener) {
      savedListeners.add(listener);
      return () => void savedListeners.delete(listener);
    },
    notify,
    add(r) {
      enqueue(storage, layoutId, r, now());
      notify();
    },
    dismiss(clientId) {
      dismissRefused(storage, layoutId, clientId);
      notify();
    },
    flush,
  };
}
