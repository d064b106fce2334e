"use client";

import { useRouter } from "next/navigation";
import { useEffect, useRef, useState } from "react";
import { mutate } from "swr";
import type { LayoutContext } from "@/lib/layout/operations";
import type { LayoutDocument } from "@/lib/layout/schema";
import type { LayoutView } from "@/lib/server/layouts";
import { describeError, sendJson } from "@/lib/client/fetcher";
import { clearDraft, readDraft } from "@/lib/client/local-draft";
import { useLayout } from "@/lib/client/use-layout";
import { revisionsKey } from "@/lib/client/use-revisions";
import { copyName } from "@/components/editor/drag-model";
import { withoutMissingDetectors } from "@/components/editor/editor-model";
import type { EditorDocument } from "@/components/editor/use-editor-document";
import type { Notice } from "@/components/editor/use-editor-messages";
import { useFormat } from "@/components/format/format-provider";

// Changes that cannot be saved over a newer version: offered back from this browser's draft, and resolved by
// reloading the latest or working on a copy. Nothing of either side is lost: one copy becomes a new layout.

export function useLayoutConflict(opts: { siteId: number; savedDocument: LayoutDocument; savedVersion: number; canWrite: boolean; ctx: LayoutContext; editing: EditorDocument; notice: Notice }) {
  const { siteId, savedDocument, savedVersion, canWrite, ctx, editing, notice } = opts;
  const { setDoc, docRef, meta, autosave, adopt } = editing;
  const { change } = autosave;
  const { show } = notice;
  const layoutId = meta.id;
  const router = useRouter();
  const fmt = useFormat();
  const stamp = () => fmt.dateTime(new Date());
  const { reload } = useLayout(layoutId);
  const [draftConflict, setDraftConflict] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);

  // Changes kept in this browser from an earlier visit: taken up again, or offered as a conflict when the layout moved on.
  const draftChecked = useRef(false);
  useEffect(() => {
    if (draftChecked.current || !canWrite) return;
    draftChecked.current = true;
    const d = readDraft(layoutId);
    if (!d) return;
    if (JSON.stringify(d.document) === JSON.stringify(savedDocument)) return clearDraft(layoutId);
    const cleaned = withoutMissingDetectors(d.document, ctx).doc;
    const when = fmt.dateTime(d.savedAt);
    // localStorage is only readable in the browser, after hydration: this effect is that synchronisation
    setDoc(cleaned);
    if (d.baseVersion === savedVersion) {
      change(cleaned);
      show(`Your unsaved changes from ${when} were kept in this browser; they are back and being saved.`);
    } else {
      // eslint-disable-next-line react-hooks/set-state-in-effect -- the same after-hydration synchronisation
      setDraftConflict(`Unsaved changes from ${when} were made on version ${d.baseVersion}; the layout has been saved since (it is now version ${savedVersion}).`);
    }
  }, [canWrite, change, ctx, fmt, layoutId, savedDocument, savedVersion, setDoc, show]);

  function copyAsNewLayout(name: string): Promise<LayoutView> {
    return sendJson<LayoutView>(`/api/sites/${siteId}/layouts`, "POST", { name, document: docRef.current, note: `Copy of changes to "${meta.name}" that were not saved over a newer version` });
  }

  async function reloadLatest() {
    setBusy(true);
    setError(null);
    try {
      const copy = await copyAsNewLayout(copyName(meta.name, "reload", stamp()));
      const latest = await reload();
      adopt(latest);
      setDraftConflict(null);
      show(`Loaded the latest version (revision ${latest.layout.currentRevision}). Your changes are kept in the new layout "${copy.layout.name}".`, { id: copy.layout.id, name: copy.layout.name });
      void mutate(revisionsKey(layoutId));
    } catch (e) {
      setError(describeError(e));
    } finally {
      setBusy(false);
    }
  }

  async function workOnCopy() {
    setBusy(true);
    setError(null);
    try {
      const copy = await copyAsNewLayout(copyName(meta.name, "copy", stamp()));
      clearDraft(layoutId);
      router.push(`/sites/${siteId}/layouts/${copy.layout.id}`);
    } catch (e) {
      setError(describeError(e));
      setBusy(false);
    }
  }

  const message = autosave.state.kind === "conflict" ? autosave.state.message : draftConflict;
  return { message, busy, error, reloadLatest, workOnCopy, setDraftConflict };
}
