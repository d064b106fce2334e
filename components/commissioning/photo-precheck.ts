import { detectPhotoType, MAX_PHOTO_BYTES } from "@/lib/commissioning/photo-checks";

const MIB = 1024 * 1024;

/** Why a file cannot be sent as a photo, checked on the device before the upload; null when it may go. */
export function photoProblem(sizeBytes: number, head: Uint8Array): string | null {
  if (sizeBytes > MAX_PHOTO_BYTES) return `The photo is ${(sizeBytes / MIB).toFixed(1)} MiB; the limit is ${MAX_PHOTO_BYTES / MIB} MiB. Take it at a lower resolution.`;
  if (sizeBytes === 0) return "The file is empty.";
  if (!detectPhotoType(head)) return "Only JPEG, PNG and WebP photos can be kept: this file is none of them.";
  return null;
}
