"use client";

import { useCallback, useMemo } from "react";
import type { Catalog } from "@/lib/catalog/schema";
import { indexCatalog } from "@/lib/layout/catalog-index";
import type { LayoutDocument } from "@/lib/layout/schema";
import type { Schedule } from "@/lib/schedule/schema";
import type { LayoutMeta } from "@/lib/server/layouts";
import { ConflictDialog } from "@/components/editor/conflict-dialog";
import { removedNotice } from "@/components/editor/drag-model";
import { EditorContext, type EditorState } from "@/components/editor/editor-context";
import { EditorStableContext, type EditorStable } from "@/components/editor/editor-stable-context";
import { useEditorLookups } from "@/components/editor/use-editor-lookups";
import type { LayoutEdit } from "@/lib/layout/operations";
import { EditorHeader } from "@/components/editor/editor-header";
import { hasLifeSafety, withoutMissingDetectors } from "@/components/editor/editor-model";
import { EditorNotices } from "@/components/editor/editor-notices";
import { EditorWorkspace } from "@/components/editor/editor-workspace";
import { RevisionDrawer } from "@/components/editor/revision-drawer";
import { useEditorDnd } from "@/components/editor/use-editor-dnd";
import { useEditorDocument } from "@/components/editor/use-editor-document";
import { useEditorMessage, useNotice } from "@/components/editor/use-editor-messages";
import { useLayoutConflict } from "@/components/editor/use-layout-conflict";
import { useLiveSolve } from "@/components/editor/use-live-solve";
import { useRevisionHistory } from "@/components/editor/use-revision-history";
import { useSelection } from "@/components/editor/use-selection";

export interface LayoutEditorProps {
  layout: LayoutMeta;
  document: LayoutDocument;
  site: { id: number; name: string };
  schedule: Schedule;
  catalog: Catalog;
  canWrite: boolean;
  /** Why the editor is read-only, when it is. */
  readOnlyReason: string;
}

/** The layout editor: detectors dragged onto inputs, solved live, saved as they change. */
export function LayoutEditor(props: LayoutEditorProps) {
  const { site, schedule, catalog, canWrite, readOnlyReason } = props;
  const ctx = useMemo(() => ({ schedule, catalog }), [schedule, catalog]);
  const ix = useMemo(() => indexCatalog(catalog), [catalog]);
  const initial = useMemo(() => withoutMissingDetectors(props.document, ctx), [props.document, ctx]);
  const { message, announce } = useEditorMessage();
  const notice = useNotice(removedNotice(initial.removed.length));
  const editing = useEditorDocument({ layout: props.layout, initialDoc: initial.doc, ctx, canWrite, readOnlyReason, announce });
  const { doc, docRef, meta, autosave, apply, adopt } = editing;
  const { result, zones, findingsAt } = useLiveSolve(doc, schedule, catalog);
  const detectorsById = useMemo(() => new Map(schedule.map((d) => [d.id, d])), [schedule]);
  const labelOf = useCallback((id: string) => detectorsById.get(id)?.label ?? id, [detectorsById]);
  const { selected, select, highlighted, show } = useSelection(announce, labelOf);
  const conflict = useLayoutConflict({ siteId: site.id, savedDocument: props.document, savedVersion: props.layout.version, canWrite, ctx, editing, notice });
  const history = useRevisionHistory({ layoutId: meta.id, currentRevision: meta.currentRevision, version: autosave.version, adopt, announce, onConflict: conflict.setDraftConflict });
  const dnd = useEditorDnd({ doc, docRef, ctx, ix, labelOf, apply, select });
  const fire = useMemo(() => hasLifeSafety(ctx), [ctx]);
  const busy = conflict.busy || history.busy;

  const { inputAt, voltsOf } = useEditorLookups(doc, result);
  const applyTo = useCallback((make: (d: LayoutDocument) => LayoutEdit | null) => apply(make(docRef.current)), [apply, docRef]);
  const stable: EditorStable = useMemo(() => ({ ctx, ix, detectorsById, canWrite, select, applyTo }), [ctx, ix, detectorsById, canWrite, select, applyTo]);
  const state: EditorState = { doc, ctx, ix, result, zones, findingsAt, detectorsById, inputAt, voltsOf, canWrite, selected, select, apply, highlighted, show };

  return (
    <EditorStableContext.Provider value={stable}>
    <EditorContext.Provider value={state}>
      {/* wider than the page frame: the editor wants the whole screen */}
      <div className="mx-[calc((100%-min(100vw-2rem,110rem))/2)]">
        <EditorHeader meta={meta} version={autosave.version} saveState={autosave.state} readOnly={!canWrite} onHistory={history.openHistory} />
        <EditorNotices siteId={site.id} readOnlyReason={canWrite ? null : readOnlyReason} fire={fire} notice={notice} message={message} />
        <EditorWorkspace dnd={dnd} />
        {history.open ? <RevisionDrawer layoutId={meta.id} currentRevision={meta.currentRevision} canWrite={canWrite} busy={busy || autosave.state.kind !== "saved"} onRestore={history.restore} onClose={history.close} /> : null}
        {conflict.message && canWrite ? <ConflictDialog message={conflict.message} busy={busy} error={conflict.error} onReloadLatest={conflict.reloadLatest} onWorkOnCopy={conflict.workOnCopy} /> : null}
      </div>
    </EditorContext.Provider>
    </EditorStableContext.Provider>
  );
}
