// Content-Disposition for downloads (RFC 6266): an ASCII `filename` fallback made only of safe characters,
// plus `filename*` (RFC 5987 / RFC 8187) carrying the UTF-8 name percent-encoded. Neither part can hold a
// quote, a backslash, a control character (CR/LF would split the header) or a path separator.

const MAX_NAME_CHARS = 150;

/** The name reduced to what a file system and a header accept: no controls, no separators, no leading dots. */
function cleanName(name: string): string {
  const cleaned = name
    .normalize("NFC")
    .replace(/[\u0000-\u001f\u007f-\u009f]/g, "")
    .replace(/[\\/:*?"<>|;]/g, "_")
    .replace(/[\uD800-\uDFFF]/gu, "")
    .replace(/\s+/g, " ")
    .trim()
    .replace(/^\.+/, "");
  return Array.from(cleaned).slice(0, MAX_NAME_CHARS).join("") || "download";
}

/** Letters, digits and . _ - ( ) + and space only; everything else becomes "_". */
function asciiFallback(name: string): string {
  const ascii = name
    .normalize("NFKD")
    .replace(/[\u0300-\u036f]/g, "")
    .replace(/[^A-Za-z0-9._\-()+ ]/g, "_");
  return ascii.replace(/^\.+/, "") || "download";
}

// RFC 5987 attr-char: ALPHA / DIGIT / "!" / "#" / "$" / "&" / "+" / "-" / "." / "^" / "_" / "`" / "|" / "~"
const encodeRfc5987 = (s: string) => encodeURIComponent(s).replace(/['()*]/g, (c) => `%${c.charCodeAt(0).toString(16).toUpperCase()}`);

export function contentDisposition(kind: "attachment" | "inline", name: string): string {
  const clean = cleanName(name);
  return `${kind}; filename="${asciiFallback(clean)}"; filename*=UTF-8''${encodeRfc5987(clean)}`;
}

/** `attachment; filename="..."; filename*=UTF-8''...` for a download named `name`. */
export const attachmentHeader = (name: string) => contentDisposition("attachment", name);
