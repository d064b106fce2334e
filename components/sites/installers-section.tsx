"use client";

import { useState } from "react";
import { useRouter } from "next/navigation";
import type { SiteInstallerView } from "@/lib/server/sites";
import { siteUpdateSchema } from "@/lib/sites/site-schema";
import { describeError, sendJson } from "@/lib/client/fetcher";
import { Button } from "@/components/ui/button";

/** Assign one or more of the organisation's installers; the terminal sheet is e-mailed to them. */
export function InstallersSection({ siteId, assigned, candidates, canWrite }: { siteId: number; assigned: SiteInstallerView[]; candidates: SiteInstallerView[]; canWrite: boolean }) {
  const router = useRouter();
  const [chosen, setChosen] = useState<Set<number>>(() => new Set(assigned.map((i) => i.userId)));
  const [message, setMessage] = useState<{ kind: "ok" | "error"; text: string } | null>(null);
  const [busy, setBusy] = useState(false);

  async function save() {
    setBusy(true);
    setMessage(null);
    try {
      await sendJson(`/api/sites/${siteId}`, "PATCH", siteUpdateSchema.parse({ installerUserIds: [...chosen] }));
      setMessage({ kind: "ok", text: chosen.size ? `${chosen.size} installer${chosen.size === 1 ? "" : "s"} assigned.` : "No installer assigned." });
      router.refresh();
    } catch (e) {
      setMessage({ kind: "error", text: describeError(e) });
    } finally {
      setBusy(false);
    }
  }

  if (!candidates.length) return <p className="text-sm text-slate-600">The organisation has no member with the installer role yet. An admin can invite one on the members page.</p>;
  return (
    <div data-testid="site-installers">
      <ul className="flex flex-col gap-1">
        {candidates.map((c) => (
          <li key={c.userId}>
            <label className="flex items-center gap-2 text-sm">
              <input
                type="checkbox"
                disabled={!canWrite}
                checked={chosen.has(c.userId)}
                onChange={(e) => {
                  const next = new Set(chosen);
                  if (e.target.checked) next.add(c.userId);
                  else next.delete(c.userId);
                  setChosen(next);
                }}
              />
              {c.name} <span className="text-slate-500">{c.email}</span>
            </label>
          </li>
        ))}
      </ul>
      {canWrite ? (
        <div className="mt-2 flex items-center gap-3">
          <Button variant="secondary" onClick={() => void save()} disabled={busy}>
            Save installers
          </Button>
          {message ? (
            <span role={message.kind === "error" ? "alert" : "status"} className={`text-sm ${message.kind === "error" ? "text-fault" : "text-signal"}`}>
              {message.text}
            </span>
          ) : null}
        </div>
      ) : null}
    </div>
  );
}
