"use client";

import { useState } from "react";
import type { SheetView } from "@/lib/server/sheets";
import type { SheetInput, SpareInput } from "@/lib/sheet/sheet-types";
import { PAPER_WORDS, sendSheetSchema, type PaperSize } from "@/lib/sheet/sheet-request-schema";
import { Button } from "@/components/ui/button";
import { describeError, FetchError, sendJson } from "@/lib/client/fetcher";
import { SheetInputBlock } from "@/components/sheet/sheet-input-block";
import { plural } from "@/lib/vocabulary/plural";

export interface TerminalSheetViewProps {
  view: SheetView;
  /** The site's assigned installer, when there is one. */
  installer: { name: string; email: string } | null;
  canSend: boolean;
  sendRefusal: string;
}

const PAGE_CSS: Record<PaperSize, string> = { A4: "A4 portrait", LETTER: "letter portrait" };

export function TerminalSheetView({ view, installer, canSend, sendRefusal }: TerminalSheetViewProps) {
  const [size, setSize] = useState<PaperSize>("A4");
  const [sending, setSending] = useState(false);
  const [sent, setSent] = useState<{ kind: "ok" | "error"; text: string } | null>(null);
  const { sheet, meta } = view;
  const rev = `revision=${meta.revision}`;
  const pdf = (s: PaperSize) => `/api/layouts/${view.layoutId}/sheet/pdf?size=${s}&${rev}`;

  async function send() {
    setSending(true);
    setSent(null);
    try {
      const r = await sendJson<{ sent: { to: string; installer: string; fileName: string; sizeBytes: number } }>(`/api/layouts/${view.layoutId}/sheet/send`, "POST", sendSheetSchema.parse({ size }));
      setSent({ kind: "ok", text: `Sent to ${r.sent.installer} <${r.sent.to}> with ${r.sent.fileName} (${Math.max(1, Math.round(r.sent.sizeBytes / 1024))} KiB, ${PAPER_WORDS[size]}).` });
    } catch (e) {
      setSent({ kind: "error", text: e instanceof FetchError && e.unreachable ? "The server could not be reached; nothing was sent." : describeError(e) });
    } finally {
      setSending(false);
    }
  }

  return (
    <div className="terminal-sheet" data-testid="terminal-sheet" data-paper={size}>
      <style>{`
        @media print {
          @page { size: ${PAGE_CSS[size]}; margin: 12mm; }
          .terminal-sheet { font-size: 10px; }
          .sheet-board + .sheet-board { break-before: page; }
          .sheet-input { break-inside: avoid; }
          main { max-width: none !important; padding: 0 !important; }
        }
        .terminal-sheet { -webkit-print-color-adjust: exact; print-color-adjust: exact; }
      `}</style>

      <div className="no-print mb-4 flex flex-wrap items-end gap-3 rounded-lg border border-line bg-white p-3 text-sm" data-testid="sheet-toolbar">
        <fieldset className="flex items-center gap-2">
          <legend className="sr-only">Paper</legend>
          <span className="font-medium">Paper</span>
          {(["A4", "LETTER"] as const).map((s) => (
            <label key={s} className={`cursor-pointer rounded-md border px-2 py-1 ${size === s ? "border-signal bg-signal-soft font-semibold" : "border-line"}`}>
              <input type="radio" name="paper" className="sr-only" checked={size === s} onChange={() => setSize(s)} />
              {PAPER_WORDS[s]}
            </label>
          ))}
        </fieldset>
        <Button variant="secondary" onClick={() => window.print()}>
          Print
        </Button>
        <a className="rounded-md bg-signal px-3 py-2 font-medium text-white hover:bg-[#0c5a5a]" href={pdf(size)} data-testid="download-pdf">
          Download PDF ({size === "A4" ? "A4" : "Letter"})
        </a>
        <a className="text-signal underline" href={`/api/sites/${view.siteId}/exports/zones.csv?layoutId=${view.layoutId}&${rev}`} data-testid="zones-csv">
          Zone list (CSV)
        </a>
        <a className="text-signal underline" href={`/api/sites/${view.siteId}/exports/bom.csv?layoutId=${view.layoutId}&${rev}`} data-testid="bom-csv">
          Bill of materials (CSV)
        </a>
        <div className="ml-auto flex flex-col items-end gap-1">
          <Button onClick={send} disabled={!canSend || !installer || sending} data-testid="send-sheet" title={!canSend ? sendRefusal : !installer ? "Assign an installer to the site first." : undefined}>
            {sending ? "Sending…" : `E-mail to the site's installer${installer ? ` (${installer.name})` : ""}`}
          </Button>
          {!canSend ? <span className="max-w-sm text-right text-xs text-slate-600">{sendRefusal}</span> : !installer ? <span className="text-xs text-slate-600">The site has no installer assigned.</span> : null}
        </div>
        {sent ? (
          <p aria-live="polite" data-testid="send-message" className={`basis-full text-sm ${sent.kind === "error" ? "font-medium text-fault" : "text-signal"}`}>
            {sent.text}
          </p>
        ) : null}
      </div>

      <header className="mb-3">
        <h2 className="text-xl font-semibold">Terminal sheet — {meta.siteName}</h2>
        <p className="text-sm">
          Layout “{meta.layoutName}”, revision {meta.revision} · {sheet.panel ? sheet.panel.name : "no control panel"} · {plural(sheet.zoneCount, "zone")} on {plural(sheet.boards.length, "board")} · generated {meta.generatedAt}
        </p>
        {view.approved ? (
          <p className="mt-1 text-sm font-semibold text-signal" data-testid="sheet-approval">
            Approved revision {meta.revision}: wire to this sheet.
          </p>
        ) : (
          <p className="mt-2 rounded-md border-2 border-fault bg-fault-soft px-3 py-2 text-base font-bold uppercase tracking-wide text-fault" data-testid="sheet-approval">
            Not approved — for review only
          </p>
        )}
        {sheet.caution ? (
          <p role="note" data-testid="life-safety-caution" className="mt-2 rounded-md border border-warn bg-warn-soft px-3 py-2 text-sm">
            <strong className="text-warn">Caution.</strong> {sheet.caution}
          </p>
        ) : null}
        <p className="mt-2 text-xs text-slate-700">{sheet.measuringNote}</p>
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

      {sheet.boards.map((b) => {
        const used = b.rows.filter((r): r is SheetInput => !r.spare);
        const spare = b.rows.filter((r): r is SpareInput => r.spare);
        return (
          <section key={b.boardKey} className="sheet-board mb-8" data-testid={`sheet-board-${b.boardKey}`}>
            <div className="mb-2 border-b-2 border-ink pb-1">
              <h2 className="text-lg font-semibold">
                {b.name} — {b.deviceName}
              </h2>
              <p className="text-xs text-slate-700">
                {b.inputType ? `${b.inputType.name}, parts ±${b.inputType.tolerancePct} %` : "input type unknown"}
                {b.busAddress !== null ? ` · data bus address ${b.busAddress}` : ""} · {used.length} of {plural(b.rows.length, "input")} used
                <span className="hidden print:inline"> · {meta.siteName}, “{meta.layoutName}” revision {meta.revision}{view.approved ? "" : " — NOT APPROVED, for review only"}</span>
              </p>
            </div>
            {used.map((r) => (
              <SheetInputBlock key={r.input} row={r} />
            ))}
            {spare.length ? (
              <div className="sheet-input mb-4 text-xs">
                <h3 className="text-sm font-semibold">Spare inputs</h3>
                <ul className="mt-1 space-y-0.5">
                  {spare.map((s) => (
                    <li key={s.input}>
                      <strong>Input {s.input}</strong> ({s.terminals}): {s.note}
                    </li>
                  ))}
                </ul>
              </div>
            ) : null}
            <div className="sheet-input mt-4 grid gap-3 rounded-md border border-ink p-3 text-sm sm:grid-cols-3" data-testid="sign-off">
              <p className="font-semibold sm:col-span-3">Sign-off: {b.name}</p>
              {b.signOff.map((line, i) => (
                <p key={i} className="whitespace-pre">
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
