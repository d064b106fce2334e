"use client";

import { useState } from "react";
import { useRouter } from "next/navigation";
import { siteInputSchema } from "@/lib/sites/site-schema";
import { treeToRequest, type EditTree } from "@/lib/sites/structure-edit";
import { placeIssues, type PlacedErrors } from "@/lib/sites/form-errors";
import { FetchError, describeError, sendJson } from "@/lib/client/fetcher";
import { Button } from "@/components/ui/button";
import { Card } from "@/components/ui/card";
import { SiteDetailsFields, readDetails } from "@/components/sites/site-details-fields";
import { StructureEditor } from "@/components/sites/structure-editor";

const none: PlacedErrors = { fields: {}, nodes: {}, other: [] };

/** A new site: its details and its floors, areas and rooms, checked with the same schema as the API. */
export function NewSiteForm() {
  const router = useRouter();
  const [tree, setTree] = useState<EditTree>([]);
  const [errors, setErrors] = useState<PlacedErrors>(none);
  const [busy, setBusy] = useState(false);

  async function submit(e: React.FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const parsed = siteInputSchema.safeParse({ ...readDetails(new FormData(e.currentTarget)), floors: treeToRequest(tree) });
    if (!parsed.success) return setErrors(placeIssues(parsed.error.issues, tree));
    setErrors(none);
    setBusy(true);
    try {
      const site = await sendJson<{ id: number }>("/api/sites", "POST", parsed.data);
      router.push(`/sites/${site.id}`);
    } catch (err) {
      setBusy(false);
      setErrors(err instanceof FetchError && err.issues.length ? placeIssues(err.issues, tree) : { ...none, other: [describeError(err)] });
    }
  }

  return (
    <form onSubmit={submit} noValidate className="flex flex-col gap-4" aria-label="New site">
      <Card>
        <h2 className="mb-3 font-semibold">Details</h2>
        <SiteDetailsFields errors={errors.fields} />
      </Card>
      <Card>
        <h2 className="mb-1 font-semibold">Floors, areas and rooms</h2>
        <p className="mb-3 text-sm text-slate-600">In the order you walk the building. Detectors of the device schedule are placed in these areas and rooms.</p>
        <StructureEditor tree={tree} onChange={setTree} errors={errors.nodes} />
      </Card>
      {errors.other.length ? (
        <p role="alert" className="text-sm text-fault">
          {errors.other.join(" ")}
        </p>
      ) : null}
      <div>
        <Button type="submit" disabled={busy}>
          {busy ? "Creating…" : "Create site"}
        </Button>
      </div>
    </form>
  );
}
