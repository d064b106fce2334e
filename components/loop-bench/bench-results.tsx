"use client";

import { Caution } from "@/components/ui/caution";
import type { ReactNode } from "react";
import { formatOhms, LIFE_SAFETY_CAUTION } from "@/lib/loop";
import { LoopSchematic } from "@/components/loop-schematic/loop-schematic";
import { resistorAtPanelShort, withRow } from "./bench-actions";
import { CableSummary } from "./cable-summary";
import { ConductorVerdict } from "./conductor-verdict";
import { DecodeTable } from "./decode-table";
import { FindingsList } from "./findings-list";
import { ReadingPanel } from "./reading-panel";
import { ResistorCards } from "./resistor-cards";
import { StatesTable } from "./states-table";
import type { Bench } from "./use-bench";
import { Verdicts } from "./verdicts";

function Card({ title, children, testId, className = "" }: { title: string; children: ReactNode; testId?: string; className?: string }) {
  return (
    <section className={`rounded-lg border border-line bg-white p-4 shadow-sm ${className}`} data-testid={testId}>
      <h2 className="mb-3 text-base font-semibold">{title}</h2>
      {children}
    </section>
  );
}

/** What the loop as wired reads and reports: the schematic, the reading, the verdicts, every state, findings, parts. */
export function BenchResults({ bench }: { bench: Bench }) {
  const { s, update, inputType, loop, analysis, states, reading, conductor } = bench;
  return (
    <div className="grid min-w-0 grid-cols-[minmax(0,1fr)] content-start gap-4">
      {bench.lifeSafety ? (
        <Caution testId="life-safety-caution" summary={<><strong className="text-warn">Life-safety devices:</strong> an aid, not an approval; the local fire code and the authority having jurisdiction decide.</>}>
          {LIFE_SAFETY_CAUTION} Installation and certification are for licensed people.
        </Caution>
      ) : null}

      <section className="relative overflow-x-auto rounded-lg border border-line bg-white p-3 shadow-sm" tabIndex={0} aria-labelledby="bench-schematic-title">
        <h2 id="bench-schematic-title" className="sr-only">The loop as wired</h2>
        <LoopSchematic loop={loop} states={states} fault={s.fault} inputType={inputType} readingText={reading ? formatOhms(reading.nominalOhms) : "–"} className="w-full" conductorFault={s.conductor ? (conductor?.fault ?? null) : undefined} />
      </section>

      <ReadingPanel reading={reading} fault={s.fault} faultWords={conductor && conductor.verdict !== "no-effect" ? conductor.label : undefined} placement={s.placement} bands={inputType.bands[s.scheme]} tolerancePct={s.tolerancePct} tempMinC={s.tempMinC} tempMaxC={s.tempMaxC} />
      {conductor ? <ConductorVerdict result={conductor} detectors={loop.detectors} /> : null}

      {analysis.valid !== false ? <Verdicts faults={analysis.faults} /> : null}

      <aside className="rounded-lg border border-line bg-signal-soft/50 p-4 text-sm" aria-labelledby="why-end-of-line">
        <h2 id="why-end-of-line" className="font-semibold">
          Why the resistor belongs at the end of the line
        </h2>
        <p className="mt-1">
          A short across the cable joins the two conductors there, so the panel sees nothing beyond it. With the resistor at the detector, the short bypasses the resistor too and the
          reading drops to a few ohms of cable: the panel reports a short. With the resistor at the panel, the resistor stays in circuit whatever happens on the cable, so the short
          still reads as normal and the detectors are silenced without a trace.
        </p>
        <button type="button" className="mt-2 text-sm font-medium text-signal underline" onClick={() => update((prev) => resistorAtPanelShort(prev, inputType))}>
          Try it: resistor at the panel, short at the detector end
        </button>
      </aside>
      {analysis.valid !== false ? (
        <Card title="Every state and fault" testId="all-rows">
          <StatesTable rows={analysis.rows} detectors={loop.detectors} current={reading?.row ?? null} onSelect={(st, fault) => update((prev) => withRow(prev, st, fault))} />
        </Card>
      ) : null}
      <Card title={`Findings (${analysis.findings.length})`} testId="findings-card">
        <FindingsList findings={analysis.findings} />
      </Card>
      {analysis.valid !== false ? (
        <div className="grid grid-cols-1 gap-4">
          <Card title="Resistors">
            <ResistorCards resistors={analysis.resistors} tolerancePct={s.tolerancePct} scheme={s.scheme} placement={s.placement} />
          </Card>
          <Card title="Cable">
            <CableSummary analysis={analysis} lengthM={s.lengthM} gaugeText={bench.gaugeText} conductors={bench.conductors} maxLoopOhms={inputType.maxLoopOhms} tempMaxC={s.tempMaxC} />
          </Card>
        </div>
      ) : null}
      {analysis.decode ? (
        <Card title="Shared input: decode table" testId="decode">
          <DecodeTable decode={analysis.decode} lost={analysis.sharedLost} />
        </Card>
      ) : null}
      <p className="text-xs text-slate-500">
        Readings are intervals over the parts&apos; tolerance and the cable&apos;s temperature range (copper, IEC 60028; AWG by ASTM B258). Loopwright&apos;s figures are an aid, not an
        approval.
      </p>
    </div>
  );
}
