// The per-request security headers proxy.ts sets: a nonce-based Content-Security-Policy (no inline script
// runs unless it carries this request's nonce; Next adds the nonce to its own scripts when it renders the
// page) and HSTS when the request reached us over https.

export function contentSecurityPolicy(nonce: string, dev: boolean): string {
  return [
    "default-src 'self'",
    // 'strict-dynamic': scripts the nonced ones load are trusted; 'unsafe-eval' only for React's dev tooling
    `script-src 'self' 'nonce-${nonce}' 'strict-dynamic'${dev ? " 'unsafe-eval'" : ""}`,
    // styles stay 'unsafe-inline': the editor positions elements with style attributes, which nonces cannot cover
    "style-src 'self' 'unsafe-inline'",
    "img-src 'self' data: blob:",
    "font-src 'self'",
    "connect-src 'self'",
    "object-src 'none'",
    "base-uri 'self'",
    "form-action 'self'",
    "frame-ancestors 'none'",
  ].join("; ");
}

/** A fresh nonce: 128 random bits, base64. */
export function makeNonce(): string {
  const bytes = crypto.getRandomValues(new Uint8Array(16));
  return btoa(String.fromCharCode(...bytes));
}

/** https as the browser saw it: the URL's own scheme, or the first hop's X-Forwarded-Proto behind a proxy. */
export function servedOverHttps(url: URL, headers: Headers): boolean {
  const forwarded = headers.get("x-forwarded-proto")?.split(",")[0].trim().toLowerCase();
  return forwarded ? forwarded === "https" : url.protocol === "https:";
}

// two years, the preload lists' minimum (from memory)
export const HSTS = "max-age=63072000; includeSubDomains";
