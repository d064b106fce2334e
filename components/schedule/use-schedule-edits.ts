"use client";

import { useState } from "react";
import type { BulkEditPatch, ScheduleDetector } from "@/lib/schedule/schema";
import { describeError, sendJson } from "@/lib/client/fetcher";
import { useSchedule } from "@/lib/client/use-schedule";
import { plural } from "@/lib/vocabulary/plural";

// The device schedule as read through its SWR hook, and every change to it: each one says what it did (or
// why it was refused) in the message line, then the schedule is read again.

export type ScheduleMessage = { kind: "ok" | "error"; text: string };
type Values = Omit<ScheduleDetector, "id">;

export function useScheduleEdits(siteId: number, initial: ScheduleDetector[]) {
  const { detectors, mutate } = useSchedule(siteId, initial);
  const [message, setMessage] = useState<ScheduleMessage | null>(null);
  const url = `/api/sites/${siteId}/schedule`;

  /** Run a change; the error sentence, or null when it went through. */
  async function run(fn: () => Promise<string>): Promise<string | null> {
    try {
      const text = await fn();
      setMessage({ kind: "ok", text });
      await mutate();
      return null;
    } catch (e) {
      const text = describeError(e);
      setMessage({ kind: "error", text });
      return text;
    }
  }

  return {
    detectors,
    message,
    add: (v: Values) => run(async () => (await sendJson<ScheduleDetector>(url, "POST", v), `${v.label} added.`)),
    save: (d: ScheduleDetector, v: Values) => run(async () => (await sendJson(`${url}/${d.id}`, "PATCH", v), `${v.label} saved.`)),
    patchMany: (ids: string[], patch: BulkEditPatch["patch"]) => run(async () => (await sendJson(url, "PATCH", { ids, patch }), `${plural(ids.length, "detector")} changed.`)),
    deleteMany: (ids: string[], then: () => void) =>
      run(async () => {
        const r = await sendJson<{ deleted: number }>(url, "DELETE", { ids });
        then();
        return `${plural(r.deleted, "detector")} deleted.`;
      }),
    /** After a CSV import (it has its own preview and confirm requests). */
    imported: (n: number) => {
      setMessage({ kind: "ok", text: `${plural(n, "detector")} imported.` });
      void mutate();
    },
  };
}
