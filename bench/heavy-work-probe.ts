import type { CookieClient } from "@/tests/api-registry/http-server";
import { largeLayoutDocument, scheduleCsvOf } from "@/tests/api-registry/large-layout";

// Shared by the off-loop bench and its integration test: two sites whose hardware suggestion and terminal sheet
// PDF each take the server a second or more of CPU, and a watch on /api/health while that work runs.

/** Detectors of the suggestion site: the search tries about 110,000 hardware candidates per suggestion before it finds the cheapest. */
export const SUGGEST_DETECTORS = 160;
/** Loops on the terminal sheet: a 32-input panel and two 8-input boards, one detector per input. */
export const SHEET_LOOPS = 41;

export interface HeavyWorkSites {
  suggestSiteId: number;
  sheetSiteId: number;
  /** Layouts of the same 41 loops, each a PDF of its own (the server keeps made PDFs, keyed by their content). */
  sheetLayoutIds: number[];
}

async function siteWithSchedule(api: CookieClient, name: string, detectors: number): Promise<{ siteId: number; detectorIds: string[] }> {
  const site = await api.request("/api/sites", { method: "POST", json: { name, areas: [] } });
  if (site.status !== 200) throw new Error(`site: ${site.status} ${site.text.slice(0, 300)}`);
  const imported = await api.request(`/api/sites/${site.json.id}/schedule/import`, { method: "POST", json: { mode: "confirm", csv: scheduleCsvOf(detectors), addUnknownPlaces: true } });
  if (imported.status !== 200) throw new Error(`schedule import: ${imported.status} ${imported.text.slice(0, 300)}`);
  return { siteId: site.json.id, detectorIds: (imported.json.detectors as { id: string }[]).map((d) => d.id) };
}

export async function makeHeavyWorkSites(api: CookieClient, layouts = 1): Promise<HeavyWorkSites> {
  const suggest = await siteWithSchedule(api, "Off-loop suggestion site", SUGGEST_DETECTORS);
  const sheet = await siteWithSchedule(api, "Off-loop sheet site", SHEET_LOOPS);
  const document = largeLayoutDocument(sheet.detectorIds);
  const sheetLayoutIds: number[] = [];
  for (let i = 0; i < layouts; i++) {
    const made = await api.request(`/api/sites/${sheet.siteId}/layouts`, { method: "POST", json: { name: `Sheet layout ${i + 1}`, document } });
    if (made.status !== 200) throw new Error(`layout: ${made.status} ${made.text.slice(0, 300)}`);
    sheetLayoutIds.push(made.json.layout.id);
  }
  return { suggestSiteId: suggest.siteId, sheetSiteId: sheet.siteId, sheetLayoutIds };
}

/** POST the site's hardware suggestions (both ways). */
export const requestSuggestions = (api: CookieClient, siteId: number) => api.request(`/api/sites/${siteId}/suggestions`, { method: "POST", json: {} });

/** GET a terminal sheet PDF as bytes. */
export async function requestSheetPdf(api: CookieClient, layoutId: number, size: "A4" | "LETTER" = "A4"): Promise<{ status: number; bytes: Uint8Array }> {
  const res = await fetch(`${api.base}/api/layouts/${layoutId}/sheet/pdf?size=${size}`, { headers: { cookie: api.cookieHeader() } });
  return { status: res.status, bytes: new Uint8Array(await res.arrayBuffer()) };
}

export interface HealthWatch {
  /** The longest time one GET /api/health took to answer, ms. */
  longestMs: number;
  medianMs: number;
  polls: number;
  /** Answers other than 200. */
  failures: number;
  /** How long the watched work took, ms. */
  workMs: number;
}

const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

/** Polls GET /api/health every `intervalMs` (one at a time) while `work` runs, and times every answer. */
export async function watchHealth<T>(base: string, work: () => Promise<T>, intervalMs = 10): Promise<{ value: T; health: HealthWatch }> {
  const waits: number[] = [];
  let failures = 0;
  let done = false;
  const poll = async () => {
    while (!done) {
      const t = performance.now();
      const res = await fetch(`${base}/api/health`);
      await res.arrayBuffer();
      waits.push(performance.now() - t);
      if (res.status !== 200) failures++;
      await sleep(intervalMs);
    }
  };
  const polling = poll();
  await sleep(intervalMs); // the first poll is on its way before the work starts
  const started = performance.now();
  const value = await work().finally(() => (done = true));
  const workMs = performance.now() - started;
  await polling;
  const sorted = [...waits].sort((a, b) => a - b);
  return { value, health: { longestMs: sorted[sorted.length - 1] ?? NaN, medianMs: sorted[Math.floor(sorted.length / 2)] ?? NaN, polls: waits.length, failures, workMs } };
}

export const ms = (x: number) => `${Math.round(x)} ms`;
