import type { CatalogUpload } from "@/lib/server/catalogs";

const kib = (bytes: number) => `${(bytes / 1024).toFixed(1)} KiB`;

/** The stored versions of the organisation's catalog file, newest first, each downloadable. */
/** `when` writes a date as the organisation does (lib/format). */
export function UploadVersions({ uploads, inUseVersion, when }: { uploads: CatalogUpload[]; inUseVersion: number | null; when: (iso: string) => string }) {
  if (!uploads.length) return <p className="text-sm text-slate-600">Your organisation has uploaded no catalog file: the shipped catalog is in use.</p>;
  return (
    <div className="relative overflow-x-auto">
      <table className="w-full text-sm" data-testid="upload-versions">
        <thead className="text-left text-slate-500">
          <tr>
            <th className="py-2 pr-2">Version</th>
            <th className="pr-2">File</th>
            <th className="pr-2">Size</th>
            <th className="pr-2">SHA-256</th>
            <th className="pr-2">Uploaded by</th>
            <th className="pr-2">When (UTC)</th>
            <th />
          </tr>
        </thead>
        <tbody>
          {uploads.map((u) => (
            <tr key={u.id} className="border-t border-line" data-version={u.version}>
              <td className="py-2 pr-2 whitespace-nowrap tabular-nums">
                {u.version}
                {u.version === inUseVersion ? <span className="ml-2 rounded bg-signal-soft px-1.5 py-0.5 text-xs whitespace-nowrap text-signal">in use</span> : null}
              </td>
              <td className="pr-2 break-all">{u.fileName}</td>
              <td className="pr-2 whitespace-nowrap tabular-nums">{kib(u.sizeBytes)}</td>
              <td className="pr-2 font-mono text-xs" title={u.sha256}>
                {u.sha256.slice(0, 12)}…
              </td>
              <td className="pr-2">{u.uploadedBy?.name ?? "—"}</td>
              <td className="pr-2 whitespace-nowrap">{when(u.createdAt)}</td>
              <td>
                <a className="text-signal underline underline-offset-2" href={`/api/catalog/uploads/${u.id}`} download={u.fileName}>
                  Download<span className="sr-only"> version {u.version}</span>
                </a>
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
