import type { CommissioningProgressReport } from "@/lib/commissioning/progress";
import type { QueuedReading, RefusedReading } from "@/components/commissioning/reading-queue";
import { progressDetail } from "@/components/commissioning/progress-view";
import { ProgressBar } from "@/components/commissioning/progress-bar";
import { RefusedList } from "@/components/commissioning/refused-list";
import { WaitingBanner } from "@/components/commissioning/waiting-banner";
import { plural } from "@/lib/vocabulary/plural";

interface ProgressSummaryProps {
  revision: number;
  progress: CommissioningProgressReport;
  queue: { waiting: QueuedReading[]; refused: RefusedReading[]; online: boolean; lastTry: Date | null; sendNow: () => void; dismiss: (clientId: string) => void };
}

/** The site's count of passed loops, and the readings not on the server yet. */
export function ProgressSummary({ revision, progress, queue }: ProgressSummaryProps) {
  const t = progress.totals;
  return (
    <section className="rounded-lg border border-line bg-white p-3" aria-label="Progress">
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <p className="text-lg font-semibold" data-testid="site-progress">
          {t.passed} of {plural(t.loops, "loop")} passed
        </p>
        <p className="text-sm text-slate-600">{progressDetail(revision, t)}</p>
      </div>
      <ProgressBar passed={t.passed} failed={t.failed} total={t.loops} />
      <WaitingBanner waiting={queue.waiting} online={queue.online} lastTry={queue.lastTry} onSend={queue.sendNow} />
      <RefusedList refused={queue.refused} onDismiss={queue.dismiss} />
    </section>
  );
}
