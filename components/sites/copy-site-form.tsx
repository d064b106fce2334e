"use client";

import { useState } from "react";
import { useRouter } from "next/navigation";
import { siteCopySchema } from "@/lib/sites/site-schema";
import { placeIssues } from "@/lib/sites/form-errors";
import { FetchError, describeError, sendJson } from "@/lib/client/fetcher";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";

/** Start a new site from this one: its details, floors, areas, rooms and device schedule (not its layouts). */
export function CopySiteForm({ siteId, name }: { siteId: number; name: string }) {
  const router = useRouter();
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [other, setOther] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);

  async function submit(e: React.FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const f = new FormData(e.currentTarget);
    const parsed = siteCopySchema.safeParse({ name: f.get("copyName"), address: f.get("copyAddress") });
    if (!parsed.success) return setErrors(placeIssues(parsed.error.issues, []).fields);
    setErrors({});
    setOther(null);
    setBusy(true);
    try {
      const site = await sendJson<{ id: number }>(`/api/sites/${siteId}/copy`, "POST", parsed.data);
      router.push(`/sites/${site.id}`);
    } catch (err) {
      setBusy(false);
      if (err instanceof FetchError && err.issues.length) setErrors(placeIssues(err.issues, []).fields);
      setOther(describeError(err));
    }
  }

  return (
    <form onSubmit={submit} noValidate className="grid grid-cols-1 gap-3 sm:grid-cols-3" aria-label="Copy into a new site">
      <Field label="New site name" name="copyName" defaultValue={`${name} (copy)`.slice(0, 200)} error={errors.name} maxLength={200} />
      <Field label="Its address" name="copyAddress" error={errors.address} maxLength={500} />
      <div className="flex items-end">
        <Button type="submit" variant="secondary" disabled={busy}>
          Copy schedule into a new site
        </Button>
      </div>
      {other ? (
        <p role="alert" className="text-sm text-fault sm:col-span-3">
          {other}
        </p>
      ) : null}
    </form>
  );
}
