import { useCallback, useEffect, useRef, useState } from "react";
import type { LayoutDocument } from "@/lib/layout/schema";
import type { LayoutMeta } from "@/lib/server/layouts";
import { describeError, FetchError, sendJson } from "@/lib/client/fetcher";
import { clearDraft, writeDraft } from "@/lib/client/local-draft";

// Autosave of the layout editor: each change is kept in localStorage at once and sent to the server after a
// pause in typing. A failed send is retried; a stale version stops the autosave until the designer chooses.

export type SaveState =
  | { kind: "saved" }
  | { kind: "pending" }
  | { kind: "saving" }
  | { kind: "retrying"; message: string; inSeconds: number }
  | { kind: "conflict"; currentVersion: number | null; message: string }
  | { kind: "refused"; status: number; message: string };

const RETRY_SECONDS = [2, 4, 8, 15, 30];

export interface Autosave {
  state: SaveState;
  version: number;
  /** Record a change: kept locally now, saved after the pause. */
  change: (doc: LayoutDocument) => void;
  /** Send what is pending now (e.g. before leaving). */
  flush: () => void;
  /** Start again from a server copy (after a reload, a restore or a conflict resolved). */
  reset: (version: number) => void;
}

export function useAutosave(opts: { layoutId: number; initialVersion: number; enabled: boolean; delayMs?: number; onSaved?: (layout: LayoutMeta) => void }): Autosave {
  const { layoutId, enabled, delayMs = 800 } = opts;
  const [state, setStateValue] = useState<SaveState>({ kind: "saved" });
  const [version, setVersion] = useState(opts.initialVersion);
  const stateRef = useRef(state);
  const versionRef = useRef(opts.initialVersion);
  const pendingDoc = useRef<LayoutDocument | null>(null);
  const timer = useRef<ReturnType<typeof setTimeout> | null>(null);
  const inFlight = useRef(false);
  const attempt = useRef(0);
  const sendRef = useRef<() => Promise<void>>(async () => {});
  const onSaved = useRef(opts.onSaved);
  useEffect(() => {
    onSaved.current = opts.onSaved;
  });

  const setState = useCallback((s: SaveState) => {
    stateRef.current = s;
    setStateValue(s);
  }, []);

  const schedule = useCallback((ms: number, run: () => void) => {
    if (timer.current) clearTimeout(timer.current);
    timer.current = setTimeout(run, ms);
  }, []);

  const send = useCallback(async (): Promise<void> => {
    if (timer.current) clearTimeout(timer.current);
    timer.current = null;
    const doc = pendingDoc.current;
    if (!doc || inFlight.current || stateRef.current.kind === "conflict") return;
    inFlight.current = true;
    setState({ kind: "saving" });
    try {
      const res = await sendJson<{ layout: LayoutMeta }>(`/api/layouts/${layoutId}`, "PUT", { version: versionRef.current, document: doc });
      versionRef.current = res.layout.version;
      setVersion(res.layout.version);
      attempt.current = 0;
      onSaved.current?.(res.layout);
      if (pendingDoc.current === doc) {
        pendingDoc.current = null;
        clearDraft(layoutId);
        setState({ kind: "saved" });
      } else if (pendingDoc.current) {
        // changed while the save was on its way: keep the newer copy against the new version, send it next
        writeDraft({ layoutId, baseVersion: versionRef.current, document: pendingDoc.current, savedAt: new Date().toISOString() });
        setState({ kind: "pending" });
      }
    } catch (e) {
      const status = e instanceof FetchError ? e.status : 0;
      if (status === 409) {
        const current = e instanceof FetchError && typeof e.body.currentVersion === "number" ? e.body.currentVersion : null;
        setState({ kind: "conflict", currentVersion: current, message: describeError(e) });
      } else if (status === 401 || status === 403 || status === 404 || status === 413 || status === 422) {
        setState({ kind: "refused", status, message: describeError(e) });
      } else {
        const inSeconds = RETRY_SECONDS[Math.min(attempt.current, RETRY_SECONDS.length - 1)];
        attempt.current++;
        setState({ kind: "retrying", message: describeError(e), inSeconds });
        inFlight.current = false;
        schedule(inSeconds * 1000, () => void sendRef.current());
        return;
      }
    } finally {
      inFlight.current = false;
    }
    if (pendingDoc.current && stateRef.current.kind === "pending") schedule(0, () => void sendRef.current());
  }, [layoutId, schedule, setState]);
  useEffect(() => {
    sendRef.current = send;
  }, [send]);

  const change = useCallback(
    (doc: LayoutDocument) => {
      pendingDoc.current = doc;
      writeDraft({ layoutId, baseVersion: versionRef.current, document: doc, savedAt: new Date().toISOString() });
      if (!enabled) return;
      const k = stateRef.current.kind;
      if (k === "conflict") return;
      if (k !== "saving" && k !== "retrying") setState({ kind: "pending" });
      if (!inFlight.current && k !== "retrying") schedule(delayMs, () => void send());
    },
    [delayMs, enabled, layoutId, schedule, send, setState],
  );

  const flush = useCallback(() => {
    if (pendingDoc.current && stateRef.current.kind !== "conflict") void send();
  }, [send]);

  const reset = useCallback(
    (v: number) => {
      if (timer.current) clearTimeout(timer.current);
      pendingDoc.current = null;
      attempt.current = 0;
      versionRef.current = v;
      setVersion(v);
      clearDraft(layoutId);
      setState({ kind: "saved" });
    },
    [layoutId, setState],
  );

  // Leaving the tab: send now rather than after the pause (the local copy is there either way).
  useEffect(() => {
    const onHide = () => {
      if (document.visibilityState === "hidden") flush();
    };
    document.addEventListener("visibilitychange", onHide);
    return () => document.removeEventListener("visibilitychange", onHide);
  }, [flush]);

  useEffect(() => () => {
    if (timer.current) clearTimeout(timer.current);
  }, []);

  return { state, version, change, flush, reset };
}
