"use client";

import { DndContext, DragOverlay, KeyboardSensor, PointerSensor, useSensor, useSensors, type Announcements, type DragEndEvent, type DragStartEvent } from "@dnd-kit/core";
import { SortableContext, verticalListSortingStrategy } from "@dnd-kit/sortable";
import Link from "next/link";
import { useRouter } from "next/navigation";
import { useCallback, useEffect, useLayoutEffect, useMemo, useRef, useState } from "react";
import { mutate } from "swr";
import type { Catalog } from "@/lib/catalog/schema";
import { indexCatalog } from "@/lib/layout/catalog-index";
import { inputBlockOf, type LayoutEdit } from "@/lib/layout/operations";
import { boardName, inputName } from "@/lib/layout/names";
import { PANEL_KEY, type LayoutDocument } from "@/lib/layout/schema";
import type { Schedule } from "@/lib/schedule/schema";
import type { LayoutMeta, LayoutView } from "@/lib/server/layouts";
import { createSolver } from "@/lib/solver";
import { describeError, FetchError, fetcher, sendJson } from "@/lib/client/fetcher";
import { clearDraft, readDraft } from "@/lib/client/local-draft";
import { useAutosave } from "@/lib/client/use-autosave";
import { revisionsKey } from "@/lib/client/use-revisions";
import { Button } from "@/components/ui/button";
import { EditorContext, type EditorState } from "@/components/editor/editor-context";
import { DropTargetOrder, editorCollisions, editorKeyboardCoordinates } from "@/components/editor/dnd-helpers";
import { boardSortId, dropEdit, findingsByDomId, hasLifeSafety, inputDropId, overSentence, parseDragId, parseDropId, UNPLACED_DROP_ID, withoutMissingDetectors, zoneNumbers, type DragItem } from "@/components/editor/editor-model";
import { BoardCard, PanelCard } from "@/components/editor/board-card";
import { ChipFace } from "@/components/editor/detector-chip";
import { ConflictDialog } from "@/components/editor/conflict-dialog";
import { FiguresPanel } from "@/components/editor/figures-panel";
import { FindingsPanel } from "@/components/editor/findings-panel";
import { FireCaution } from "@/components/editor/fire-caution";
import { RevisionDrawer } from "@/components/editor/revision-drawer";
import { SaveStatus } from "@/components/editor/save-status";
import { SettingsPanel } from "@/components/editor/settings-panel";
import { UnplacedList } from "@/components/editor/unplaced-list";

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

type Message = { kind: "ok" | "refused" | "info"; text: string; live: boolean; at: number };

const stamp = () => new Date().toLocaleString(undefined, { dateStyle: "short", timeStyle: "short" });

export function LayoutEditor(props: LayoutEditorProps) {
  const { site, schedule, catalog, canWrite } = props;
  const layoutId = props.layout.id;
  const router = useRouter();
  const ctx = useMemo(() => ({ schedule, catalog }), [schedule, catalog]);
  const ix = indexCatalog(catalog);
  // One solver per schedule and catalog: each edit re-analyses only the inputs it touched.
  const solver = useMemo(() => createSolver(schedule, catalog), [schedule, catalog]);
  const initial = useMemo(() => withoutMissingDetectors(props.document, ctx), [props.document, ctx]);
  const [doc, setDoc] = useState<LayoutDocument>(initial.doc);
  const [meta, setMeta] = useState<LayoutMeta>(props.layout);
  const [selected, setSelected] = useState<string | null>(null);
  const [highlighted, setHighlighted] = useState<string | null>(null);
  const [message, setMessage] = useState<Message | null>(null);
  const [notice, setNotice] = useState<string | null>(
    initial.removed.length ? `${initial.removed.length} detector${initial.removed.length === 1 ? " was" : "s were"} deleted from the device schedule since the last save and have been taken off their inputs.` : null,
  );
  const [draftConflict, setDraftConflict] = useState<string | null>(null);
  const [historyOpen, setHistoryOpen] = useState(false);
  const [busy, setBusy] = useState(false);
  const [conflictError, setConflictError] = useState<string | null>(null);
  const [activeDrag, setActiveDrag] = useState<DragItem | null>(null);
  // The announcements and drop handler read the document of the last render.
  const docRef = useRef(doc);
  useLayoutEffect(() => {
    docRef.current = doc;
  }, [doc]);

  const autosave = useAutosave({ layoutId, initialVersion: props.layout.version, enabled: canWrite, onSaved: setMeta });
  const { change, reset } = autosave;
  const result = useMemo(() => solver.solve(doc), [solver, doc]);
  const zones = useMemo(() => zoneNumbers(result), [result]);
  const findingsAt = useMemo(() => findingsByDomId(result.findings), [result]);
  const detectorsById = useMemo(() => new Map(schedule.map((d) => [d.id, d])), [schedule]);
  const labelOf = useCallback((id: string) => detectorsById.get(id)?.label ?? id, [detectorsById]);

  const announce = useCallback((kind: Message["kind"], text: string, live = true) => setMessage({ kind, text, live, at: Date.now() }), []);

  const applyEdit = useCallback(
    (edit: LayoutEdit | null, live = true) => {
      if (!edit) return;
      if (!canWrite) return announce("refused", props.readOnlyReason, live);
      if (!edit.ok) return announce("refused", edit.message, live);
      setDoc(edit.layout);
      change(edit.layout);
      announce("ok", edit.message, live);
    },
    [announce, canWrite, change, props.readOnlyReason],
  );

  // Changes kept in this browser from an earlier visit: taken up again, or offered as a conflict when the layout moved on.
  const draftChecked = useRef(false);
  useEffect(() => {
    if (draftChecked.current || !canWrite) return;
    draftChecked.current = true;
    const d = readDraft(layoutId);
    if (!d) return;
    if (JSON.stringify(d.document) === JSON.stringify(props.document)) return clearDraft(layoutId);
    const cleaned = withoutMissingDetectors(d.document, ctx).doc;
    const when = new Date(d.savedAt).toLocaleString();
    // localStorage is only readable in the browser, after hydration: this effect is that synchronisation
    // eslint-disable-next-line react-hooks/set-state-in-effect
    setDoc(cleaned);
    if (d.baseVersion === props.layout.version) {
      change(cleaned);
      setNotice(`Your unsaved changes from ${when} were kept in this browser; they are back and being saved.`);
    } else {
      setDraftConflict(`Unsaved changes from ${when} were made on version ${d.baseVersion}; the layout has been saved since (it is now version ${props.layout.version}).`);
    }
  }, [canWrite, change, ctx, layoutId, props.document, props.layout.version]);

  const show = useCallback((domId: string) => {
    const el = document.getElementById(domId);
    setHighlighted(domId);
    if (el) {
      el.scrollIntoView({ behavior: "smooth", block: "center" });
      if (el.tabIndex < 0) el.setAttribute("tabindex", "-1");
      el.focus({ preventScroll: true });
    }
  }, []);
  useEffect(() => {
    if (!highlighted) return;
    const t = setTimeout(() => setHighlighted(null), 2500);
    return () => clearTimeout(t);
  }, [highlighted]);

  const select = useCallback(
    (id: string | null) => {
      setSelected(id);
      if (id) announce("info", `${labelOf(id)} selected. Choose an input's Place here button to put it there.`);
    },
    [announce, labelOf],
  );

  const state: EditorState = { doc, ctx, ix, result, zones, findingsAt, detectorsById, canWrite, selected, select, apply: applyEdit, highlighted, show };

  // Keyboard drags jump between drop targets in reading order: the unplaced list, then every input of every board.
  const [targets] = useState(() => new DropTargetOrder());
  const orderIds = useMemo(() => {
    const ids = [UNPLACED_DROP_ID];
    for (const key of [PANEL_KEY, ...doc.boards.map((b) => b.key)]) {
      const n = inputBlockOf(doc, ix, key)?.count ?? 0;
      for (let i = 1; i <= n; i++) ids.push(inputDropId(key, i));
    }
    return ids;
  }, [doc, ix]);
  useLayoutEffect(() => targets.set(orderIds), [targets, orderIds]);
  const coordinateGetter = useMemo(() => editorKeyboardCoordinates(targets), [targets]);
  const sensors = useSensors(
    useSensor(PointerSensor, { activationConstraint: { distance: 6 } }),
    useSensor(KeyboardSensor, { coordinateGetter, keyboardCodes: { start: ["Space"], cancel: ["Escape"], end: ["Space", "Enter"] } }),
  );

  const where = (item: DragItem): string => {
    if (item.type === "board") return `${boardName(docRef.current, item.boardKey)}, position ${docRef.current.boards.findIndex((b) => b.key === item.boardKey) + 1} of ${docRef.current.boards.length}`;
    const at = docRef.current.inputs.find((i) => i.detectorIds.includes(item.detectorId));
    return `${labelOf(item.detectorId)}${at ? `, on ${inputName(docRef.current, at)}` : ", unplaced"}`;
  };
  // where the dragged item started: being "over" it before any move is not news (it would drown "Picked up")
  const dragOrigin = useRef<{ id: string; left: boolean }>({ id: "", left: false });
  const originOf = (item: DragItem): string => {
    if (item.type === "board") return boardSortId(item.boardKey);
    const at = docRef.current.inputs.find((i) => i.detectorIds.includes(item.detectorId));
    return at ? inputDropId(at.boardKey, at.input) : UNPLACED_DROP_ID;
  };
  const announcements: Announcements = {
    onDragStart: ({ active }) => {
      const item = parseDragId(active.id);
      if (item) dragOrigin.current = { id: originOf(item), left: false };
      return item ? `Picked up ${where(item)}. Arrow keys move between ${item.type === "board" ? "board positions" : "inputs"}, Space drops, Escape cancels.` : undefined;
    },
    onDragOver: ({ active, over }) => {
      const item = parseDragId(active.id);
      if (!item) return undefined;
      if (!dragOrigin.current.left && String(over?.id ?? "") === dragOrigin.current.id) return undefined;
      dragOrigin.current.left = true;
      return overSentence(docRef.current, ctx, item, parseDropId(over?.id));
    },
    onDragEnd: ({ active, over }) => {
      const item = parseDragId(active.id);
      if (!item) return undefined;
      const edit = dropEdit(docRef.current, ctx, item, parseDropId(over?.id));
      return edit ? edit.message : `Dropped; ${where(item)}, unchanged`;
    },
    onDragCancel: ({ active }) => {
      const item = parseDragId(active.id);
      return item ? `Cancelled; ${where(item)}, unchanged` : undefined;
    },
  };

  const onDragStart = (e: DragStartEvent) => setActiveDrag(parseDragId(e.active.id));
  const onDragEnd = (e: DragEndEvent) => {
    setActiveDrag(null);
    const item = parseDragId(e.active.id);
    if (!item) return;
    // the drag's own live region reads the sentence; the message line shows it
    applyEdit(dropEdit(docRef.current, ctx, item, parseDropId(e.over?.id)), false);
    if (item.type === "detector") setSelected(null);
  };

  const conflictMessage = autosave.state.kind === "conflict" ? autosave.state.message : draftConflict;

  async function copyAsNewLayout(name: string): Promise<LayoutView> {
    return sendJson<LayoutView>(`/api/sites/${site.id}/layouts`, "POST", { name, document: docRef.current, note: `Copy of changes to "${meta.name}" that were not saved over a newer version` });
  }

  async function reloadLatest() {
    setBusy(true);
    setConflictError(null);
    try {
      const copy = await copyAsNewLayout(`${meta.name} — my changes ${stamp()}`.slice(0, 200));
      const latest = await fetcher<LayoutView>(`/api/layouts/${layoutId}`);
      setDoc(withoutMissingDetectors(latest.document, ctx).doc);
      setMeta(latest.layout);
      reset(latest.layout.version);
      setDraftConflict(null);
      setNotice(`Loaded the latest version (revision ${latest.layout.currentRevision}). Your changes are kept in the new layout "${copy.layout.name}".`);
      setCopyLink({ id: copy.layout.id, name: copy.layout.name });
      void mutate(revisionsKey(layoutId));
    } catch (e) {
      setConflictError(describeError(e));
    } finally {
      setBusy(false);
    }
  }

  async function workOnCopy() {
    setBusy(true);
    setConflictError(null);
    try {
      const copy = await copyAsNewLayout(`${meta.name} (copy ${stamp()})`.slice(0, 200));
      clearDraft(layoutId);
      router.push(`/sites/${site.id}/layouts/${copy.layout.id}`);
    } catch (e) {
      setConflictError(describeError(e));
      setBusy(false);
    }
  }
  const [copyLink, setCopyLink] = useState<{ id: number; name: string } | null>(null);

  async function restore(revision: number) {
    setBusy(true);
    try {
      const r = await sendJson<LayoutView>(`/api/layouts/${layoutId}/revisions/${revision}/restore`, "POST", { version: autosave.version });
      setDoc(withoutMissingDetectors(r.document, ctx).doc);
      setMeta(r.layout);
      reset(r.layout.version);
      announce("ok", `Revision ${revision} restored as revision ${r.layout.currentRevision}.`);
      void mutate(revisionsKey(layoutId));
    } catch (e) {
      if (e instanceof FetchError && e.status === 409) setDraftConflict(describeError(e));
      else announce("refused", describeError(e));
    } finally {
      setBusy(false);
    }
  }

  // Revisions list refreshes after each save so the drawer shows the newest.
  useEffect(() => {
    if (historyOpen) void mutate(revisionsKey(layoutId));
  }, [historyOpen, layoutId, meta.currentRevision]);

  const boardIds = doc.boards.map((b) => boardSortId(b.key));
  const fire = useMemo(() => hasLifeSafety(ctx), [ctx]);

  return (
    <EditorContext.Provider value={state}>
      {/* wider than the page frame: the editor wants the whole screen */}
      <div className="mx-[calc((100%-min(100vw-2rem,110rem))/2)]">
      <div className="mb-4 flex flex-wrap items-start justify-between gap-3">
        <div>
          <p className="text-sm text-slate-600">
            <Link href={`/sites/${site.id}`} className="hover:underline">
              {site.name}
            </Link>{" "}
            ›{" "}
            <Link href={`/sites/${site.id}/layouts`} className="hover:underline">
              Layouts
            </Link>
          </p>
          <h1 className="text-2xl font-semibold tracking-tight" data-testid="layout-name">
            {meta.name}
          </h1>
          <p className="text-xs text-slate-600">
            <span className="rounded bg-slate-100 px-1.5 py-0.5 font-medium uppercase tracking-wide">{meta.status}</span> · revision {meta.currentRevision} · version {autosave.version}
          </p>
        </div>
        <div className="flex items-start gap-2">
          <SaveStatus state={autosave.state} readOnly={!canWrite} />
          <Button variant="secondary" onClick={() => setHistoryOpen(true)}>
            History
          </Button>
        </div>
      </div>

      {!canWrite ? (
        <p role="note" data-testid="read-only" className="mb-3 rounded-md border border-line bg-slate-50 p-3 text-sm">
          Read-only: {props.readOnlyReason}
        </p>
      ) : null}
      {fire ? (
        <div className="mb-3">
          <FireCaution />
        </div>
      ) : null}
      {notice ? (
        <p className="mb-3 flex items-start justify-between gap-3 rounded-md border border-signal bg-signal-soft p-3 text-sm" data-testid="notice">
          <span>
            {notice}{" "}
            {copyLink ? (
              <Link className="font-medium underline" href={`/sites/${site.id}/layouts/${copyLink.id}`}>
                Open {copyLink.name}
              </Link>
            ) : null}
          </span>
          <button type="button" className="text-signal underline" onClick={() => (setNotice(null), setCopyLink(null))}>
            Dismiss
          </button>
        </p>
      ) : null}
      <p
        data-testid="editor-message"
        role={message?.kind === "refused" && message.live ? "alert" : undefined}
        className={`mb-3 min-h-6 text-sm ${message?.kind === "refused" ? "font-medium text-fault" : "text-slate-700"}`}
      >
        {message?.text ?? ""}
      </p>
      <div className="sr-only" aria-live="polite" aria-atomic="true">
        {message?.live && message.kind !== "refused" ? message.text : ""}
      </div>

      <DndContext
        sensors={canWrite ? sensors : []}
        collisionDetection={editorCollisions}
        onDragStart={onDragStart}
        onDragEnd={onDragEnd}
        onDragCancel={() => setActiveDrag(null)}
        accessibility={{
          announcements,
          screenReaderInstructions: {
            draggable:
              "Press Space to pick up. Arrow keys move between inputs, or between board positions for a board. Space drops, Escape cancels. Or press Enter to select a detector and use an input's Place here button.",
          },
        }}
      >
        <div className="grid gap-4 lg:grid-cols-[15rem_minmax(0,1fr)_20rem] 2xl:grid-cols-[17rem_minmax(0,1fr)_24rem]">
          <aside className="lg:sticky lg:top-4 lg:flex lg:max-h-[calc(100vh-2rem)] lg:flex-col lg:self-start">
            <UnplacedList />
          </aside>
          <div className="flex min-w-0 flex-col gap-3" data-testid="boards">
            <PanelCard />
            <SortableContext items={boardIds} strategy={verticalListSortingStrategy}>
              {doc.boards.map((b, i) => (
                <BoardCard key={b.key} board={b} index={i} />
              ))}
            </SortableContext>
            {canWrite ? <p className="text-xs text-slate-500">Add expansion boards, keypads and power supplies under Hardware and power.</p> : null}
          </div>
          <div className="flex min-w-0 flex-col gap-3 lg:sticky lg:top-4 lg:max-h-[calc(100vh-2rem)] lg:self-start lg:overflow-y-auto">
            <FindingsPanel />
            <FiguresPanel />
            <SettingsPanel />
          </div>
        </div>
        <DragOverlay dropAnimation={null}>
          {activeDrag?.type === "detector" ? (
            <div className="w-56 rounded-md border border-signal bg-white px-2 py-1 text-xs shadow-lg">
              <ChipFace detectorId={activeDrag.detectorId} />
            </div>
          ) : null}
        </DragOverlay>
      </DndContext>

      {historyOpen ? <RevisionDrawer layoutId={layoutId} currentRevision={meta.currentRevision} canWrite={canWrite} busy={busy || autosave.state.kind !== "saved"} onRestore={restore} onClose={() => setHistoryOpen(false)} /> : null}
      {conflictMessage && canWrite ? <ConflictDialog message={conflictMessage} busy={busy} error={conflictError} onReloadLatest={reloadLatest} onWorkOnCopy={workOnCopy} /> : null}
      </div>
    </EditorContext.Provider>
  );
}
