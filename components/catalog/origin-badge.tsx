import type { EntryOrigin } from "@/lib/server/catalogs";
import { originLabel } from "./catalog-words";

/** Marks an entry that comes from the organisation's upload. */
export function OriginBadge({ origin, version }: { origin: EntryOrigin; version?: number | null }) {
  const cls = origin === "shipped" ? "bg-slate-100 text-slate-600" : "bg-signal-soft text-signal";
  return (
    <span data-testid="origin-badge" data-origin={origin} className={`rounded px-1.5 py-0.5 text-xs ${cls}`}>
      {originLabel[origin]}
      {version ? `, version ${version}` : ""}
    </span>
  );
}
