"use client";

import { MAX_PHOTO_BYTES, PHOTO_TYPES } from "@/lib/commissioning/photo-checks";
import type { PhotoView } from "@/lib/server/commissioning";
import type { SheetInput } from "@/lib/sheet/sheet-types";
import { usePhotoUpload } from "@/components/commissioning/use-photo-upload";

interface PhotoBoxProps {
  layoutId: number;
  row: SheetInput;
  photos: PhotoView[];
  canRecord: boolean;
  onPhoto: (p: PhotoView) => void;
}

/** The loop's photos of its terminations, and the camera or file picker to add one. */
export function PhotoBox({ layoutId, row, photos, canRecord, onPhoto }: PhotoBoxProps) {
  const { message, busy, upload, retry } = usePhotoUpload(layoutId, row, onPhoto);
  return (
    <div className="rounded-lg border border-line bg-white p-3" data-testid="photos">
      <h3 className="text-lg font-semibold">Photos of the terminations</h3>
      {photos.length ? (
        <ul className="mt-2 grid grid-cols-3 gap-2">
          {photos.map((p) => (
            <li key={p.id}>
              <a href={`/api/layouts/${layoutId}/photos/${p.id}`} target="_blank" rel="noreferrer">
                {/* eslint-disable-next-line @next/next/no-img-element -- served by our own route, not optimisable */}
                <img src={`/api/layouts/${layoutId}/photos/${p.id}`} alt={`Terminations of input ${row.input}: ${p.fileName}`} className="aspect-square w-full rounded border border-line object-cover" />
              </a>
              <span className="block truncate text-xs text-slate-600">{p.fileName}</span>
            </li>
          ))}
        </ul>
      ) : (
        <p className="text-sm text-slate-600">No photo of this loop yet.</p>
      )}
      {canRecord ? (
        <label className="mt-2 flex min-h-14 cursor-pointer items-center justify-center rounded-md border-2 border-dashed border-signal px-3 text-lg font-semibold text-signal">
          {busy ? "Sending the photo…" : "Take or choose a photo"}
          <input
            type="file"
            accept={PHOTO_TYPES.join(",")}
            capture="environment"
            className="sr-only"
            data-testid="photo-input"
            disabled={busy}
            onChange={(e) => {
              const f = e.target.files?.[0];
              e.target.value = "";
              if (f) void upload(f);
            }}
          />
        </label>
      ) : null}
      {message ? (
        <p className={`mt-2 text-sm ${message.kind === "error" ? "font-medium text-fault" : "text-signal"}`} data-testid="photo-message">
          {message.text}
          {message.kind === "error" && retry ? (
            <button type="button" className="ml-2 underline" onClick={retry}>
              Try again
            </button>
          ) : null}
        </p>
      ) : null}
      <p className="mt-1 text-xs text-slate-500">JPEG, PNG or WebP, at most {MAX_PHOTO_BYTES / 1024 / 1024} MiB.</p>
    </div>
  );
}
