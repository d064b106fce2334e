"use client";

import { useState } from "react";
import type { SheetView } from "@/lib/server/sheets";
import type { SheetInput, SpareInput } from "@/lib/sheet/sheet-types";
import { boardSummary, spareGroups } from "@/components/sheet/sheet-words";
import type { PaperSize } from "@/lib/sheet/sheet-request-schema";
import { SheetInputBlock } from "@/components/sheet/sheet-input-block";
import { SheetBoardIndex, boardAnchor } from "@/components/sheet/sheet-board-index";
import { SheetBoardPrint, densePrint } from "@/components/sheet/sheet-board-print";
import { SheetPrintStyle } from "@/components/sheet/sheet-print-style";
import { SheetToolbar } from "@/components/sheet/sheet-toolbar";
import { plural } from "@/lib/vocabulary/plural";
import { LifeSafetyCaution } from "@/components/ui/life-safety-caution";

export interface TerminalSheetViewProps {
  view: SheetView;
  /** The site's assigned installer, when there is one. */
  installer: { name: string; email: string } | null;
  canSend: boolean;
  sendRefusal: string;
  /** The paper the organisation uses, when it has said; A4 otherwise. */
  defaultPaper?: PaperSize;
}

/** The terminal sheet on screen (cards, stacked on a phone), with a board index, and on paper (a compact table per board). */
export function TerminalSheetView({ view, installer, canSend, sendRefusal, defaultPaper = "A4" }: TerminalSheetViewProps) {
  const [size, setSize] = useState<PaperSize>(defaultPaper);
  const { sheet, meta } = view;
  const footer = `Terminal sheet · ${meta.siteName} · “${meta.layoutName}” revision ${meta.revision}${view.approved ? "" : " · NOT APPROVED, for review only"}`;

  return (
    <div className="terminal-sheet min-w-0" data-testid="terminal-sheet" data-paper={size}>
      <SheetPrintStyle size={size} footer={footer} />
      <SheetToolbar approved={view.approved} layoutId={view.layoutId} siteId={view.siteId} revision={meta.revision} size={size} onSize={setSize} installer={installer} canSend={canSend} sendRefusal={sendRefusal} />

      <header className="sheet-head mb-3">
        <h2 className="break-words text-xl font-semibold">Terminal sheet — {meta.siteName}</h2>
        <p className="text-sm">
          Layout “{meta.layoutName}”, revision {meta.revision} · {sheet.panel ? sheet.panel.name : "no control panel"} · {plural(sheet.zoneCount, "zone")} on {plural(sheet.boards.length, "board")} · generated {meta.generatedAt}
        </p>
        {view.approved ? (
          <p className="mt-1 text-sm font-semibold text-signal" data-testid="sheet-approval">
            Approved revision {meta.revision}: wire to this sheet.
            {meta.approvedSolo ? <span className="ml-1 text-fault" data-testid="solo-approval">Approved without a second review.</span> : null}
            {view.frozen ? <span className="ml-1 font-normal text-slate-700">Read from the schedule and catalog frozen at approval.</span> : null}
          </p>
        ) : (
          <p className="mt-2 rounded-md border-2 border-fault bg-fault-soft px-3 py-2 text-base font-bold uppercase tracking-wide text-fault" data-testid="sheet-approval">
            Not approved — for review only
          </p>
        )}
        {sheet.caution ? (
          <>
            <LifeSafetyCaution className="mt-2 print:hidden">
              {sheet.caution}
            </LifeSafetyCaution>
            {/* on paper the caution is printed in full: a closed line cannot be opened there */}
            <p className="mt-2 hidden rounded-md border border-warn px-3 py-2 print:block" data-testid="printed-caution">
              <strong className="text-warn">Caution.</strong> {sheet.caution}
            </p>
          </>
        ) : null}
        <p className="mt-2 text-xs text-slate-700">
          {sheet.measuringNote}
          <span className="hidden print:inline"> Write each measured reading beside the expected one and tick ☐ when the panel reports it as shown.</span>
        </p>
        {sheet.problems.length ? (
          <ul className="mt-2 list-disc pl-5 text-sm text-fault">
            {sheet.problems.map((p, i) => (
              <li key={i}>{p}</li>
            ))}
          </ul>
        ) : null}
        {sheet.unplaced.length ? (
          <p className="mt-2 text-sm text-fault">
            Not on any input ({sheet.unplaced.length}): {sheet.unplaced.map((u) => u.label).join(", ")}.
          </p>
        ) : null}
      </header>

      <SheetBoardIndex boards={sheet.boards} />

      {sheet.boards.map((b) => {
        const used = b.rows.filter((r): r is SheetInput => !r.spare);
        const spare = b.rows.filter((r): r is SpareInput => r.spare);
        return (
          <section key={b.boardKey} id={boardAnchor(b.boardKey)} className="sheet-board mb-8 scroll-mt-4" data-testid={`sheet-board-${b.boardKey}`} data-dense={densePrint(b) ? "" : undefined}>
            <div className="mb-2 border-b-2 border-ink pb-1 print:hidden">
              <h2 className="break-words text-lg font-semibold">
                {b.name} — {b.deviceName}
              </h2>
              <p className="text-xs text-slate-700">{boardSummary(b)}</p>
            </div>
            {used.map((r) => (
              <SheetInputBlock key={r.input} row={r} />
            ))}
            <SheetBoardPrint board={b} />
            {spare.length ? (
              <div className="sheet-print-input mb-4 mt-2 text-xs print:mb-0 print:mt-0.5 print:text-[6.5pt]">
                <h3 className="text-sm font-semibold print:inline print:text-[6.5pt]">Spare inputs</h3>
                <ul className="mt-1 space-y-0.5 print:inline print:space-y-0">
                  {spareGroups(spare).map((g) => (
                    <li key={g.inputs} className="print:inline">
                      {" "}
                      <strong>{g.inputs}</strong>: {g.note}
                    </li>
                  ))}
                </ul>
              </div>
            ) : null}
            <div className="sheet-print-input mt-4 grid grid-cols-1 gap-3 rounded-md border border-ink p-3 text-sm sm:grid-cols-3 print:mt-1 print:grid-cols-3 print:gap-x-2 print:gap-y-0 print:p-1 print:text-[6.5pt]" data-testid="sign-off">
              <p className="font-semibold sm:col-span-3">Sign-off: {b.name}</p>
              {b.signOff.map((line, i) => (
                <p key={i} className="whitespace-pre-wrap break-words">
                  {line}
                </p>
              ))}
            </div>
          </section>
        );
      })}
    </div>
  );
}
