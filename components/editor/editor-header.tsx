"use client";

import Link from "next/link";
import type { SaveState } from "@/lib/client/use-autosave";
import type { LayoutMeta } from "@/lib/server/layouts";
import { Button } from "@/components/ui/button";
import { SaveStatus } from "@/components/editor/save-status";

/** The editor's title: where the layout belongs, its name, status, revision and version, and the save state. */
export function EditorHeader({ site, meta, version, saveState, readOnly, onHistory }: { site: { id: number; name: string }; meta: LayoutMeta; version: number; saveState: SaveState; readOnly: boolean; onHistory: () => void }) {
  return (
    <div className="mb-4 flex flex-wrap items-start justify-between gap-3">
      <div>
        <p className="text-sm text-slate-600">
          <Link href={`/sites/${site.id}`} className="hover:underline">
            {site.name}
          </Link>{" "}
          ›{" "}
          <Link href={`/sites/${site.id}/layouts`} className="hover:underline">
            Layouts
          </Link>
        </p>
        <h1 className="text-2xl font-semibold tracking-tight" data-testid="layout-name">
          {meta.name}
        </h1>
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
