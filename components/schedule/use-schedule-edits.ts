"use client";

import { useState } from "react";
import type { BulkEditPatch, ScheduleDetector } from "@/lib/schedule/schema";
import { describeError, FetchError, sendJson } from "@/lib/client/fetcher";
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
        let r: { deleted: number; approvedLayouts: { name: string }[] };
        try {
          r = await sendJson(url, "DELETE", { ids });
        } catch (e) {
          // Detectors on an approved layout: the server says which and that nothing approved changes; ask once more.
          if (!(e instanceof FetchError && e.status === 409 && e.body.code === "used-by-approved") || !window.confirm(`${e.message}\n\nDelete anyway?`)) throw e;
          r = await sendJson(url, "DELETE", { ids, confirmApproved: true });
        }
        then();
        const kept = r.approvedLayouts.length ? ` The approved layouts (${r.approvedLayouts.map((u) => u.name).join(", ")}) keep them as approved.` : "";
        return `${plural(r.deleted, "detector")} deleted.${kept}`;
      }),
    /** After a CSV import (it has its own preview and confirm requests). */
    imported: (n: number) => {
      setMessage({ kind: "ok", text: `${plural(n, "detector")} imported.` });
      void mutate();
    },
  };
}
