"use client";

import { useState } from "react";
import { useRouter } from "next/navigation";
import type { SiteDetail } from "@/lib/server/sites";
import { siteStructureSchema } from "@/lib/sites/site-schema";
import { treeFromSite, treeToRequest, type EditTree } from "@/lib/sites/structure-edit";
import { placeIssues, type PlacedErrors } from "@/lib/sites/form-errors";
import { FetchError, describeError, sendJson } from "@/lib/client/fetcher";
import { Button } from "@/components/ui/button";
import { StructureEditor } from "@/components/sites/structure-editor";

const none: PlacedErrors = { fields: {}, nodes: {}, other: [] };

/** Edit the floors, areas and rooms; renames carry their detectors along, removing a room detectors use is refused. */
export function StructureSection({ site, canWrite }: { site: SiteDetail; canWrite: boolean }) {
  const router = useRouter();
  const [tree, setTree] = useState<EditTree>(() => treeFromSite(site.floors));
  const [errors, setErrors] = useState<PlacedErrors>(none);
  const [status, setStatus] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);

  async function save() {
    setStatus(null);
    const parsed = siteStructureSchema.safeParse({ floors: treeToRequest(tree) });
    if (!parsed.success) return setErrors(placeIssues(parsed.error.issues, tree));
    setErrors(none);
    setBusy(true);
    try {
      const saved = await sendJson<SiteDetail>(`/api/sites/${site.id}/structure`, "PUT", parsed.data);
      setTree(treeFromSite(saved.floors));
      setStatus("Structure saved.");
      router.refresh();
    } catch (err) {
      setErrors(err instanceof FetchError && err.issues.length ? placeIssues(err.issues, tree) : { ...none, other: [describeError(err)] });
    } finally {
      setBusy(false);
    }
  }

  if (!canWrite)
    return (
      <ul className="text-sm">
        {site.floors.map((f) => (
          <li key={f.id}>
            <span className="font-medium">{f.name}</span>: {f.areas.map((a) => `${a.name} (${a.rooms.map((r) => r.name).join(", ") || "no rooms"})`).join("; ") || "no areas"}
          </li>
        ))}
      </ul>
    );
  return (
    <div>
      <StructureEditor tree={tree} onChange={setTree} errors={errors.nodes} />
      <div className="mt-3 flex flex-wrap items-center gap-3">
        <Button onClick={() => void save()} disabled={busy} data-testid="save-structure">
          Save structure
        </Button>
        <Button variant="secondary" onClick={() => (setTree(treeFromSite(site.floors)), setErrors(none), setStatus(null))}>
          Undo changes
        </Button>
        {status ? <span role="status" className="text-sm text-signal">{status}</span> : null}
      </div>
      {errors.other.length ? (
        <p role="alert" className="mt-2 text-sm text-fault" data-testid="structure-error">
          {errors.other.join(" ")}
        </p>
      ) : null}
    </div>
  );
}
