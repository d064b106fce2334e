"use client";

import type { SaveState } from "@/lib/client/use-autosave";

const looks: Record<SaveState["kind"], { text: string; className: string }> = {
  saved: { text: "Saved", className: "bg-signal-soft text-signal" },
  pending: { text: "Saving…", className: "bg-slate-100 text-slate-700" },
  saving: { text: "Saving…", className: "bg-slate-100 text-slate-700" },
  retrying: { text: "Not saved — retrying", className: "bg-warn-soft text-warn" },
  conflict: { text: "Not saved — someone else saved this layout", className: "bg-fault-soft text-fault" },
  refused: { text: "Not saved", className: "bg-fault-soft text-fault" },
};

/** The autosave state, always visible in the editor's header. */
export function SaveStatus({ state, readOnly }: { state: SaveState; readOnly: boolean }) {
  if (readOnly) return <span className="rounded-full bg-slate-100 px-3 py-1 text-sm text-slate-700" data-testid="save-state">Read-only</span>;
  const look = looks[state.kind];
  const detail = state.kind === "retrying" ? `${state.message} Next try in ${state.inSeconds} s; your changes are kept in this browser.` : state.kind === "refused" ? state.message : null;
  return (
    <span className="flex flex-col items-end gap-1">
      <span className={`rounded-full px-3 py-1 text-sm font-medium ${look.className}`} data-testid="save-state" aria-live="polite">
        {look.text}
      </span>
      {detail ? <span className="max-w-md text-right text-xs text-slate-600">{detail}</span> : null}
    </span>
  );
}
