// The meter reading for the chosen states and fault, the panel's report for it, and what is wrong with it.
import type { Band, Report } from "@/lib/catalog/schema";
import { FAULT_WORDS, formatOhms, formatOhmsRange, type Fault, type Placement } from "@/lib/loop";
import { acceptableReport, type CurrentReading } from "./bench-state";
import { BandStrip } from "./band-strip";
import { REPORT_CLASS, reportWord } from "./report-style";

function ReportPills({ reports, large }: { reports: readonly Report[]; large?: boolean }) {
  return (
    <span className="inline-flex flex-wrap items-center gap-2">
      {reports.map((r, i) => (
        <span key={r} className="inline-flex items-center gap-2">
          {i > 0 ? <span className="text-sm text-slate-500">or</span> : null}
          <span className={`whitespace-nowrap rounded-md px-2.5 py-0.5 font-semibold ${REPORT_CLASS[r]} ${large ? "text-2xl" : "text-sm"}`}>{reportWord(r)}</span>
        </span>
      ))}
    </span>
  );
}

export { ReportPills };

export function ReadingPanel({
  reading,
  fault,
  placement,
  bands,
  tolerancePct,
  tempMinC,
  tempMaxC,
  faultWords,
}: {
  reading: CurrentReading | null;
  fault: Fault;
  /** A conductor fault in force instead of `fault`, in words. */
  faultWords?: string;
  placement: Placement;
  bands: readonly Band[] | undefined;
  tolerancePct: number;
  tempMinC: number;
  tempMaxC: number;
}) {
  if (!reading)
    return (
      <section className="rounded-lg border border-fault bg-fault-soft p-4 text-sm" role="alert" data-testid="reading-panel">
        <p className="font-semibold text-fault">No reading: the loop as set can&apos;t be measured.</p>
        <p className="mt-1">See the findings below for what to change.</p>
      </section>
    );
  const { reports, expected } = reading;
  const faultText = faultWords ?? (fault !== "none" ? FAULT_WORDS[fault] : null);
  const defeat = faultText !== null && reports.includes("normal");
  const tamperUnseen = faultText === null && expected === "open" && reports.includes("normal");
  const wrong = reports.filter((r) => !acceptableReport(expected, r));
  const misread = !defeat && !tamperUnseen && wrong.length === reports.length;
  const uncertain = reports.length > 1 && !defeat;
  return (
    <section className="rounded-lg border border-line bg-white p-4 shadow-sm" aria-live="polite" data-testid="reading-panel">
      <div className="grid grid-cols-1 gap-4 sm:grid-cols-2">
        <div>
          <p className="text-xs font-semibold uppercase tracking-wide text-slate-500">Reading at the input</p>
          <p className="mt-1 text-4xl font-semibold tabular-nums" data-testid="meter-reading">
            {formatOhms(reading.nominalOhms)}
          </p>
          <p className="mt-1 text-sm text-slate-600">
            between <span className="font-medium tabular-nums text-ink" data-testid="reading-interval">{formatOhmsRange(reading.minOhms, reading.maxOhms)}</span>
            <span className="block text-xs">
              parts ±{tolerancePct} %, cable {tempMinC} °C to {tempMaxC} °C
            </span>
          </p>
        </div>
        <div>
          <p className="text-xs font-semibold uppercase tracking-wide text-slate-500">The panel reports</p>
          <p className="mt-1" data-testid="panel-report">
            <ReportPills reports={reports} large />
          </p>
          <p className="mt-2 text-sm text-slate-600">
            A sound, correctly wired loop should report <span className="font-medium text-ink">{reportWord(expected)}</span>
            {expected === "short" || expected === "open" ? " (or trouble)" : ""}.
          </p>
          <p className="mt-1 text-xs text-slate-500">{reading.label.charAt(0).toUpperCase() + reading.label.slice(1)}</p>
        </div>
      </div>

      {defeat ? (
        <div role="alert" data-testid="defeat-warning" className="mt-4 rounded-md border border-fault bg-fault-soft p-3 text-sm">
          <p className="font-semibold text-fault">Defeat: {faultText} reads as normal.</p>
          <p className="mt-1">
            The panel can&apos;t see this fault: every detector beyond it is silenced and nothing is reported.
            {placement === "at-panel" ? " The resistor sits at the input terminals, so the panel reads it whatever happens on the cable." : ""}
          </p>
        </div>
      ) : null}
      {tamperUnseen ? (
        <div role="alert" className="mt-4 rounded-md border border-fault bg-fault-soft p-3 text-sm">
          <p className="font-semibold text-fault">An open tamper reads as normal.</p>
          <p className="mt-1">The detector&apos;s cover can be opened without the panel knowing.</p>
        </div>
      ) : null}
      {misread ? (
        <div role="status" data-testid="misread-warning" className="mt-4 rounded-md border border-warn bg-warn-soft p-3 text-sm">
          <p className="font-semibold text-warn">
            Misread: reported as {reports.map(reportWord).join(" or ")}, not {reportWord(expected)}.
          </p>
          <p className="mt-1">The panel tells whoever responds the wrong thing.</p>
        </div>
      ) : null}
      {uncertain ? (
        <div role="status" data-testid="uncertain-warning" className="mt-4 rounded-md border border-warn bg-warn-soft p-3 text-sm">
          <p className="font-semibold text-warn">Uncertain: the reading straddles a band edge.</p>
          <p className="mt-1">
            Across the parts&apos; tolerance and the cable&apos;s temperature range the panel may report {reports.map(reportWord).join(" or ")}: expect intermittent reports.
          </p>
        </div>
      ) : null}
      {reading.row === null && faultWords === undefined ? <p className="mt-3 text-xs text-slate-500">This mix of states is worked out for the bench only; the table lists the combinations the analysis checks.</p> : null}

      {bands ? (
        <div className="mt-4">
          <p className="mb-1 text-xs font-semibold uppercase tracking-wide text-slate-500">Bands of the input type (ohms, logarithmic)</p>
          <BandStrip bands={bands} minOhms={reading.minOhms} maxOhms={reading.maxOhms} nominalOhms={reading.nominalOhms} />
        </div>
      ) : null}
    </section>
  );
}
