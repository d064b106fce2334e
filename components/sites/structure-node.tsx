"use client";

import type { ReactNode } from "react";
import type { NodeKind } from "@/lib/sites/structure-edit";

const small = "rounded border border-line bg-white px-1.5 py-0.5 text-xs hover:bg-slate-50 disabled:text-slate-300";

/** One floor, area or room of the structure editor: its name, move up and down, remove; errors beside the name. */
export function StructureNode(props: { kind: NodeKind; name: string; testId: string; error?: string; first: boolean; last: boolean; onRename: (name: string) => void; onMove: (by: -1 | 1) => void; onRemove: () => void; children?: ReactNode }) {
  const { kind, name, testId, error, first, last } = props;
  const label = name || `this ${kind}`;
  return (
    <div className={kind === "floor" ? "rounded-md border border-line bg-white p-3" : kind === "area" ? "mt-2 ml-4 rounded border border-dashed border-line p-2" : "mt-1 ml-4"}>
      <div className="flex items-center gap-1">
        <span className="w-12 text-xs text-slate-500">{kind}</span>
        <input
          value={name}
          onChange={(e) => props.onRename(e.target.value)}
          aria-label={`${kind} name`}
          aria-invalid={!!error}
          data-testid={testId}
          maxLength={kind === "floor" ? 200 : 120}
          className={`min-w-0 flex-1 rounded border px-2 py-1 text-sm ${kind === "floor" ? "font-semibold" : ""} ${error ? "border-fault" : "border-line"}`}
        />
        <button type="button" className={small} disabled={first} onClick={() => props.onMove(-1)} aria-label={`Move ${kind} ${label} up`}>
          ↑
        </button>
        <button type="button" className={small} disabled={last} onClick={() => props.onMove(1)} aria-label={`Move ${kind} ${label} down`}>
          ↓
        </button>
        <button type="button" className={`${small} text-fault`} onClick={props.onRemove} aria-label={`Remove ${kind} ${label}`}>
          Remove
        </button>
      </div>
      {error ? <span className="ml-12 block text-xs text-fault">{error}</span> : null}
      {props.children}
    </div>
  );
}
