import type { KeyValueStore } from "@/components/commissioning/reading-queue";

export function memoryStorage(): KeyValueStore {
  const m = new Map<string, string>();
  return { getItem: (k) => m.get(k) ?? null, setItem: (k, v) => void m.set(k, v) };
}

/** The browser's localStorage, or a map when it is missing or disabled (private mode, the server render). */
export function browserStorage(): KeyValueStore {
  try {
    const s = window.localStorage;
    s.getItem("loopwright:probe");
    return s;
  } catch {
    return memoryStorage();
  }
}
