"use client";

import Link from "next/link";
import { useRouter } from "next/navigation";
import { useRef, useState } from "react";
import type { CatalogError } from "@/lib/catalog/errors";
import { kindLabel } from "@/lib/catalog/kinds";
import type { CatalogDiff } from "@/lib/catalog/diff";
import type { CatalogUpload, UploadPreview } from "@/lib/server/catalogs";
import { Button } from "@/components/ui/button";

type Phase =
  | { kind: "idle" }
  | { kind: "busy"; what: string }
  | { kind: "preview"; preview: UploadPreview }
  | { kind: "refused"; message: string; errors: CatalogError[] }
  | { kind: "failed"; message: string }
  | { kind: "stored"; upload: CatalogUpload; diff: CatalogDiff };

async function post(file: File, fields: Record<string, string>) {
  const form = new FormData();
  for (const [k, v] of Object.entries(fields)) form.append(k, v);
  form.append("file", file);
  const res = await fetch("/api/catalog/uploads", { method: "POST", body: form });
  const json = await res.json().catch(() => ({ error: `The server answered ${res.status} without a readable message.` }));
  return { status: res.status, ok: res.ok, json };
}

const countText = (d: CatalogDiff) => {
  const parts = [`${d.added.length} added`, `${d.removed.length} removed`, `${d.changed.length} changed`];
  return parts.join(", ");
};

export function DiffView({ diff }: { diff: CatalogDiff }) {
  const empty = !diff.added.length && !diff.removed.length && !diff.changed.length;
  if (empty) return <p className="text-sm">No change against the catalog in use.</p>;
  return (
    <div className="grid gap-4 text-sm sm:grid-cols-3" data-testid="catalog-diff">
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
      const r = await post(file, { mode: "preview" });
      if (r.ok) setPhase({ kind: "preview", preview: r.json.preview });
      else if (r.status === 422 && Array.isArray(r.json.errors)) setPhase({ kind: "refused", message: r.json.error, errors: r.json.errors });
      else setPhase({ kind: "failed", message: r.json.error ?? `The server answered ${r.status}.` });
    } catch {
      setPhase({ kind: "failed", message: "The server could not be reached; nothing was stored." });
    }
  }

  async function confirm(preview: UploadPreview) {
    if (!file) return;
    setPhase({ kind: "busy", what: "Storing…" });
    try {
      const r = await post(file, { mode: "store", baseVersion: String(preview.baseVersion) });
      if (r.ok) {
        setPhase({ kind: "stored", upload: r.json.upload, diff: r.json.diff });
        setFile(null);
        if (input.current) input.current.value = "";
        router.refresh();
      } else if (r.status === 422 && Array.isArray(r.json.errors)) setPhase({ kind: "refused", message: r.json.error, errors: r.json.errors });
      else setPhase({ kind: "failed", message: r.json.error ?? `The server answered ${r.status}.` });
    } catch {
      setPhase({ kind: "failed", message: "The server could not be reached; nothing was stored." });
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
