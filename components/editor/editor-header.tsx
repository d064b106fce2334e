"use client";

import type { SaveState } from "@/lib/client/use-autosave";
import type { LayoutMeta } from "@/lib/server/layouts";
import { Button } from "@/components/ui/button";
import { SaveStatus } from "@/components/editor/save-status";

/** The editor's own line under the layout frame: revision and version as saved, the save state, the history. */
export function EditorHeader({ meta, version, saveState, readOnly, onHistory }: { meta: LayoutMeta; version: number; saveState: SaveState; readOnly: boolean; onHistory: () => void }) {
  return (
    <div className="mb-3 flex flex-wrap items-center justify-between gap-3">
      <div>
        <p className="text-xs text-slate-600">
          <span className="rounded bg-slate-100 px-1.5 py-0.5 font-medium uppercase tracking-wide">{meta.status}</span> · revision {meta.currentRevision} · version {version}
        </p>
      </div>
      <div className="flex items-start gap-2">
        <SaveStatus state={saveState} readOnly={readOnly} />
        <Button variant="secondary" onClick={onHistory}>
          History
        </Button>
      </div>
    </div>
  );
}
