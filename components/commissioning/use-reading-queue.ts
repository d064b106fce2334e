"use client";

import { useCallback, useEffect, useState, useSyncExternalStore } from "react";
import type { ReadingView, RecordResult } from "@/lib/server/commissioning";
import { browserStorage } from "@/components/commissioning/browser-storage";
import { newClientId } from "@/components/commissioning/client-id";
import { createQueueStore, EMPTY_QUEUE, RETRY_MS, type QueueStore } from "@/components/commissioning/queue-store";
import { sendReading } from "@/components/commissioning/send-reading";

function subscribeOnline(cb: () => void) {
  window.addEventListener("online", cb);
  window.addEventListener("offline", cb);
  return () => {
    window.removeEventListener("online", cb);
    window.removeEventListener("offline", cb);
  };
}

/**
 * Readings kept on the device until the server has them: each is written to the browser's storage first (it
 * survives a lost connection, a reload and a closed tab), then sent; what is waiting goes again every RETRY_MS and
 * as soon as the browser is back online. The server renders an empty list: the storage is the browser's.
 */
export function useReadingQueue(layoutId: number, onSaved: (readings: ReadingView[]) => void) {
  const make = (): QueueStore<RecordResult> => createQueueStore({ storage: browserStorage(), layoutId, send: (q) => sendReading(layoutId, q) });
  const [store, setStore] = useState(make);
  if (store.layoutId !== layoutId) setStore(make());

  useEffect(() => store.onSaved((results) => onSaved(results.map((r) => r.reading))), [store, onSaved]);

  // This tab's writes notify through the store; other tabs' writes arrive as "storage" events.
  const subscribe = useCallback(
    (cb: () => void) => {
      const off = store.subscribe(cb);
      const fromOtherTab = () => store.notify();
      window.addEventListener("storage", fromOtherTab);
      return () => {
        off();
        window.removeEventListener("storage", fromOtherTab);
      };
    },
    [store],
  );
  const { waiting, refused, lastTry } = useSyncExternalStore(subscribe, store.getSnapshot, () => EMPTY_QUEUE);
  const online = useSyncExternalStore(subscribeOnline, () => navigator.onLine, () => true);

  useEffect(() => {
    const send = () => void store.flush();
    send();
    const timer = window.setInterval(send, RETRY_MS);
    window.addEventListener("online", send);
    return () => {
      window.clearInterval(timer);
      window.removeEventListener("online", send);
    };
  }, [store]);

  /** Kept in storage first, then sent; resolves once this round of sending is over. */
  const record = useCallback(
    async (r: { boardKey: string; input: number; test: string; reading: string }) => {
      store.add({ clientId: newClientId(), boardKey: r.boardKey, input: r.input, test: r.test, reading: r.reading.trim() });
      await store.flush();
    },
    [store],
  );
  const sendNow = useCallback(() => void store.flush(), [store]);
  const dismiss = useCallback((clientId: string) => store.dismiss(clientId), [store]);

  return { waiting, refused, lastTry, online, record, sendNow, dismiss };
}
