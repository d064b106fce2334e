"use client";

import Link from "next/link";
import { useCallback, useEffect, useMemo, useRef, useState, useSyncExternalStore } from "react";
import { diagnoseLoopOf, diagnoseReading, type ReadingVerdict, type UsualValue } from "@/lib/commissioning/diagnose";
import { commissioningProgress, type LoopProgress, type LoopStatus, type RecordedReading } from "@/lib/commissioning/progress";
import { parseMeterReading } from "@/lib/commissioning/reading-schema";
import { detectPhotoType, MAX_PHOTO_BYTES, PHOTO_TYPES } from "@/lib/commissioning/photo-checks";
import { loopJsonReviver } from "@/lib/loop/loop-json";
import { formatOhms } from "@/lib/resistors/format-ohms";
import { REVIEW_STATE_WORDS } from "@/lib/review/state-machine";
import type { EffectiveReview } from "@/lib/review/effective-state";
import type { CommissioningView, PhotoView, ReadingView, RecordResult } from "@/lib/server/commissioning";
import type { ExpectedReading, SheetInput, TerminalSheet } from "@/lib/sheet/sheet-types";
import { ResistorBands } from "@/components/sheet/resistor-bands";
import { TEST_WORDS } from "@/components/sheet/test-words";
import { errorText, HttpError, sendJson } from "@/components/review/http";
import { dismissRefused, enqueue, flushQueue, isRetryable, queueKey, readQueue, readRefused, refusedKey, waitingText, type KeyValueStore, type QueuedReading, type SendOutcome } from "@/components/commissioning/reading-queue";

export interface CommissioningAppProps {
  siteId: number;
  layoutId: number;
  initial: CommissioningView;
  /** The approved revision's terminal sheet; null when nothing is approved. */
  sheet: TerminalSheet | null;
  usualValues: UsualValue[];
  canRecord: boolean;
  recordRefusal: string;
}

const RETRY_MS = 15_000;

const STATUS_WORDS: Record<LoopStatus, string> = { untested: "not tested", incomplete: "some tests left", failed: "failed", passed: "passed", "cannot-test": "cannot be tested" };
const STATUS_STYLE: Record<LoopStatus, string> = {
  untested: "border-line bg-white",
  incomplete: "border-warn bg-warn-soft",
  failed: "border-fault bg-fault-soft",
  passed: "border-signal bg-signal-soft",
  "cannot-test": "border-fault bg-white",
};

function memoryStore(): KeyValueStore {
  const m = new Map<string, string>();
  return { getItem: (k) => m.get(k) ?? null, setItem: (k, v) => void m.set(k, v) };
}

function browserStore(): KeyValueStore {
  try {
    const s = window.localStorage;
    s.getItem("loopwright:probe");
    return s;
  } catch {
    return memoryStore();
  }
}

function newClientId(): string {
  if (typeof crypto !== "undefined" && typeof crypto.randomUUID === "function") return crypto.randomUUID();
  // RFC 4122 version 4 from random bytes, where randomUUID is missing (an older phone browser)
  const b = crypto.getRandomValues(new Uint8Array(16));
  b[6] = (b[6] & 0x0f) | 0x40;
  b[8] = (b[8] & 0x3f) | 0x80;
  const h = [...b].map((x) => x.toString(16).padStart(2, "0")).join("");
  return `${h.slice(0, 8)}-${h.slice(8, 12)}-${h.slice(12, 16)}-${h.slice(16, 20)}-${h.slice(20)}`;
}

const loopKey = (boardKey: string, input: number) => `${boardKey}#${input}`;

// Subscribers to the waiting list: this tab's writes notify them; other tabs' writes arrive as "storage" events.
const storageListeners = new Set<() => void>();
function subscribeStorage(cb: () => void) {
  storageListeners.add(cb);
  window.addEventListener("storage", cb);
  return () => {
    storageListeners.delete(cb);
    window.removeEventListener("storage", cb);
  };
}
const notifyStorage = () => storageListeners.forEach((l) => l());
function subscribeOnline(cb: () => void) {
  window.addEventListener("online", cb);
  window.addEventListener("offline", cb);
  return () => {
    window.removeEventListener("online", cb);
    window.removeEventListener("offline", cb);
  };
}
/** A read-only store holding one value, to parse a snapshot with the queue's own reader. */
const fixedStore = (key: string, raw: string): KeyValueStore => ({ getItem: (k) => (k === key ? raw : null), setItem: () => undefined });

export function CommissioningApp(props: CommissioningAppProps) {
  const { layoutId, siteId, sheet, canRecord } = props;
  const [readings, setReadings] = useState<ReadingView[]>(props.initial.readings);
  const [photos, setPhotos] = useState<PhotoView[]>(props.initial.photos);
  const [review, setReview] = useState<EffectiveReview>(props.initial.review);
  const [lastTry, setLastTry] = useState<string | null>(null);
  const storeRef = useRef<KeyValueStore | null>(null);
  const store = useCallback(() => (storeRef.current ??= browserStore()), []);
  // The waiting and refused lists live in the browser's storage (shared with other tabs); the server renders none.
  const waitingRaw = useSyncExternalStore(subscribeStorage, () => store().getItem(queueKey(props.layoutId)) ?? "[]", () => "[]");
  const refusedRaw = useSyncExternalStore(subscribeStorage, () => store().getItem(refusedKey(props.layoutId)) ?? "[]", () => "[]");
  const waiting = useMemo(() => readQueue(fixedStore(queueKey(props.layoutId), waitingRaw), props.layoutId), [waitingRaw, props.layoutId]);
  const refused = useMemo(() => readRefused(fixedStore(refusedKey(props.layoutId), refusedRaw), props.layoutId), [refusedRaw, props.layoutId]);
  const online = useSyncExternalStore(subscribeOnline, () => navigator.onLine, () => true);
  const flushing = useRef(false);
  const flushAgain = useRef(false);
  const revision = props.initial.revision;

  const rows = useMemo(() => (sheet ? sheet.boards.flatMap((b) => b.rows.filter((r): r is SheetInput => !r.spare)) : []), [sheet]);
  const progress = useMemo(() => (sheet ? commissioningProgress(sheet, readings) : props.initial.progress), [sheet, readings, props.initial.progress]);
  const [boardKey, setBoardKey] = useState<string>(() => sheet?.boards.find((b) => b.rows.some((r) => !r.spare))?.boardKey ?? "");
  const [input, setInput] = useState<number | null>(null);
  const commissioned = review.commissionedRevision !== null && review.commissionedRevision === revision;

  const send = useCallback(
    async (q: QueuedReading): Promise<SendOutcome<RecordResult>> => {
      try {
        const res = await fetch(`/api/layouts/${layoutId}/commissioning/readings`, {
          method: "POST",
          headers: { "content-type": "application/json" },
          body: JSON.stringify({ clientId: q.clientId, boardKey: q.boardKey, input: q.input, test: q.test, reading: q.reading }),
        });
        const text = await res.text();
        let body: unknown = null;
        try {
          body = JSON.parse(text, loopJsonReviver);
        } catch {
          body = null;
        }
        if (res.ok && body) return { kind: "saved", result: body as RecordResult };
        const msg = errorText(body, res.status);
        return isRetryable(res.ok ? null : res.status) ? { kind: "retry", error: msg } : { kind: "refused", error: msg };
      } catch {
        return { kind: "retry", error: "no connection to the server" };
      }
    },
    [layoutId],
  );

  const flush = useCallback(async () => {
    // One send at a time; a reading saved meanwhile asks for another round right after.
    if (flushing.current) {
      flushAgain.current = true;
      return;
    }
    flushing.current = true;
    try {
      do {
        flushAgain.current = false;
        const r = await flushQueue(store(), layoutId, send);
        if (r.saved.length) setReadings((list) => [...list.filter((x) => !r.saved.some((s) => s.result.reading.id === x.id)), ...r.saved.map((s) => s.result.reading)]);
        notifyStorage();
        setLastTry(new Date().toLocaleTimeString("en-GB"));
      } while (flushAgain.current);
    } finally {
      flushing.current = false;
    }
  }, [layoutId, send, store]);

  // Send what is waiting now, every RETRY_MS, and as soon as the browser says it is back online.
  useEffect(() => {
    void flush();
    const timer = window.setInterval(() => void flush(), RETRY_MS);
    const up = () => void flush();
    window.addEventListener("online", up);
    return () => {
      window.clearInterval(timer);
      window.removeEventListener("online", up);
    };
  }, [flush]);

  /** Kept in storage first, so the reading survives a lost connection or a closed tab; then sent. */
  const record = useCallback(
    async (row: SheetInput, test: string, text: string) => {
      enqueue(store(), layoutId, { clientId: newClientId(), boardKey: row.boardKey, input: row.input, test, reading: text.trim() });
      notifyStorage();
      await flush();
    },
    [flush, layoutId, store],
  );

  if (!sheet || revision === null) {
    return (
      <div className="mx-auto max-w-2xl rounded-lg border border-warn bg-warn-soft p-4" data-testid="not-approved">
        <p className="text-lg font-semibold">Nothing to commission yet</p>
        <p className="mt-1">
          Commissioning is done on an approved revision: this layout is {REVIEW_STATE_WORDS[review.state]} and has none. See its{" "}
          <Link className="text-signal underline" href={`/sites/${siteId}/layouts/${layoutId}/review`}>
            review
          </Link>
          .
        </p>
      </div>
    );
  }

  const boards = sheet.boards.filter((b) => b.rows.some((r) => !r.spare));
  const loopsOf = (key: string) => progress.loops.filter((l) => l.boardKey === key);
  const current = input === null ? null : (rows.find((r) => r.boardKey === boardKey && r.input === input) ?? null);
  const currentProgress = current ? (progress.loops.find((l) => l.boardKey === current.boardKey && l.input === current.input) ?? null) : null;
  const t = progress.totals;
  const allPassed = t.loops > 0 && t.passed === t.loops;
  const boardRows = rows.filter((r) => r.boardKey === boardKey);
  const idx = current ? boardRows.findIndex((r) => r.input === current.input) : -1;

  return (
    <div className="mx-auto flex max-w-3xl flex-col gap-4 text-base" data-testid="commissioning">
      {sheet.caution ? (
        <p role="note" data-testid="life-safety-caution" className="rounded-md border border-warn bg-warn-soft px-3 py-2 text-sm">
          <strong className="text-warn">Caution.</strong> {sheet.caution}
        </p>
      ) : null}

      <section className="rounded-lg border border-line bg-white p-3" aria-label="Progress">
        <div className="flex flex-wrap items-baseline justify-between gap-2">
          <p className="text-lg font-semibold" data-testid="site-progress">
            {t.passed} of {t.loops} loops passed
          </p>
          <p className="text-sm text-slate-600">
            revision {revision}
            {t.failed ? ` · ${t.failed} failed` : ""}
            {t.incomplete ? ` · ${t.incomplete} with tests left` : ""}
            {t.untested ? ` · ${t.untested} not tested` : ""}
            {t.cannotTest ? ` · ${t.cannotTest} cannot be tested` : ""}
          </p>
        </div>
        <Bar passed={t.passed} failed={t.failed} total={t.loops} />
        <WaitingBanner waiting={waiting} online={online} lastTry={lastTry} onSend={() => void flush()} />
        {refused.length ? (
          <ul className="mt-2 space-y-1 text-sm" data-testid="refused">
            {refused.map((r) => (
              <li key={r.clientId} className="rounded-md border border-fault bg-fault-soft p-2">
                The server refused {r.reading} ({r.test}, {r.boardKey} input {r.input}): {r.reason}{" "}
                <button type="button" className="ml-1 underline" onClick={() => (dismissRefused(store(), layoutId, r.clientId), notifyStorage())}>
                  Dismiss
                </button>
              </li>
            ))}
          </ul>
        ) : null}
      </section>

      {commissioned ? (
        <p className="rounded-lg border border-signal bg-signal-soft p-3 font-semibold" data-testid="commissioned">
          Revision {revision} is commissioned: its record is closed.
        </p>
      ) : null}
      {allPassed ? <Completion layoutId={layoutId} commissioned={commissioned} canRecord={canRecord} onCommissioned={setReview} /> : null}
      {!canRecord ? <p className="rounded-md border border-line bg-white p-2 text-sm">{props.recordRefusal}</p> : null}

      <nav aria-label="Boards" className="grid grid-cols-2 gap-2 sm:grid-cols-3">
        {boards.map((b) => {
          const ls = loopsOf(b.boardKey);
          const passed = ls.filter((l) => l.status === "passed").length;
          return (
            <button
              key={b.boardKey}
              type="button"
              data-testid={`board-${b.boardKey}`}
              onClick={() => (setBoardKey(b.boardKey), setInput(null))}
              aria-pressed={b.boardKey === boardKey}
              className={`min-h-16 rounded-lg border-2 p-2 text-left ${b.boardKey === boardKey ? "border-signal bg-signal-soft" : "border-line bg-white"}`}
            >
              <span className="block font-semibold">{b.name}</span>
              <span className="block text-sm tabular-nums text-slate-700">
                {passed} of {ls.length} passed
              </span>
              <Bar passed={passed} failed={ls.filter((l) => l.status === "failed").length} total={ls.length} thin />
            </button>
          );
        })}
      </nav>

      {current === null ? (
        <section aria-label="Loops">
          <h2 className="mb-2 text-lg font-semibold">{sheet.boards.find((b) => b.boardKey === boardKey)?.name}: pick a loop</h2>
          <ul className="grid gap-2 sm:grid-cols-2">
            {loopsOf(boardKey).map((l) => (
              <li key={l.input}>
                <button type="button" data-testid={`loop-${l.boardKey}-${l.input}`} data-status={l.status} onClick={() => setInput(l.input)} className={`min-h-16 w-full rounded-lg border-2 p-3 text-left ${STATUS_STYLE[l.status]}`}>
                  <span className="block font-semibold">
                    Input {l.input} · zone {l.zones.join(", ")}
                  </span>
                  <span className="block text-sm">{l.labels.join(" + ")}</span>
                  <span className="block text-xs font-medium uppercase tracking-wide">
                    {STATUS_WORDS[l.status]}
                    {l.lifeSafety ? " · life safety" : ""}
                  </span>
                </button>
              </li>
            ))}
          </ul>
        </section>
      ) : (
        <LoopPanel
          key={loopKey(current.boardKey, current.input)}
          layoutId={layoutId}
          row={current}
          progress={currentProgress}
          usualValues={props.usualValues}
          waiting={waiting.filter((w) => w.boardKey === current.boardKey && w.input === current.input)}
          photos={photos.filter((p) => p.boardKey === current.boardKey && p.input === current.input)}
          canRecord={canRecord && !commissioned}
          onRecord={(test, text) => record(current, test, text)}
          onPhoto={(p) => setPhotos((list) => (list.some((x) => x.id === p.id) ? list : [...list, p]))}
          onBack={() => setInput(null)}
          onPrev={idx > 0 ? () => setInput(boardRows[idx - 1].input) : null}
          onNext={idx >= 0 && idx < boardRows.length - 1 ? () => setInput(boardRows[idx + 1].input) : null}
        />
      )}
    </div>
  );
}

function Bar({ passed, failed, total, thin = false }: { passed: number; failed: number; total: number; thin?: boolean }) {
  const w = (n: number) => `${total ? (100 * n) / total : 0}%`;
  return (
    <div className={`mt-2 flex w-full overflow-hidden rounded-full bg-slate-200 ${thin ? "h-1.5" : "h-3"}`} aria-hidden="true">
      <div className="bg-signal" style={{ width: w(passed) }} />
      <div className="bg-fault" style={{ width: w(failed) }} />
    </div>
  );
}

function WaitingBanner({ waiting, online, lastTry, onSend }: { waiting: QueuedReading[]; online: boolean; lastTry: string | null; onSend: () => void }) {
  if (!waiting.length)
    return (
      <p className="mt-2 text-sm text-slate-600" data-testid="queue" data-count={0}>
        {waitingText(0)}
        {online ? "" : " You are offline: readings are kept on this device until the connection is back."}
      </p>
    );
  return (
    <div className="mt-2 flex flex-wrap items-center justify-between gap-2 rounded-md border border-warn bg-warn-soft p-2" role="status" data-testid="queue" data-count={waiting.length}>
      <p className="font-semibold">
        {waitingText(waiting.length)}
        <span className="block text-xs font-normal">
          Kept on this device and sent again every {RETRY_MS / 1000} s and when the connection comes back{online ? "" : " (offline now)"}
          {lastTry ? `; last try ${lastTry}` : ""}
          {waiting[0]?.lastError ? ` (${waiting[0].lastError})` : ""}.
        </span>
      </p>
      <button type="button" onClick={onSend} className="min-h-12 rounded-md bg-ink px-4 font-semibold text-white">
        Send now
      </button>
    </div>
  );
}

function Completion({ layoutId, commissioned, canRecord, onCommissioned }: { layoutId: number; commissioned: boolean; canRecord: boolean; onCommissioned: (r: EffectiveReview) => void }) {
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  async function mark() {
    setBusy(true);
    setError(null);
    try {
      const r = await sendJson<{ review: EffectiveReview }>(`/api/layouts/${layoutId}/commissioning/complete`, "POST");
      onCommissioned(r.review);
    } catch (e) {
      setError(e instanceof HttpError ? e.message : "The server could not be reached; try again.");
    } finally {
      setBusy(false);
    }
  }
  return (
    <section className="rounded-lg border-2 border-signal bg-white p-3" data-testid="completion">
      <p className="text-lg font-semibold text-signal">Every loop has passed.</p>
      <div className="mt-2 flex flex-wrap gap-2">
        <a className="flex min-h-12 items-center rounded-md bg-signal px-4 font-semibold text-white" href={`/api/layouts/${layoutId}/commissioning/report?size=A4`} data-testid="report-pdf">
          Commissioning record (PDF, A4)
        </a>
        <a className="flex min-h-12 items-center rounded-md border border-signal px-4 font-semibold text-signal" href={`/api/layouts/${layoutId}/commissioning/report?size=LETTER`}>
          US Letter
        </a>
        {!commissioned && canRecord ? (
          <button type="button" disabled={busy} onClick={mark} className="min-h-12 rounded-md bg-ink px-4 font-semibold text-white disabled:bg-slate-400" data-testid="mark-commissioned">
            {busy ? "Marking…" : "Mark the layout commissioned"}
          </button>
        ) : null}
      </div>
      {error ? <p className="mt-2 text-sm font-medium text-fault">{error}</p> : null}
    </section>
  );
}

interface LoopPanelProps {
  layoutId: number;
  row: SheetInput;
  progress: LoopProgress | null;
  usualValues: UsualValue[];
  waiting: QueuedReading[];
  photos: PhotoView[];
  canRecord: boolean;
  onRecord: (test: string, text: string) => Promise<void>;
  onPhoto: (p: PhotoView) => void;
  onBack: () => void;
  onPrev: (() => void) | null;
  onNext: (() => void) | null;
}

function LoopPanel({ layoutId, row, progress, usualValues, waiting, photos, canRecord, onRecord, onPhoto, onBack, onPrev, onNext }: LoopPanelProps) {
  const loop = useMemo(() => diagnoseLoopOf(row), [row]);
  const lifeSafety = row.detectors.some((d) => d.lifeSafety);
  return (
    <section aria-label={`Input ${row.input}`} data-testid="loop-panel" className="flex flex-col gap-3">
      <div className="flex items-center justify-between gap-2">
        <button type="button" onClick={onBack} className="min-h-12 rounded-md border border-line bg-white px-3 font-medium">
          ← All loops
        </button>
        <div className="flex gap-2">
          <button type="button" disabled={!onPrev} onClick={onPrev ?? undefined} className="min-h-12 rounded-md border border-line bg-white px-3 font-medium disabled:text-slate-400">
            ‹ Previous
          </button>
          <button type="button" disabled={!onNext} onClick={onNext ?? undefined} className="min-h-12 rounded-md border border-line bg-white px-3 font-medium disabled:text-slate-400">
            Next ›
          </button>
        </div>
      </div>
      <div className="rounded-lg border border-line bg-white p-3">
        <h2 className="text-xl font-semibold">
          Input {row.input} ({row.terminals}) · zone {row.zones.join(", ")}
        </h2>
        <p className="font-medium">{row.detectors.map((d) => d.label).join(" + ")}</p>
        <p className="text-sm text-slate-700">
          {row.detectors.map((d) => `${d.deviceType} (${d.contact}${d.tamper ? ", tamper" : ""}) in ${d.area} / ${d.room}`).join("; ")}
        </p>
        <p className="mt-1 text-sm">
          {row.schemeText} · {row.placementText} · {row.cable.gaugeText}, {row.cable.lengthM} m
        </p>
        <ul className="mt-2 space-y-1 text-sm">
          {row.resistors.map((r) => (
            <li key={r.role} className="flex flex-wrap items-center gap-2">
              <strong className="tabular-nums">{r.valueText}</strong> {r.name}: <ResistorBands r={r} /> <span className="text-slate-700">{r.where}</span>
            </li>
          ))}
        </ul>
        <details className="mt-2 text-sm">
          <summary className="cursor-pointer font-medium">Core map</summary>
          <ul className="mt-1 space-y-0.5">
            {row.cores.map((c) => (
              <li key={c.core}>
                Core {c.core} ({c.carries}): {c.panelEnd} → {c.farEnd}
              </li>
            ))}
          </ul>
        </details>
        {lifeSafety ? (
          <p role="note" className="mt-2 rounded border border-warn bg-warn-soft px-2 py-1 text-sm" data-testid="loop-caution">
            <strong className="text-warn">Life-safety device.</strong> Test it only as its instructions and the local fire code allow, with the monitoring centre and the building told first;
            the authority having jurisdiction and licensed people decide. Loopwright&apos;s figures are an aid, not an approval.
          </p>
        ) : null}
        <p className="mt-2 text-xs text-slate-600">Measure across the input&apos;s terminal pair at the panel end, with the pair lifted off the input, the meter on its resistance range.</p>
      </div>

      {row.expected.length === 0 ? <p className="rounded-md border border-fault bg-fault-soft p-3">This loop cannot be tested against the sheet: {row.noReadingsReason}</p> : null}
      {row.expected.map((e) => (
        <TestCard
          key={e.test}
          expected={e}
          verdictOf={(text) => {
            const r = parseMeterReading(text);
            return r ? diagnoseReading(loop, e.test, r, { usualValues }) : null;
          }}
          latest={progress?.tests.find((t) => t.test === e.test)?.latest ?? null}
          earlier={progress?.tests.find((t) => t.test === e.test)?.earlier ?? []}
          waiting={waiting.filter((w) => w.test === e.test).length}
          canRecord={canRecord}
          onRecord={(text) => onRecord(e.test, text)}
        />
      ))}

      <PhotoBox layoutId={layoutId} row={row} photos={photos} canRecord={canRecord} onPhoto={onPhoto} />
    </section>
  );
}

function VerdictView({ v, testId }: { v: ReadingVerdict; testId: string }) {
  const pass = v.verdict === "pass";
  return (
    <div data-testid={testId} data-verdict={v.verdict} className={`mt-2 rounded-md border-2 p-2 ${pass ? "border-signal bg-signal-soft" : "border-fault bg-fault-soft"}`}>
      <p className={`text-lg font-bold ${pass ? "text-signal" : "text-fault"}`}>
        {pass ? "PASS" : "FAIL"} · {v.readingText} <span className="text-sm font-medium text-ink">(expected {v.expectedText})</span>
      </p>
      {v.diagnoses.map((d, i) => (
        <p key={i} className="mt-1 text-sm" data-code={d.code}>
          {d.text}
        </p>
      ))}
    </div>
  );
}

function TestCard({
  expected,
  verdictOf,
  latest,
  earlier,
  waiting,
  canRecord,
  onRecord,
}: {
  expected: ExpectedReading;
  verdictOf: (text: string) => ReadingVerdict | null;
  latest: RecordedReading | null;
  earlier: RecordedReading[];
  waiting: number;
  canRecord: boolean;
  onRecord: (text: string) => Promise<void>;
}) {
  const [text, setText] = useState("");
  const [busy, setBusy] = useState(false);
  const v = text.trim() ? verdictOf(text) : null;
  const id = `reading-${expected.test}`;
  const save = async () => {
    if (!v) return;
    setBusy(true);
    try {
      await onRecord(text);
      setText("");
    } finally {
      setBusy(false);
    }
  };
  return (
    <div className="rounded-lg border border-line bg-white p-3" data-testid={`test-${expected.test}`}>
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <label htmlFor={id} className="text-lg font-semibold">
          {TEST_WORDS[expected.test]}
        </label>
        <span className="text-lg font-semibold tabular-nums">{expected.rangeText}</span>
      </div>
      <p className="text-sm">{expected.instruction}</p>
      {latest ? (
        <p className={`mt-1 text-sm font-medium ${latest.verdict === "pass" ? "text-signal" : "text-fault"}`} data-testid={`latest-${expected.test}`} data-verdict={latest.verdict}>
          Saved: {latest.reading.kind === "open" ? "open (OL)" : formatOhms(latest.reading.ohms)} — {latest.verdict}
          {latest.recordedBy ? `, by ${latest.recordedBy}` : ""}
        </p>
      ) : null}
      {earlier.length ? (
        <p className="text-xs text-slate-600">
          Before: {earlier.map((r) => `${r.reading.kind === "open" ? "open (OL)" : formatOhms(r.reading.ohms)} ${r.verdict}`).join(", ")}
        </p>
      ) : null}
      {waiting ? <p className="mt-1 text-sm font-medium text-warn">{waiting} waiting to send</p> : null}
      {canRecord ? (
        <form
          className="mt-2 flex flex-wrap items-stretch gap-2"
          onSubmit={(e) => {
            e.preventDefault();
            void save();
          }}
        >
          <input
            id={id}
            data-testid={id}
            value={text}
            onChange={(e) => setText(e.target.value)}
            inputMode="decimal"
            autoComplete="off"
            autoCapitalize="off"
            spellCheck={false}
            placeholder="4k7, 4.71k, OL"
            className="h-16 min-w-0 basis-full rounded-md border-2 border-line bg-white px-3 text-2xl font-semibold tabular-nums sm:basis-auto sm:flex-1"
            aria-describedby={`${id}-help`}
          />
          <button type="button" className="h-16 w-14 rounded-md border border-line bg-slate-50 text-xl font-semibold" onClick={() => setText((t) => `${t}k`)} aria-label="add k (kilohm)">
            k
          </button>
          <button type="button" className="h-16 w-16 rounded-md border border-line bg-slate-50 text-xl font-semibold" onClick={() => setText("OL")} aria-label="open: the meter shows OL">
            OL
          </button>
          <button type="submit" disabled={!v || busy} data-testid={`save-${expected.test}`} className="h-16 flex-1 rounded-md bg-signal px-5 text-lg font-semibold text-white disabled:bg-slate-400 sm:flex-none">
            {busy ? "Saving…" : "Save"}
          </button>
          <span id={`${id}-help`} className="sr-only">
            Type ohms as the meter shows them: 4710, 4.71k or 4k7; OL when it reads open.
          </span>
        </form>
      ) : null}
      {text.trim() && !v ? (
        <p className="mt-2 text-sm font-medium text-fault" data-testid={`verdict-${expected.test}`} data-verdict="unreadable">
          “{text}” is not a reading: type ohms (4710, 4.71k, 4k7) or OL for open.
        </p>
      ) : null}
      {v ? <VerdictView v={v} testId={`verdict-${expected.test}`} /> : null}
    </div>
  );
}

function PhotoBox({ layoutId, row, photos, canRecord, onPhoto }: { layoutId: number; row: SheetInput; photos: PhotoView[]; canRecord: boolean; onPhoto: (p: PhotoView) => void }) {
  const [message, setMessage] = useState<{ kind: "ok" | "error"; text: string } | null>(null);
  const [busy, setBusy] = useState(false);
  const [pending, setPending] = useState<File | null>(null);

  async function upload(file: File) {
    setMessage(null);
    if (file.size > MAX_PHOTO_BYTES) return setMessage({ kind: "error", text: `The photo is ${(file.size / 1024 / 1024).toFixed(1)} MiB; the limit is ${MAX_PHOTO_BYTES / 1024 / 1024} MiB. Take it at a lower resolution.` });
    if (file.size === 0) return setMessage({ kind: "error", text: "The file is empty." });
    const head = new Uint8Array(await file.slice(0, 16).arrayBuffer());
    if (!detectPhotoType(head)) return setMessage({ kind: "error", text: "Only JPEG, PNG and WebP photos can be kept: this file is none of them." });
    setBusy(true);
    setPending(file);
    const form = new FormData();
    form.append("file", file, file.name);
    form.append("boardKey", row.boardKey);
    form.append("input", String(row.input));
    form.append("clientId", newClientId());
    try {
      const res = await fetch(`/api/layouts/${layoutId}/photos`, { method: "POST", body: form });
      const body = await res.json().catch(() => null);
      if (!res.ok) throw new HttpError(res.status, errorText(body, res.status), body);
      onPhoto((body as { photo: PhotoView }).photo);
      setPending(null);
      setMessage({ kind: "ok", text: `Photo kept: ${(body as { photo: PhotoView }).photo.fileName}.` });
    } catch (e) {
      setMessage({ kind: "error", text: e instanceof HttpError ? e.message : "The photo could not be sent (no connection). Try again when you have signal." });
    } finally {
      setBusy(false);
    }
  }

  return (
    <div className="rounded-lg border border-line bg-white p-3" data-testid="photos">
      <h3 className="text-lg font-semibold">Photos of the terminations</h3>
      {photos.length ? (
        <ul className="mt-2 grid grid-cols-3 gap-2">
          {photos.map((p) => (
            <li key={p.id}>
              <a href={`/api/layouts/${layoutId}/photos/${p.id}`} target="_blank" rel="noreferrer">
                {/* eslint-disable-next-line @next/next/no-img-element -- served by our own route, not optimisable */}
                <img src={`/api/layouts/${layoutId}/photos/${p.id}`} alt={`Terminations of input ${row.input}: ${p.fileName}`} className="aspect-square w-full rounded border border-line object-cover" />
              </a>
              <span className="block truncate text-xs text-slate-600">{p.fileName}</span>
            </li>
          ))}
        </ul>
      ) : (
        <p className="text-sm text-slate-600">No photo of this loop yet.</p>
      )}
      {canRecord ? (
        <label className="mt-2 flex min-h-14 cursor-pointer items-center justify-center rounded-md border-2 border-dashed border-signal px-3 text-lg font-semibold text-signal">
          {busy ? "Sending the photo…" : "Take or choose a photo"}
          <input
            type="file"
            accept={PHOTO_TYPES.join(",")}
            capture="environment"
            className="sr-only"
            data-testid="photo-input"
            disabled={busy}
            onChange={(e) => {
              const f = e.target.files?.[0];
              e.target.value = "";
              if (f) void upload(f);
            }}
          />
        </label>
      ) : null}
      {message ? (
        <p className={`mt-2 text-sm ${message.kind === "error" ? "font-medium text-fault" : "text-signal"}`} data-testid="photo-message">
          {message.text}
          {message.kind === "error" && pending ? (
            <button type="button" className="ml-2 underline" onClick={() => void upload(pending)}>
              Try again
            </button>
          ) : null}
        </p>
      ) : null}
      <p className="mt-1 text-xs text-slate-500">JPEG, PNG or WebP, at most {MAX_PHOTO_BYTES / 1024 / 1024} MiB.</p>
    </div>
  );
}
