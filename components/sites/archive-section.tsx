"use client";

import { useState } from "react";
import { useRouter } from "next/navigation";
import { describeError, sendJson } from "@/lib/client/fetcher";
import { Button } from "@/components/ui/button";
import { useFormat } from "@/components/format/format-provider";

/** Archive the site (hidden from the list, nothing deleted) or restore it; roles without the permission see why not. */
export function ArchiveSection({ siteId, name, archivedAt, canArchive, refusal }: { siteId: number; name: string; archivedAt: string | null; canArchive: boolean; refusal: string }) {
  const router = useRouter();
  const { date } = useFormat();
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);

  async function act() {
    if (!archivedAt && !window.confirm(`Archive ${name}? It leaves the site list; its schedule, layouts and records stay and it can be restored.`)) return;
    setBusy(true);
    setError(null);
    try {
      await sendJson(`/api/sites/${siteId}/${archivedAt ? "restore" : "archive"}`, "POST");
      router.refresh();
    } catch (e) {
      setError(describeError(e));
    } finally {
      setBusy(false);
    }
  }

  return (
    <div className="flex flex-wrap items-center gap-3 text-sm">
      <span>{archivedAt ? `Archived on ${date(archivedAt)}: hidden from the site list.` : "In the site list."}</span>
      {canArchive ? (
        <Button variant={archivedAt ? "secondary" : "danger"} onClick={() => void act()} disabled={busy} data-testid="archive-site">
          {archivedAt ? "Restore site" : "Archive site"}
        </Button>
      ) : (
        <span className="text-slate-600">{refusal}</span>
      )}
      {error ? <span role="alert" className="text-fault">{error}</span> : null}
    </div>
  );
}
