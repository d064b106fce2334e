import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { checkPhotoUpload, detectPhotoType, MAX_FILE_NAME_CHARS, MAX_PHOTO_BYTES, sanitiseFileName } from "@/lib/commissioning/photo-checks";

// Signatures: JPEG SOI marker FF D8 FF (ITU-T T.81 / JFIF); PNG 89 50 4E 47 0D 0A 1A 0A (PNG spec §5.2);
// WebP "RIFF" <size> "WEBP" (the WebP container specification); GIF "GIF89a"; PDF "%PDF-".
const jpeg = Uint8Array.from([0xff, 0xd8, 0xff, 0xe0, 0x00, 0x10, 0x4a, 0x46, 0x49, 0x46]);
const png = Uint8Array.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 13]);
const webp = new Uint8Array([..."RIFF"].map((c) => c.charCodeAt(0)).concat([0x24, 0, 0, 0], [..."WEBPVP8 "].map((c) => c.charCodeAt(0))));
const ascii = (s: string) => new TextEncoder().encode(s);

describe("photo type by magic bytes", () => {
  it("recognises JPEG, PNG and WebP", () => {
    expect([jpeg, png, webp].map(detectPhotoType)).toEqual(["image/jpeg", "image/png", "image/webp"]);
  });
  it("refuses everything else, whatever the name says", () => {
    for (const b of [ascii("GIF89a....."), ascii("%PDF-1.7"), ascii("<svg xmlns="), ascii("RIFF\x24\0\0\0WAVEfmt "), Uint8Array.from([0xff, 0xd8]), new Uint8Array()]) expect(detectPhotoType(b)).toBeNull();
    expect(checkPhotoUpload({ fileName: "photo.jpg", bytes: ascii("<html><script>") })).toMatchObject({ ok: false, status: 415 });
  });
});

describe("size limit", () => {
  it("takes 8 MiB and refuses a byte more, and refuses an empty file", () => {
    const at = new Uint8Array(MAX_PHOTO_BYTES);
    at.set(jpeg);
    expect(checkPhotoUpload({ fileName: "a.jpg", bytes: at })).toMatchObject({ ok: true, size: 8 * 1024 * 1024 });
    const over = new Uint8Array(MAX_PHOTO_BYTES + 1);
    over.set(jpeg);
    expect(checkPhotoUpload({ fileName: "a.jpg", bytes: over })).toMatchObject({ ok: false, status: 413 });
    expect(checkPhotoUpload({ fileName: "a.jpg", bytes: new Uint8Array() })).toMatchObject({ ok: false, status: 422 });
  });
});

describe("file names", () => {
  const s = (n: string) => sanitiseFileName(n, "image/jpeg");
  it("keeps an ordinary name and gives it the extension of its real type", () => {
    expect(s("Front door EOL.jpg")).toBe("Front door EOL.jpg");
    expect(s("panel.JPEG")).toBe("panel.jpg");
    expect(sanitiseFileName("panel.jpg", "image/png")).toBe("panel.png");
    expect(s("report.exe")).toBe("report.jpg");
  });
  it("drops path tricks: ../, absolute paths, Windows paths", () => {
    expect(s("../../etc/passwd")).toBe("passwd.jpg");
    expect(s("/var/www/shell.php")).toBe("shell.jpg");
    expect(s("C:\\Users\\x\\photo.jpg")).toBe("photo.jpg");
    expect(s("..")).toBe("photo.jpg");
    expect(s("...hidden.jpg")).toBe("hidden.jpg");
  });
  it("removes NUL, control characters and bidirectional overrides", () => {
    expect(s("photo\u0000.php.jpg")).toBe("photo.php.jpg");
    expect(s("line\r\nbreak.jpg")).toBe("linebreak.jpg");
    expect(s("invoice\u202egpj.exe")).toBe("invoicegpj.jpg");
  });
  it("replaces reserved characters and guards device names", () => {
    expect(s('a<b>c:"d|e?f*.jpg')).toBe("a_b_c__d_e_f_.jpg");
    expect(s("CON.jpg")).toBe("_CON.jpg");
    expect(s("")).toBe("photo.jpg");
  });
  it("cuts overly long names to 100 characters, keeping the extension", () => {
    const out = s(`${"x".repeat(500)}.jpg`);
    expect(out).toHaveLength(MAX_FILE_NAME_CHARS);
    expect(out.endsWith(".jpg")).toBe(true);
    expect(Array.from(s(`${"é".repeat(300)}.jpg`))).toHaveLength(MAX_FILE_NAME_CHARS);
  });
  it("never returns a separator, a control character, a leading dot or more than 100 characters, for any input", () => {
    fc.assert(
      fc.property(fc.string({ unit: "binary", maxLength: 400 }), fc.constantFrom("image/jpeg", "image/png", "image/webp" as const), (name, type) => {
        const out = sanitiseFileName(name, type);
        expect(out).not.toMatch(/[/\\\u0000-\u001f\u007f<>:"|?*]/);
        expect(out.startsWith(".")).toBe(false);
        expect(Array.from(out).length).toBeLessThanOrEqual(MAX_FILE_NAME_CHARS);
        expect(out).toMatch(/\.(jpg|png|webp)$/);
      }),
      { numRuns: 500 },
    );
  });
});
