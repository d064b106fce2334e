"use client";

import { useEffect, useState } from "react";
import { mutate } from "swr";
import type { LayoutView } from "@/lib/server/layouts";
import { describeError, FetchError, sendJson } from "@/lib/client/fetcher";
import { revisionsKey } from "@/lib/client/use-revisions";
import type { Announce } from "@/components/editor/use-editor-messages";

// The revision drawer: open or closed, and restoring an old revision as a new one.

export function useRevisionHistory(opts: { layoutId: number; currentRevision: number; version: number; adopt: (view: LayoutView) => void; announce: Announce; onConflict: (message: string) => void }) {
  const { layoutId, currentRevision, version, adopt, announce, onConflict } = opts;
  const [open, setOpen] = useState(false);
  const [busy, setBusy] = useState(false);

  async function restore(revision: number) {
    setBusy(true);
    try {
      const r = await sendJson<LayoutView>(`/api/layouts/${layoutId}/revisions/${revision}/restore`, "POST", { version });
      adopt(r);
      announce("ok", `Revision ${revision} restored as revision ${r.layout.currentRevision}.`);
      void mutate(revisionsKey(layoutId));
    } catch (e) {
      if (e instanceof FetchError && e.status === 409) onConflict(describeError(e));
      else announce("refused", describeError(e));
    } finally {
      setBusy(false);
    }
  }

  // Revisions list refreshes after each save so the drawer shows the newest.
  useEffect(() => {
    if (open) void mutate(revisionsKey(layoutId));
  }, [open, layoutId, currentRevision]);

  return { open, openHistory: () => setOpen(true), close: () => setOpen(false), busy, restore };
}
