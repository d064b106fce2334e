"use client";

import { useCallback, useLayoutEffect, useRef, useState } from "react";
import type { LayoutContext, LayoutEdit } from "@/lib/layout/operations";
import type { LayoutDocument } from "@/lib/layout/schema";
import type { LayoutMeta, LayoutView } from "@/lib/server/layouts";
import { useAutosave } from "@/lib/client/use-autosave";
import { withoutMissingDetectors } from "@/components/editor/editor-model";
import type { Announce } from "@/components/editor/use-editor-messages";

// The document being edited, the layout's metadata, and the autosave behind them.

export function useEditorDocument(opts: { layout: LayoutMeta; initialDoc: LayoutDocument; ctx: LayoutContext; canWrite: boolean; readOnlyReason: string; announce: Announce }) {
  const { layout, ctx, canWrite, readOnlyReason, announce } = opts;
  const [doc, setDoc] = useState<LayoutDocument>(opts.initialDoc);
  const [meta, setMeta] = useState<LayoutMeta>(layout);
  // The announcements, drop handler and copies read the document of the last render.
  const docRef = useRef(doc);
  useLayoutEffect(() => {
    docRef.current = doc;
  }, [doc]);

  const autosave = useAutosave({ layoutId: layout.id, initialVersion: layout.version, enabled: canWrite, onSaved: setMeta });
  const { change, reset } = autosave;

  /** Apply an edit: the document changes and the sentence is announced; a refused edit announces why. */
  const apply = useCallback(
    (edit: LayoutEdit | null, live = true) => {
      if (!edit) return;
      if (!canWrite) return announce("refused", readOnlyReason, live);
      if (!edit.ok) return announce("refused", edit.message, live);
      setDoc(edit.layout);
      change(edit.layout);
      announce("ok", edit.message, live);
    },
    [announce, canWrite, change, readOnlyReason],
  );

  /** Take the server's copy (after a reload or a restore) and save from its version on. */
  const adopt = useCallback(
    (view: LayoutView) => {
      setDoc(withoutMissingDetectors(view.document, ctx).doc);
      setMeta(view.layout);
      reset(view.layout.version);
    },
    [ctx, reset],
  );

  return { doc, setDoc, docRef, meta, autosave, apply, adopt };
}

export type EditorDocument = ReturnType<typeof useEditorDocument>;
