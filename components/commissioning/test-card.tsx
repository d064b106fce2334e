"use client";

import { useState } from "react";
import { adviceOf } from "@/lib/commissioning/advice";
import type { MeasuredReading, ReadingVerdict } from "@/lib/commissioning/diagnose";
import type { RecordedReading } from "@/lib/commissioning/progress";
import { formatOhms } from "@/lib/resistors/format-ohms";
import type { ExpectedReading } from "@/lib/sheet/sheet-types";
import { TEST_WORDS } from "@/components/sheet/test-words";
import { VerdictView } from "@/components/commissioning/verdict-view";
import { ReadingAdviceView } from "@/components/commissioning/reading-advice";

interface TestCardProps {
  expected: ExpectedReading;
  verdictOf: (text: string) => ReadingVerdict | null;
  /** The verdict of a stored reading, worked out here from the same sheet row. */
  judge: (r: MeasuredReading) => ReadingVerdict | null;
  latest: RecordedReading | null;
  earlier: RecordedReading[];
  /** How many readings of this test are kept on the device, not sent yet. */
  waiting: number;
  canRecord: boolean;
  onRecord: (text: string) => Promise<void>;
}

const readingText = (r: RecordedReading) => (r.reading.kind === "open" ? "open (OL)" : formatOhms(r.reading.ohms));

/** One test of a loop: the expected range, the saved readings, and a field judged as it is typed. */
export function TestCard({ expected, verdictOf, judge, latest, earlier, waiting, canRecord, onRecord }: TestCardProps) {
  const [text, setText] = useState("");
  const [busy, setBusy] = useState(false);
  // The reading just recorded on this phone: its advice stays on screen once the field is cleared, signal or not.
  const [recorded, setRecorded] = useState<ReadingVerdict | null>(null);
  const after = recorded ?? (latest ? judge(latest.reading) : null);
  const v = text.trim() ? verdictOf(text) : null;
  const id = `reading-${expected.test}`;
  const save = async () => {
    if (!v) return;
    setBusy(true);
    try {
      await onRecord(text);
      setRecorded(v);
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
          Saved: {readingText(latest)} — {latest.verdict}
          {latest.recordedBy ? `, by ${latest.recordedBy}` : ""}
        </p>
      ) : null}
      {earlier.length ? <p className="text-xs text-slate-600">Before: {earlier.map((r) => `${readingText(r)} ${r.verdict}`).join(", ")}</p> : null}
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
      {!v && after ? <ReadingAdviceView advice={adviceOf(after)} testId={`advice-${expected.test}`} title={recorded ? "Reading recorded" : "Latest reading"} /> : null}
    </div>
  );
}
