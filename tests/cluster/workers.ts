import { randomUUID } from "node:crypto";
import type { CookieClient } from "@/tests/api-registry/http-server";

// The clients of the fault test: savers of layouts (two per layout, so some saves are stale) and recorders of
// commissioning readings. Every answer is counted by status; an answer that leaves the outcome unknown (the
// connection or the instance died, 502, 503) is remembered so the checks can say where it went.

export type Tally = Record<string, number>;
export const ambiguousStatus = (s: number) => s === 0 || s === 502 || s === 503 || s === 504;
const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

export interface Request {
  (path: string, init?: { method?: string; json?: unknown }): Promise<{ status: number; json: any }>; // eslint-disable-line @typescript-eslint/no-explicit-any
}

/** A request that never throws: a network failure or a timeout is status 0. */
export function safeRequest(client: CookieClient): Request {
  return async (path, init = {}) => {
    try {
      return await Promise.race([client.request(path, init), sleep(30_000).then(() => ({ status: 0, json: null, text: "" }))]);
    } catch {
      return { status: 0, json: null };
    }
  };
}

export interface SaverResult {
  layoutId: number;
  accepted: string[];
  unknown: string[];
  tally: Tally;
  failures: string[];
}

/** Saves the layout again and again with a unique note per save, from the version of its last answer. */
export async function saver(request: Request, name: string, layoutId: number, document: Record<string, unknown>, until: () => boolean): Promise<SaverResult> {
  const r: SaverResult = { layoutId, accepted: [], unknown: [], tally: {}, failures: [] };
  let version = (await currentVersion(request, layoutId)) ?? 1;
  for (let n = 1; !until(); n++) {
    const note = `${name} save ${n}`;
    const res = await request(`/api/layouts/${layoutId}`, { method: "PUT", json: { version, note, document: { ...document, busCableM: 10 + (n % 40) } } });
    r.tally[res.status] = (r.tally[res.status] ?? 0) + 1;
    if (res.status === 200) {
      r.accepted.push(note);
      version = res.json.layout.version;
    } else if (res.status === 409 && typeof res.json?.currentVersion === "number") {
      version = res.json.currentVersion;
    } else {
      if (ambiguousStatus(res.status)) r.unknown.push(note);
      else r.failures.push(`${res.status} ${JSON.stringify(res.json).slice(0, 200)}`);
      await sleep(200);
      version = (await currentVersion(request, layoutId)) ?? version;
    }
  }
  return r;
}

async function currentVersion(request: Request, layoutId: number): Promise<number | null> {
  for (let i = 0; i < 50; i++) {
    const res = await request(`/api/layouts/${layoutId}`);
    if (res.status === 200) return res.json.layout.version;
    await sleep(200);
  }
  return null;
}

export interface Loop {
  boardKey: string;
  input: number;
  tests: { test: string; reading: string }[];
}

export interface RecorderResult {
  accepted: string[];
  unresolved: string[];
  retries: number;
  tally: Tally;
  failures: string[];
}

/** Records readings, each with a fresh client id; an unknown outcome is sent again with the same id (stored once). */
export async function recorder(request: Request, layoutId: number, loops: Loop[], until: () => boolean): Promise<RecorderResult> {
  const r: RecorderResult = { accepted: [], unresolved: [], retries: 0, tally: {}, failures: [] };
  for (let n = 0; !until(); n++) {
    const loop = loops[n % loops.length];
    const t = loop.tests[n % loop.tests.length];
    const clientId = randomUUID();
    let done = false;
    for (let attempt = 0; attempt < 20 && !done; attempt++) {
      if (attempt > 0) {
        r.retries++;
        await sleep(300);
      }
      const res = await request(`/api/layouts/${layoutId}/commissioning/readings`, { method: "POST", json: { clientId, boardKey: loop.boardKey, input: loop.input, test: t.test, reading: t.reading } });
      r.tally[res.status] = (r.tally[res.status] ?? 0) + 1;
      if (res.status === 201 || res.status === 200) {
        r.accepted.push(clientId);
        done = true;
      } else if (!ambiguousStatus(res.status) && res.status !== 409) {
        r.failures.push(`${res.status} ${JSON.stringify(res.json).slice(0, 200)}`);
        done = true;
      }
    }
    if (!done) r.unresolved.push(clientId);
  }
  return r;
}
