"use client";

import { LifeSafetyCaution } from "@/components/ui/life-safety-caution";
import { useCallback } from "react";
import type { UsualValue } from "@/lib/commissioning/diagnose";
import { useCommissioning } from "@/lib/client/use-commissioning";
import type { EffectiveReview } from "@/lib/review/effective-state";
import type { CommissioningView, PhotoView, ReadingView } from "@/lib/server/commissioning";
import type { SheetInput, TerminalSheet } from "@/lib/sheet/sheet-types";
import { BoardNav } from "@/components/commissioning/board-nav";
import { Completion } from "@/components/commissioning/completion";
import { LoopList } from "@/components/commissioning/loop-list";
import { LoopPanel } from "@/components/commissioning/loop-panel";
import { NotApproved } from "@/components/commissioning/not-approved";
import { ProgressSummary } from "@/components/commissioning/progress-summary";
import { loopProgressOf, loopsOfBoard } from "@/components/commissioning/progress-view";
import { loopKey } from "@/components/commissioning/selection";
import { useProgress } from "@/components/commissioning/use-progress";
import { useReadingQueue } from "@/components/commissioning/use-reading-queue";
import { useSelection } from "@/components/commissioning/use-selection";
import { withPhoto, withReview, withSavedReadings } from "@/components/commissioning/view-updates";

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

export function CommissioningApp({ siteId, layoutId, initial, sheet, usualValues, canRecord, recordRefusal }: CommissioningAppProps) {
  const { view: loaded, mutate } = useCommissioning(layoutId, initial);
  const view = loaded ?? initial;
  // The screen's copy changes after each write; `current ?? initial` because SWR's cache is empty until the first write.
  const update = useCallback((change: (v: CommissioningView) => CommissioningView) => void mutate((current) => change(current ?? initial), { revalidate: false }), [mutate, initial]);
  const onSaved = useCallback((readings: ReadingView[]) => update((v) => withSavedReadings(v, readings)), [update]);
  const onPhoto = useCallback((p: PhotoView) => update((v) => withPhoto(v, p)), [update]);
  const onCommissioned = useCallback((r: EffectiveReview) => update((v) => withReview(v, r)), [update]);

  const queue = useReadingQueue(layoutId, onSaved);
  const { rows, boards, progress, allPassed, commissioned } = useProgress(sheet, view);
  const selection = useSelection(sheet, rows);
  const revision = view.revision;

  if (!sheet || revision === null) return <NotApproved siteId={siteId} layoutId={layoutId} review={view.review} />;

  const { current, previous, next } = selection;
  const record = (row: SheetInput, test: string, text: string) => queue.record({ boardKey: row.boardKey, input: row.input, test, reading: text });

  return (
    <div className="mx-auto flex max-w-3xl flex-col gap-4 text-base" data-testid="commissioning">
      {sheet.caution ? (
        <LifeSafetyCaution>
          {sheet.caution}
        </LifeSafetyCaution>
      ) : null}

      <ProgressSummary revision={revision} progress={progress} queue={queue} />

      {commissioned ? (
        <p className="rounded-lg border border-signal bg-signal-soft p-3 font-semibold" data-testid="commissioned">
          Revision {revision} is commissioned: its record is closed.
        </p>
      ) : null}
      {allPassed ? <Completion layoutId={layoutId} commissioned={commissioned} canRecord={canRecord} onCommissioned={onCommissioned} /> : null}
      {!canRecord ? <p className="rounded-md border border-line bg-white p-2 text-sm">{recordRefusal}</p> : null}

      <BoardNav boards={boards} progress={progress} boardKey={selection.boardKey} onChoose={selection.chooseBoard} />

      {current === null ? (
        <LoopList boardName={sheet.boards.find((b) => b.boardKey === selection.boardKey)?.name} loops={loopsOfBoard(progress, selection.boardKey)} onChoose={selection.chooseLoop} />
      ) : (
        <LoopPanel
          key={loopKey(current.boardKey, current.input)}
          layoutId={layoutId}
          row={current}
          progress={loopProgressOf(progress, current.boardKey, current.input)}
          usualValues={usualValues}
          waiting={queue.waiting.filter((w) => w.boardKey === current.boardKey && w.input === current.input)}
          photos={view.photos.filter((p) => p.boardKey === current.boardKey && p.input === current.input)}
          canRecord={canRecord && !commissioned}
          onRecord={(test, text) => record(current, test, text)}
          onPhoto={onPhoto}
          onBack={selection.back}
          onPrev={previous === null ? null : () => selection.chooseLoop(previous)}
          onNext={next === null ? null : () => selection.chooseLoop(next)}
        />
      )}
    </div>
  );
}
