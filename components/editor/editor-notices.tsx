"use client";

import Link from "next/link";
import { FireCaution } from "@/components/editor/fire-caution";
import type { EditorMessage, Notice } from "@/components/editor/use-editor-messages";

/** Under the title: why the editor is read-only, the fire caution, the notice, and the message of the last edit. */
export function EditorNotices({ siteId, readOnlyReason, fire, notice, message }: { siteId: number; readOnlyReason: string | null; fire: boolean; notice: Notice; message: EditorMessage | null }) {
  return (
    <>
      {readOnlyReason !== null ? (
        <p role="note" data-testid="read-only" className="mb-3 rounded-md border border-line bg-slate-50 p-3 text-sm">
          Read-only: {readOnlyReason}
        </p>
      ) : null}
      {fire ? (
        <div className="mb-3">
          <FireCaution />
        </div>
      ) : null}
      {notice.text ? (
        <p className="mb-3 flex items-start justify-between gap-3 rounded-md border border-signal bg-signal-soft p-3 text-sm" data-testid="notice">
          <span>
            {notice.text}{" "}
            {notice.copyLink ? (
              <Link className="font-medium underline" href={`/sites/${siteId}/layouts/${notice.copyLink.id}`}>
                Open {notice.copyLink.name}
              </Link>
            ) : null}
          </span>
          <button type="button" className="text-signal underline" onClick={notice.dismiss}>
            Dismiss
          </button>
        </p>
      ) : null}
      <p
        data-testid="editor-message"
        role={message?.kind === "refused" && message.live ? "alert" : undefined}
        className={`mb-3 min-h-6 text-sm ${message?.kind === "refused" ? "font-medium text-fault" : "text-slate-700"}`}
      >
        {message?.text ?? ""}
      </p>
      <div className="sr-only" aria-live="polite" aria-atomic="true">
        {message?.live && message.kind !== "refused" ? message.text : ""}
      </div>
    </>
  );
}
