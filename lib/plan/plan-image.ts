import { sanitiseFileName } from "@/lib/commissioning/photo-checks";

// Checks on an uploaded floor plan before it is stored: its type by its bytes (never by its name or the type the
// browser claims), its size in bytes, and its width and height in pixels read from the image's own header.

export const MAX_PLAN_BYTES = 20 * 1024 * 1024;
/** Larger drawings are slow to pan on a phone: 100 megapixels is far past any scanned A0 sheet at 300 dpi. */
export const MAX_PLAN_PIXELS = 100_000_000;

export type PlanImageType = "image/png" | "image/jpeg";

const u16 = (b: Uint8Array, at: number) => (b[at] << 8) | b[at + 1];
const u32 = (b: Uint8Array, at: number) => ((b[at] << 24) >>> 0) + (b[at + 1] << 16) + (b[at + 2] << 8) + b[at + 3];
const startsWith = (b: Uint8Array, sig: readonly number[], at = 0) => b.length >= at + sig.length && sig.every((x, i) => b[at + i] === x);

const PNG_SIGNATURE = [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a];
const IHDR = [0x49, 0x48, 0x44, 0x52];

/** PNG: the 8-byte signature, then the IHDR chunk first with width and height as 32-bit big-endian (ISO/IEC 15948 §11.2.2). */
function pngSize(b: Uint8Array): { width: number; height: number } | null {
  if (!startsWith(b, PNG_SIGNATURE) || !startsWith(b, IHDR, 12) || b.length < 24) return null;
  return { width: u32(b, 16), height: u32(b, 20) };
}

// Start-of-frame markers carry the frame size; C4 (Huffman tables), C8 (reserved) and CC (arithmetic coding) do not.
const isStartOfFrame = (m: number) => m >= 0xc0 && m <= 0xcf && m !== 0xc4 && m !== 0xc8 && m !== 0xcc;

/** JPEG: walk the marker segments to the first start-of-frame; height then width, 16-bit big-endian (ITU-T T.81 B.2.2). */
function jpegSize(b: Uint8Array): { width: number; height: number } | null {
  if (!startsWith(b, [0xff, 0xd8, 0xff])) return null;
  let at = 2;
  while (at + 4 <= b.length) {
    if (b[at] !== 0xff) return null;
    const marker = b[at + 1];
    if (marker === 0xff) {
      at += 1; // fill byte
      continue;
    }
    if (marker === 0xd8 || marker === 0x01 || (marker >= 0xd0 && marker <= 0xd7)) {
      at += 2; // markers without a length
      continue;
    }
    if (marker === 0xd9 || marker === 0xda) return null; // end of image or start of scan before any frame
    const length = u16(b, at + 2);
    if (length < 2) return null;
    if (isStartOfFrame(marker)) return at + 9 <= b.length ? { height: u16(b, at + 5), width: u16(b, at + 7) } : null;
    at += 2 + length;
  }
  return null;
}

export type PlanImageCheck = { ok: true; contentType: PlanImageType; fileName: string; size: number; width: number; height: number } | { ok: false; status: 413 | 415 | 422; reason: string };

export function checkPlanImage(input: { fileName: string; bytes: Uint8Array }): PlanImageCheck {
  const size = input.bytes.length;
  if (size === 0) return { ok: false, status: 422, reason: "The file is empty." };
  if (size > MAX_PLAN_BYTES) return { ok: false, status: 413, reason: `The plan is ${(size / 1024 / 1024).toFixed(1)} MiB; the limit is ${MAX_PLAN_BYTES / 1024 / 1024} MiB.` };
  const png = pngSize(input.bytes);
  const jpeg = png ? null : jpegSize(input.bytes);
  const dims = png ?? jpeg;
  const contentType: PlanImageType | null = png ? "image/png" : jpeg ? "image/jpeg" : null;
  if (!dims || !contentType) return { ok: false, status: 415, reason: "A plan must be a PNG or JPEG image: this file is neither, or its header is damaged." };
  if (dims.width === 0 || dims.height === 0) return { ok: false, status: 422, reason: "The image has no width or height." };
  if (dims.width * dims.height > MAX_PLAN_PIXELS) return { ok: false, status: 422, reason: `The image is ${dims.width} × ${dims.height} pixels; at most ${MAX_PLAN_PIXELS / 1e6} million pixels can be kept.` };
  return { ok: true, contentType, fileName: sanitiseFileName(input.fileName, contentType), size, ...dims };
}
