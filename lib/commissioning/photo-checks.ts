// Checks on a commissioning photo before it is stored: what it is by its first bytes (never by its name or the
// type the browser claims), how large it is, and a file name that is safe to keep and to offer for download.

export const MAX_PHOTO_BYTES = 8 * 1024 * 1024;
export const MAX_FILE_NAME_CHARS = 100;

export type PhotoType = "image/jpeg" | "image/png" | "image/webp";
export const PHOTO_TYPES: readonly PhotoType[] = ["image/jpeg", "image/png", "image/webp"];

const EXTENSIONS: Record<PhotoType, string> = { "image/jpeg": "jpg", "image/png": "png", "image/webp": "webp" };

const startsWith = (b: Uint8Array, sig: readonly number[], at = 0) => b.length >= at + sig.length && sig.every((x, i) => b[at + i] === x);

/** The image type by magic bytes: JPEG (JFIF/EXIF SOI marker FF D8 FF), PNG (8-byte signature), WebP (RIFF....WEBP). */
export function detectPhotoType(bytes: Uint8Array): PhotoType | null {
  if (startsWith(bytes, [0xff, 0xd8, 0xff])) return "image/jpeg";
  if (startsWith(bytes, [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a])) return "image/png";
  if (startsWith(bytes, [0x52, 0x49, 0x46, 0x46]) && startsWith(bytes, [0x57, 0x45, 0x42, 0x50], 8)) return "image/webp";
  return null;
}

// C0 and C1 controls, DEL, and the bidirectional overrides that can make "gpj.exe" display as "exe.jpg".
const CONTROL = /[\u0000-\u001f\u007f-\u009f\u200e\u200f\u202a-\u202e\u2066-\u2069]/g;
// Characters Windows refuses in names, and the path separators of every platform.
const RESERVED_CHARS = /[<>:"/\\|?*]/g;
const RESERVED_NAMES = /^(con|prn|aux|nul|com[0-9]|lpt[0-9])$/i;

/**
 * A file name safe to store and to send back in a Content-Disposition header: the last path segment only, no
 * controls, no reserved characters, no leading dots, at most 100 characters, ending in the extension of the
 * detected type.
 */
export function sanitiseFileName(name: string, type: PhotoType): string {
  const ext = EXTENSIONS[type];
  let s = name.normalize("NFC").replace(CONTROL, "");
  s = s.split(/[/\\]/).pop() ?? "";
  s = s.replace(RESERVED_CHARS, "_").replace(/\s+/g, " ").trim();
  s = s.replace(/^[.\s]+/, "").replace(/[.\s]+$/, "");
  // Drop an extension the bytes do not bear out (photo.exe, photo.png that is a JPEG), keep a matching one.
  s = s.replace(/\.(jpe?g|png|webp|gif|bmp|tiff?|heic|exe|bat|cmd|com|scr|js|html?|svg|php|sh)$/i, "");
  if (RESERVED_NAMES.test(s.split(".")[0] ?? "")) s = `_${s}`;
  if (s === "") s = "photo";
  const room = MAX_FILE_NAME_CHARS - ext.length - 1;
  const chars = Array.from(s);
  if (chars.length > room) s = chars.slice(0, room).join("").replace(/[.\s]+$/, "");
  return `${s}.${ext}`;
}

export type PhotoCheck =
  | { ok: true; fileName: string; contentType: PhotoType; size: number }
  | { ok: false; status: 413 | 415 | 422; reason: string };

export function checkPhotoUpload(input: { fileName: string; bytes: Uint8Array }): PhotoCheck {
  const size = input.bytes.length;
  if (size === 0) return { ok: false, status: 422, reason: "The file is empty." };
  if (size > MAX_PHOTO_BYTES) return { ok: false, status: 413, reason: `The photo is ${(size / 1024 / 1024).toFixed(1)} MiB; the limit is ${MAX_PHOTO_BYTES / 1024 / 1024} MiB.` };
  const type = detectPhotoType(input.bytes);
  if (!type) return { ok: false, status: 415, reason: "Only JPEG, PNG and WebP photos can be kept: this file is none of them." };
  return { ok: true, fileName: sanitiseFileName(input.fileName, type), contentType: type, size };
}
