// Pure checks of where a request or a redirect target comes from; shared by the route wrapper,
// server actions, the sign-in page and next-auth's redirect callback.

/** Methods that change state; every other one (GET, HEAD, OPTIONS) must not. */
export const isStateChanging = (method: string) => !["GET", "HEAD", "OPTIONS"].includes(method.toUpperCase());

export type OriginVerdict = { ok: true; checked: "origin" | "referer" | "neither" } | { ok: false; reason: string };

function originOf(value: string): string | null {
  try {
    const u = new URL(value);
    return u.protocol === "http:" || u.protocol === "https:" ? u.origin : null;
  } catch {
    return null;
  }
}

/**
 * A state-changing request is refused when its Origin header (or, without one, its Referer) names another
 * origin than the app's. Neither header: allowed — browsers send Origin on every cross-origin POST, PUT,
 * PATCH and DELETE (and on same-origin ones too), so a request without both comes from a non-browser client
 * (curl, a script, the tests), which a forged page cannot make; the session cookie is SameSite=Lax as well.
 * "null" (a sandboxed frame, a privacy redirect) is an origin that is not ours: refused.
 */
export function checkRequestOrigin(method: string, headers: Headers, appOrigin: string): OriginVerdict {
  if (!isStateChanging(method)) return { ok: true, checked: "neither" };
  const origin = headers.get("origin");
  if (origin !== null) {
    return originOf(origin) === appOrigin ? { ok: true, checked: "origin" } : { ok: false, reason: `Origin ${JSON.stringify(origin.slice(0, 200))}` };
  }
  const referer = headers.get("referer");
  if (referer !== null) {
    return originOf(referer) === appOrigin ? { ok: true, checked: "referer" } : { ok: false, reason: "Referer of another origin" };
  }
  return { ok: true, checked: "neither" };
}

/**
 * Where to send the browser after sign-in: `value` read relative to the app's origin, kept only when it stays
 * on that origin (else "/"). Returns a path (with query and fragment), never an absolute URL, so the result
 * cannot name another host whatever the browser makes of it.
 */
export function safeCallbackUrl(value: unknown, appOrigin: string): string {
  if (typeof value !== "string" || value === "") return "/";
  // Browsers drop tab and newline characters inside URLs and read "\" as "/": read the value as they would.
  if (/[\u0000-\u001f\u007f]/.test(value)) return "/";
  let url: URL;
  try {
    url = new URL(value, appOrigin);
  } catch {
    return "/";
  }
  if (url.origin !== appOrigin) return "/";
  const path = `${url.pathname}${url.search}${url.hash}`;
  // A path that starts with two slashes (or a slash and a backslash) would itself be read as another host.
  if (!path.startsWith("/") || /^\/[\\/]/.test(path)) return "/";
  return path;
}
