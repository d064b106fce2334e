"use client";

import { useState } from "react";
import { PAPER_WORDS, sendSheetSchema, type PaperSize } from "@/lib/sheet/sheet-request-schema";
import { Button } from "@/components/ui/button";
import { describeError, FetchError, sendJson } from "@/lib/client/fetcher";

export interface SheetToolbarProps {
  layoutId: number;
  siteId: number;
  revision: number;
  /** An unapproved sheet is sent only after the sender says so: the e-mail and every PDF page are marked. */
  approved: boolean;
  size: PaperSize;
  onSize: (size: PaperSize) => void;
  installer: { name: string; email: string } | null;
  canSend: boolean;
  sendRefusal: string;
}

/** Paper, print, the PDF and CSV downloads, and sending the sheet to the site's installer. Never printed. */
export function SheetToolbar({ approved, layoutId, siteId, revision, size, onSize, installer, canSend, sendRefusal }: SheetToolbarProps) {
  const [sending, setSending] = useState(false);
  const [sent, setSent] = useState<{ kind: "ok" | "error"; text: string } | null>(null);
  const [confirming, setConfirming] = useState(false);
  const rev = `revision=${revision}`;

  async function send(confirmUnapproved = false) {
    if (!approved && !confirmUnapproved) {
      setConfirming(true);
      return;
    }
    setConfirming(false);
    setSending(true);
    setSent(null);
    try {
      const r = await sendJson<{ sent: { to: string; installer: string; fileName: string; sizeBytes: number } }>(`/api/layouts/${layoutId}/sheet/send`, "POST", sendSheetSchema.parse({ size, ...(approved ? {} : { confirmUnapproved: true }) }));
      setSent({ kind: "ok", text: `Sent to ${r.sent.installer} <${r.sent.to}> with ${r.sent.fileName} (${Math.max(1, Math.round(r.sent.sizeBytes / 1024))} KiB, ${PAPER_WORDS[size]}).` });
    } catch (e) {
      setSent({ kind: "error", text: e instanceof FetchError && e.unreachable ? "The server could not be reached; nothing was sent." : describeError(e) });
    } finally {
      setSending(false);
    }
  }

  return (
    <div className="no-print mb-4 flex flex-wrap items-end gap-3 rounded-lg border border-line bg-white p-3 text-sm" data-testid="sheet-toolbar">
      <fieldset className="flex items-center gap-2">
        <legend className="sr-only">Paper</legend>
        <span className="font-medium">Paper</span>
        {(["A4", "LETTER"] as const).map((s) => (
          <label key={s} className={`cursor-pointer rounded-md border px-2 py-1 ${size === s ? "border-signal bg-signal-soft font-semibold" : "border-line"}`}>
            <input type="radio" name="paper" className="sr-only" checked={size === s} onChange={() => onSize(s)} />
            {PAPER_WORDS[s]}
          </label>
        ))}
      </fieldset>
      <Button variant="secondary" onClick={() => window.print()}>
        Print
      </Button>
      <a className="rounded-md bg-signal px-3 py-2 font-medium text-white hover:bg-[#0c5a5a]" href={`/api/layouts/${layoutId}/sheet/pdf?size=${size}&${rev}`} data-testid="download-pdf">
        Download PDF ({size === "A4" ? "A4" : "Letter"})
      </a>
      <a className="text-signal underline" href={`/sites/${siteId}/layouts/${layoutId}/zones?${rev}`} data-testid="zone-list-link">
        Zone list for programming
      </a>
      <a className="text-signal underline" href={`/api/sites/${siteId}/exports/zones.csv?layoutId=${layoutId}&${rev}`} data-testid="zones-csv">
        Zone list for the monitoring centre (CSV)
      </a>
      <a className="text-signal underline" href={`/api/sites/${siteId}/exports/bom.csv?layoutId=${layoutId}&${rev}`} data-testid="bom-csv">
        Bill of materials (CSV)
      </a>
      <div className="flex min-w-0 flex-col gap-1 sm:ml-auto sm:items-end">
        <Button onClick={() => void send()} disabled={!canSend || !installer || sending} data-testid="send-sheet" title={!canSend ? sendRefusal : !installer ? "Assign an installer to the site first." : undefined}>
          {sending ? "Sending…" : `E-mail to the site's installer${installer ? ` (${installer.name})` : ""}`}
        </Button>
        {!canSend ? <span className="max-w-sm text-xs text-slate-600 sm:text-right">{sendRefusal}</span> : !installer ? <span className="text-xs text-slate-600">The site has no installer assigned.</span> : null}
      </div>
      {confirming ? (
        <div role="alertdialog" aria-label="Send an unapproved sheet?" data-testid="send-confirm" className="basis-full rounded-md border-2 border-fault bg-fault-soft p-3 text-sm">
          <p className="font-semibold text-fault">Revision {revision} is not approved.</p>
          <p>The e-mail will say it is not approved and every page of the PDF carries “NOT APPROVED — FOR REVIEW ONLY”: the installer must not wire to it. Send it for review anyway?</p>
          <div className="mt-2 flex gap-2">
            <Button onClick={() => void send(true)} data-testid="send-confirm-yes">
              Send it, marked not approved
            </Button>
            <Button variant="secondary" onClick={() => setConfirming(false)}>
              Cancel
            </Button>
          </div>
        </div>
      ) : null}
      {sent ? (
        <p aria-live="polite" data-testid="send-message" className={`basis-full break-words text-sm ${sent.kind === "error" ? "font-medium text-fault" : "text-signal"}`}>
          {sent.text}
        </p>
      ) : null}
    </div>
  );
}
