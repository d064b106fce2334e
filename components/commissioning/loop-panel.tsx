"use client";

import { useMemo } from "react";
import { diagnoseLoopOf, diagnoseReading, type MeasuredReading, type UsualValue } from "@/lib/commissioning/diagnose";
import type { LoopProgress } from "@/lib/commissioning/progress";
import { parseMeterReading } from "@/lib/commissioning/reading-schema";
import type { PhotoView } from "@/lib/server/commissioning";
import type { SheetInput, TestKey } from "@/lib/sheet/sheet-types";
import type { QueuedReading } from "@/components/commissioning/reading-queue";
import { LoopFacts } from "@/components/commissioning/loop-facts";
import { PhotoBox } from "@/components/commissioning/photo-box";
import { TestCard } from "@/components/commissioning/test-card";
import { LoopHistory } from "@/components/commissioning/loop-history";

interface LoopPanelProps {
  layoutId: number;
  row: SheetInput;
  progress: LoopProgress | null;
  usualValues: UsualValue[];
  /** This loop's readings kept on the device, not on the server yet. */
  waiting: QueuedReading[];
  photos: PhotoView[];
  canRecord: boolean;
  onRecord: (test: string, text: string) => Promise<void>;
  onPhoto: (p: PhotoView) => void;
  onBack: () => void;
  onPrev: (() => void) | null;
  onNext: (() => void) | null;
}

const NAV_BUTTON = "min-h-12 rounded-md border border-line bg-white px-3 font-medium disabled:text-slate-400";

/** One loop open: its facts, a card per test on the sheet, its photos. */
export function LoopPanel({ layoutId, row, progress, usualValues, waiting, photos, canRecord, onRecord, onPhoto, onBack, onPrev, onNext }: LoopPanelProps) {
  const loop = useMemo(() => diagnoseLoopOf(row), [row]);
  // The same lib/commissioning code the server judges with, run here: the phone needs no signal for it.
  const judge = (test: TestKey, r: MeasuredReading) => (row.expected.some((e) => e.test === test) ? diagnoseReading(loop, test, r, { usualValues }) : null);
  return (
    <section aria-label={`Input ${row.input}`} data-testid="loop-panel" className="flex flex-col gap-3">
      <div className="flex items-center justify-between gap-2">
        <button type="button" onClick={onBack} className="min-h-12 rounded-md border border-line bg-white px-3 font-medium">
          ← All loops
        </button>
        <div className="flex gap-2">
          <button type="button" disabled={!onPrev} onClick={onPrev ?? undefined} className={NAV_BUTTON}>
            ‹ Previous
          </button>
          <button type="button" disabled={!onNext} onClick={onNext ?? undefined} className={NAV_BUTTON}>
            Next ›
          </button>
        </div>
      </div>
      <LoopFacts row={row} />

      {row.expected.length === 0 ? <p className="rounded-md border border-fault bg-fault-soft p-3">This loop cannot be tested against the sheet: {row.noReadingsReason}</p> : null}
      {row.expected.map((e) => {
        const tests = progress?.tests.find((t) => t.test === e.test);
        return (
          <TestCard
            key={e.test}
            expected={e}
            verdictOf={(text) => {
              const r = parseMeterReading(text);
              return r ? diagnoseReading(loop, e.test, r, { usualValues }) : null;
            }}
            judge={(r) => judge(e.test, r)}
            latest={tests?.latest ?? null}
            earlier={tests?.earlier ?? []}
            waiting={waiting.filter((w) => w.test === e.test).length}
            canRecord={canRecord}
            onRecord={(text) => onRecord(e.test, text)}
          />
        );
      })}

      <LoopHistory progress={progress} waiting={waiting} judge={judge} />

      <PhotoBox layoutId={layoutId} row={row} photos={photos} canRecord={canRecord} onPhoto={onPhoto} />
    </section>
  );
}
