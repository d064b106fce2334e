"use client";

import { useState } from "react";
import { describeError, FetchError, sendForm } from "@/lib/client/fetcher";
import type { PhotoView } from "@/lib/server/commissioning";
import type { SheetInput } from "@/lib/sheet/sheet-types";
import { newClientId } from "@/components/commissioning/client-id";
import { photoProblem } from "@/components/commissioning/photo-precheck";

export const photosUrl = (layoutId: number) => `/api/layouts/${layoutId}/photos`;

export interface PhotoMessage {
  kind: "ok" | "error";
  text: string;
}

/** A photo of a loop's terminations: checked on the device, sent as a multipart form, kept for another try when it fails. */
export function usePhotoUpload(layoutId: number, row: SheetInput, onPhoto: (p: PhotoView) => void) {
  const [message, setMessage] = useState<PhotoMessage | null>(null);
  const [busy, setBusy] = useState(false);
  const [pending, setPending] = useState<File | null>(null);

  async function upload(file: File) {
    setMessage(null);
    const problem = photoProblem(file.size, new Uint8Array(await file.slice(0, 16).arrayBuffer()));
    if (problem) return setMessage({ kind: "error", text: problem });
    setBusy(true);
    setPending(file);
    const form = new FormData();
    form.append("file", file, file.name);
    form.append("boardKey", row.boardKey);
    form.append("input", String(row.input));
    form.append("clientId", newClientId());
    try {
      const { photo } = await sendForm<{ photo: PhotoView }>(photosUrl(layoutId), form);
      onPhoto(photo);
      setPending(null);
      setMessage({ kind: "ok", text: `Photo kept: ${photo.fileName}.` });
    } catch (e) {
      const refused = e instanceof FetchError && !e.unreachable;
      setMessage({ kind: "error", text: refused ? describeError(e) : "The photo could not be sent (no connection). Try again when you have signal." });
    } finally {
      setBusy(false);
    }
  }

  /** Sends the photo that failed last, when there is one. */
  const retry = pending ? () => void upload(pending) : null;
  return { message, busy, upload, retry };
}
