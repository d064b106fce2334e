"use client";

import Link from "next/link";
import { useRouter } from "next/navigation";
import { useRef, useState } from "react";
import type { CatalogError } from "@/lib/catalog/errors";
import { kindLabel } from "@/lib/catalog/kinds";
import type { CatalogDiff } from "@/lib/catalog/diff";
import type { CatalogUpload, UploadPreview } from "@/lib/server/catalogs";
import { catalogUploadFormSchema, type CatalogUploadFields } from "@/lib/catalog/upload-schema";
import { describeError, FetchError, sendForm } from "@/lib/client/fetcher";
import { Button } from "@/components/ui/button";

type Phase =
  | { kind: "idle" }
  | { kind: "busy"; what: string }
  | { kind: "preview"; preview: UploadPreview }
  | { kind: "refused"; message: string; errors: CatalogError[] }
  | { kind: "failed"; message: string }
  | { kind: "stored"; upload: CatalogUpload; diff: CatalogDiff };

type PreviewAnswer = { mode: "preview"; preview: UploadPreview };
type StoreAnswer = { mode: "store"; upload: CatalogUpload; diff: CatalogDiff };

/** The form checked with the server's own schema, then sent as multipart. */
function post<T>(fields: CatalogUploadFields): Promise<T> {
  const checked = catalogUploadFormSchema.safeParse(fields);
  if (!checked.success) return Promise.reject(new Error(checked.error.issues.map((i) => i.message).join("; ")));
  const form = new FormData();
  form.append("mode", checked.data.mode);
  if (checked.data.baseVersion !== undefined) form.append("baseVersion", String(checked.data.baseVersion));
  form.append("file", checked.data.file);
  return sendForm<T>("/api/catalog/uploads", form);
}

/** A refusal as the phase that shows it: a file that does not validate lists its located errors. */
function refusal(e: unknown): Phase {
  if (e instanceof FetchError && e.status === 422 && Array.isArray(e.body.errors)) return { kind: "refused", message: e.message, errors: e.body.errors as CatalogError[] };
  if (e instanceof FetchError && e.unreachable) return { kind: "failed", message: "The server could not be reached; nothing was stored." };
  return { kind: "failed", message: describeError(e) };
}

const countText = (d: CatalogDiff) => {
  const parts = [`${d.added.length} added`, `${d.removed.length} removed`, `${d.changed.length} changed`];
  return parts.join(", ");
};

export function DiffView({ diff }: { diff: CatalogDiff }) {
  const empty = !diff.added.length && !diff.removed.length && !diff.changed.length;
  if (empty) return <p className="text-sm">No change against the catalog in use.</p>;
  return (
    <div className="grid grid-cols-1 gap-4 text-sm sm:grid-cols-3" data-testid="catalog-diff">
      <DiffColumn title="Added" tone="text-signal" testId="diff-added" entries={diff.added} />
      <DiffColumn title="Removed" tone="text-fault" testId="diff-removed" entries={diff.removed} />
      <div>
        <h4 className="font-semibold text-warn">Changed ({diff.changed.length})</h4>
        <ul className="mt-1 space-y-1" data-testid="diff-changed">
          {diff.changed.map((e) => (
            <li key={`${e.kind}:${e.id}`}>
              <span className="text-slate-500">{kindLabel[e.kind]}</span> <code className="font-mono">{e.id}</code>
              <ul className="ml-4 list-disc text-xs">
                {e.paths.map((p) => (
                  <li key={p}>
                    <code className="font-mono">{p || "(whole entry)"}</code>
                  </li>
                ))}
              </ul>
            </li>
          ))}
        </ul>
      </div>
    </div>
  );
}

export function ErrorList({ errors }: { errors: CatalogError[] }) {
  return (
    <ol className="mt-2 space-y-1 text-sm" data-testid="catalog-errors">
      {errors.map((e, i) => (
        <li key={i} className="rounded border border-fault/30 bg-fault-soft px-2 py-1">
          <code className="font-mono text-fault">
            {e.file}:{e.line}:{e.column}
          </code>
          {e.path ? (
            <>
              {" "}
              <code className="font-mono">{e.path}</code>
            </>
          ) : null}
          : {e.message}
        </li>
      ))}
    </ol>
  );
}

/** Upload → preview (diff and validation) → confirm stores. For roles with "catalog:upload" only. */
export function CatalogUploadForm({ maxBytes }: { maxBytes: number }) {
  const router = useRouter();
  const input = useRef<HTMLInputElement>(null);
  const [file, setFile] = useState<File | null>(null);
  const [phase, setPhase] = useState<Phase>({ kind: "idle" });

  async function check() {
    if (!file) return;
    if (file.size > maxBytes) {
      setPhase({ kind: "failed", message: `The file is too large: a catalog file may be at most ${maxBytes / 1024} KiB.` });
      return;
    }
    setPhase({ kind: "busy", what: "Checking the file…" });
    try {
      const r = await post<PreviewAnswer>({ mode: "preview", file });
      setPhase({ kind: "preview", preview: r.preview });
    } catch (e) {
      setPhase(refusal(e));
    }
  }

  async function confirm(preview: UploadPreview) {
    if (!file) return;
    setPhase({ kind: "busy", what: "Storing…" });
    try {
      const r = await post<StoreAnswer>({ mode: "store", baseVersion: preview.baseVersion, file });
      setPhase({ kind: "stored", upload: r.upload, diff: r.diff });
      setFile(null);
      if (input.current) input.current.value = "";
      router.refresh();
    } catch (e) {
      setPhase(refusal(e));
    }
  }

  return (
    <div data-testid="catalog-upload">
      <p className="text-sm text-slate-600">
        A YAML file with any of the lists <code className="font-mono">inputTypes</code>, <code className="font-mono">panels</code>, <code className="font-mono">expansionBoards</code>,{" "}
        <code className="font-mono">keypads</code>, <code className="font-mono">powerSupplies</code>, <code className="font-mono">detectors</code>, with the fields of the shipped
        entries (each entry&apos;s page shows it as YAML). An entry with a new id is added; one with a shipped id of the same kind replaces it whole; shipped entries cannot be
        removed. The file replaces your previous upload; older versions stay below. At most {maxBytes / 1024} KiB.
      </p>
      <div className="mt-3 flex flex-wrap items-end gap-3">
        <label className="text-sm">
          <span className="font-medium">Catalog file (.yaml)</span>
          <input
            ref={input}
            type="file"
            name="file"
            accept=".yaml,.yml,application/yaml,text/yaml"
            className="mt-1 block text-sm"
            onChange={(e) => {
              setFile(e.target.files?.[0] ?? null);
              setPhase({ kind: "idle" });
            }}
          />
        </label>
        <Button type="button" onClick={check} disabled={!file || phase.kind === "busy"}>
          Check file
        </Button>
      </div>

      <div className="mt-4" aria-live="polite">
        {phase.kind === "busy" ? <p className="text-sm text-slate-600">{phase.what}</p> : null}
        {phase.kind === "failed" ? (
          <p role="alert" className="text-sm text-fault">
            {phase.message}
          </p>
        ) : null}
        {phase.kind === "refused" ? (
          <div role="alert">
            <p className="text-sm font-medium text-fault">{phase.message}</p>
            <ErrorList errors={phase.errors} />
          </div>
        ) : null}
        {phase.kind === "preview" ? (
          <div data-testid="upload-preview" className="rounded-md border border-line bg-paper p-3">
            <p className="text-sm">
              <strong>{phase.preview.fileName}</strong> is valid. Against the catalog in use now{phase.preview.baseVersion ? ` (your version ${phase.preview.baseVersion})` : " (the shipped catalog)"}:{" "}
              {phase.preview.diff ? countText(phase.preview.diff) : ""}.
              {phase.preview.sameAsVersion ? ` The very same text is stored as version ${phase.preview.sameAsVersion}.` : ""}
            </p>
            {phase.preview.diff ? (
              <div className="mt-3">
                <DiffView diff={phase.preview.diff} />
              </div>
            ) : null}
            <div className="mt-3 flex gap-2">
              <Button type="button" onClick={() => confirm(phase.preview)}>
                Confirm and store as version {phase.preview.baseVersion + 1}
              </Button>
              <Button type="button" variant="secondary" onClick={() => setPhase({ kind: "idle" })}>
                Cancel
              </Button>
            </div>
          </div>
        ) : null}
        {phase.kind === "stored" ? (
          <div role="status" className="rounded-md border border-signal bg-signal-soft p-3 text-sm">
            Stored as version {phase.upload.version} ({countText(phase.diff)}). Your organisation&apos;s designs use it from now on.{" "}
            {phase.diff.added[0] ? (
              <Link className="text-signal underline" href={`/catalog/${phase.diff.added[0].id}`}>
                Open {phase.diff.added[0].id}
              </Link>
            ) : null}
          </div>
        ) : null}
      </div>
    </div>
  );
}

function DiffColumn({ title, tone, testId, entries }: { title: string; tone: string; testId: string; entries: { kind: keyof typeof kindLabel; id: string }[] }) {
  return (
    <div>
      <h4 className={`font-semibold ${tone}`}>
        {title} ({entries.length})
      </h4>
      <ul className="mt-1 space-y-1" data-testid={testId}>
        {entries.map((e) => (
          <li key={`${e.kind}:${e.id}`}>
            <span className="text-slate-500">{kindLabel[e.kind]}</span> <code className="font-mono">{e.id}</code>
          </li>
        ))}
      </ul>
    </div>
  );
}
