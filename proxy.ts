import { NextResponse, type NextRequest } from "next/server";
import { contentSecurityPolicy, HSTS, makeNonce, servedOverHttps } from "@/lib/http/security-headers";

// Runs before every page (not API routes, not static files): a fresh CSP nonce per request, passed to the
// render in the request's own Content-Security-Policy header (Next reads the nonce from there), HSTS over
// https, and no caching of pages, which all show a member's data.
// API routes stay outside: for a request that passes through the proxy, Next first reads the whole body into
// memory (to let both read it), which would defeat the streaming body limits of lib/server/route.ts. Their
// static CSP and HSTS come from next.config.mjs.
export function proxy(request: NextRequest) {
  const nonce = makeNonce();
  const csp = contentSecurityPolicy(nonce, process.env.NODE_ENV === "development");
  const requestHeaders = new Headers(request.headers);
  requestHeaders.set("content-security-policy", csp);
  requestHeaders.set("x-nonce", nonce);
  const response = NextResponse.next({ request: { headers: requestHeaders } });
  response.headers.set("content-security-policy", csp);
  if (servedOverHttps(request.nextUrl, request.headers)) response.headers.set("strict-transport-security", HSTS);
  response.headers.set("cache-control", "private, no-store");
  return response;
}

export const config = {
  matcher: [{ source: "/((?!api/|_next/static|_next/image|favicon.ico|loopwright-mark.svg).*)" }],
};
