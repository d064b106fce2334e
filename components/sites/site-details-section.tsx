"use client";

import { useState } from "react";
import { useRouter } from "next/navigation";
import { siteDetailsSchema, type SiteDetails } from "@/lib/sites/site-schema";
import { placeIssues, type PlacedErrors } from "@/lib/sites/form-errors";
import { FetchError, describeError, sendJson } from "@/lib/client/fetcher";
import { Button } from "@/components/ui/button";
import { SiteDetailsFields, readDetails } from "@/components/sites/site-details-fields";

const none: PlacedErrors = { fields: {}, nodes: {}, other: [] };

/** Edit the site's name, address, customer contact and notes. */
export function SiteDetailsSection({ siteId, values, canWrite }: { siteId: number; values: SiteDetails; canWrite: boolean }) {
  const router = useRouter();
  const [errors, setErrors] = useState<PlacedErrors>(none);
  const [saved, setSaved] = useState(false);
  const [busy, setBusy] = useState(false);

  async function submit(e: React.FormEvent<HTMLFormElement>) {
    e.preventDefault();
    setSaved(false);
    const parsed = siteDetailsSchema.safeParse(readDetails(new FormData(e.currentTarget)));
    if (!parsed.success) return setErrors(placeIssues(parsed.error.issues, []));
    setErrors(none);
    setBusy(true);
    try {
      await sendJson(`/api/sites/${siteId}`, "PATCH", parsed.data);
      setSaved(true);
      router.refresh();
    } catch (err) {
      setErrors(err instanceof FetchError && err.issues.length ? placeIssues(err.issues, []) : { ...none, other: [describeError(err)] });
    } finally {
      setBusy(false);
    }
  }

  return (
    <form onSubmit={submit} noValidate aria-label="Site details">
      <fieldset disabled={!canWrite}>
        <SiteDetailsFields values={values} errors={errors.fields} />
      </fieldset>
      <div className="mt-3 flex items-center gap-3">
        {canWrite ? (
          <Button type="submit" disabled={busy}>
            Save details
          </Button>
        ) : null}
        {saved ? <span role="status" className="text-sm text-signal">Saved.</span> : null}
        {errors.other.length ? <span role="alert" className="text-sm text-fault">{errors.other.join(" ")}</span> : null}
      </div>
    </form>
  );
}
