import { adviceOf } from "@/lib/commissioning/advice";
import type { MeasuredReading, ReadingVerdict } from "@/lib/commissioning/diagnose";
import type { LoopProgress, RecordedReading } from "@/lib/commissioning/progress";
import { parseMeterReading } from "@/lib/commissioning/reading-schema";
import type { TestKey } from "@/lib/sheet/sheet-types";
import type { QueuedReading } from "@/components/commissioning/reading-queue";
import { TEST_WORDS } from "@/components/sheet/test-words";
import { useFormat } from "@/components/format/format-provider";

interface HistoryLine {
  key: string;
  at: string;
  test: TestKey;
  reading: MeasuredReading;
  by: string | null;
  waiting: boolean;
}

/** Every reading of this loop, newest first, with the verdict and likely cause worked out here (readings still waiting to send included). */
export function LoopHistory({ progress, waiting, judge }: { progress: LoopProgress | null; waiting: QueuedReading[]; judge: (test: TestKey, r: MeasuredReading) => ReadingVerdict | null }) {
  const { dateTime } = useFormat();
  const saved: HistoryLine[] = (progress?.tests ?? []).flatMap((t) => [...t.earlier, ...(t.latest ? [t.latest] : [])]).map((r: RecordedReading, i) => ({ key: `s${i}-${r.recordedAt}`, at: r.recordedAt, test: r.test, reading: r.reading, by: r.recordedBy, waiting: false }));
  const queued: HistoryLine[] = waiting.flatMap((q) => {
    const r = parseMeterReading(q.reading);
    return r ? [{ key: q.clientId, at: q.queuedAt, test: q.test as TestKey, reading: r, by: null, waiting: true }] : [];
  });
  const lines = [...saved, ...queued].sort((a, b) => b.at.localeCompare(a.at));
  if (!lines.length) return null;
  return (
    <section className="rounded-lg border border-line bg-white p-3" aria-label="Readings of this loop" data-testid="loop-history">
      <h3 className="font-semibold">Readings of this loop</h3>
      <ol className="mt-1 flex flex-col gap-2 text-sm">
        {lines.map((l) => {
          const v = judge(l.test, l.reading);
          const a = v ? adviceOf(v) : null;
          return (
            <li key={l.key} data-verdict={a?.verdict ?? "unknown"} className="border-t border-line pt-1 first:border-0 first:pt-0">
              <span className="text-xs text-slate-600">
                {dateTime(l.at)} · {TEST_WORDS[l.test] ?? l.test}
                {l.by ? ` · ${l.by}` : ""}
                {l.waiting ? " · waiting to send" : ""}
              </span>
              <br />
              <span className={a?.verdict === "fail" ? "font-semibold text-fault" : "font-semibold text-signal"}>{a ? a.headline : "not a test of this loop"}</span>
              {a?.likelyCause ? <span> — {a.likelyCause}</span> : null}
            </li>
          );
        })}
      </ol>
    </section>
  );
}
