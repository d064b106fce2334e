"use client";

import { useState } from "react";
import { useRouter } from "next/navigation";
import { copyName, duplicateLayoutSchema } from "@/lib/layout/duplicate-schema";
import { describeError, sendJson } from "@/lib/client/fetcher";
import type { DuplicatedLayout } from "@/lib/server/layout-duplicate";

/** "Duplicate": the layout's current design as a new draft with its own revision history. */
export function DuplicateLayout({ siteId, layoutId, name }: { siteId: number; layoutId: number; name: string }) {
  const router = useRouter();
  const [open, setOpen] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);

  async function submit(e: React.FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const parsed = duplicateLayoutSchema.safeParse({ name: new FormData(e.currentTarget).get("name") });
    if (!parsed.success) return setError(parsed.error.issues[0].message);
    setBusy(true);
    setError(null);
    try {
      const r = await sendJson<{ layout: DuplicatedLayout }>(`/api/layouts/${layoutId}/duplicate`, "POST", parsed.data);
      router.push(`/sites/${siteId}/layouts/${r.layout.id}`);
    } catch (err) {
      setBusy(false);
      setError(describeError(err));
    }
  }

  if (!open)
    return (
      <button type="button" className="text-xs text-signal hover:underline" onClick={() => setOpen(true)} data-testid={`duplicate-layout-${layoutId}`}>
        Duplicate
      </button>
    );
  return (
    <form onSubmit={submit} noValidate className="flex flex-wrap items-center gap-1 text-xs" aria-label={`Duplicate ${name}`}>
      <input name="name" aria-label="Name of the copy" defaultValue={copyName(name)} maxLength={200} aria-invalid={!!error} className={`rounded border px-1.5 py-0.5 ${error ? "border-fault" : "border-line"}`} />
      <button type="submit" disabled={busy} className="rounded bg-signal px-2 py-0.5 font-medium text-white disabled:bg-slate-400">
        Create draft copy
      </button>
      <button type="button" onClick={() => (setOpen(false), setError(null))} className="px-1 text-slate-600">
        Cancel
      </button>
      {error ? <span role="alert" className="basis-full text-fault">{error}</span> : null}
    </form>
  );
}
