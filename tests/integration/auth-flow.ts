import { createRequire } from "node:module";
import { NextRequest } from "next/server";

/**
 * What `next/headers` answers inside a route handler: Next sets it per request; here the browser
 * below sets it before each call. next-auth reads it with require(), so the CommonJS module is patched.
 */
const current = { headers: new Headers() };

export function installTestRequestScope() {
  Object.assign(createRequire(import.meta.url)("next/headers"), nextHeadersStandIn());
}

function nextHeadersStandIn() {
  const cookieList = () =>
    (current.headers.get("cookie") ?? "")
      .split(/;\s*/)
      .filter(Boolean)
      .map((pair) => {
        const at = pair.indexOf("=");
        return { name: pair.slice(0, at), value: decodeURIComponent(pair.slice(at + 1)) };
      });
  return {
    headers: async () => current.headers,
    cookies: async () => ({ getAll: cookieList, get: (name: string) => cookieList().find((c) => c.name === name), has: (name: string) => cookieList().some((c) => c.name === name) }),
  };
}

type Handler = (req: NextRequest, ctx: { params: Promise<Record<string, string | string[]>> }) => Promise<Response> | Response;

export const SESSION_COOKIE = "loopwright.session";

/** A client with its own cookie jar that calls the app's route handlers as HTTP requests. */
export class Browser {
  readonly jar = new Map<string, string>();
  constructor(
    readonly origin = process.env.NEXTAUTH_URL ?? "http://localhost:3100",
    readonly extraHeaders: Record<string, string> = {},
  ) {}

  async call(handler: Handler, method: string, path: string, options: { form?: Record<string, string>; json?: unknown; multipart?: FormData; params?: Record<string, string | string[]> } = {}): Promise<Response> {
    const headers = new Headers(this.extraHeaders);
    if (this.jar.size) headers.set("cookie", [...this.jar].map(([k, v]) => `${k}=${encodeURIComponent(v)}`).join("; "));
    let body: string | FormData | undefined;
    if (options.multipart) body = options.multipart; // the request sets the multipart boundary itself
    else if (options.form) {
      headers.set("content-type", "application/x-www-form-urlencoded");
      body = new URLSearchParams(options.form).toString();
    } else if (options.json !== undefined) {
      headers.set("content-type", "application/json");
      body = JSON.stringify(options.json);
    }
    const req = new NextRequest(new URL(path, this.origin), { method, headers, body });
    current.headers = headers;
    const res = await handler(req, { params: Promise.resolve(options.params ?? {}) });
    for (const line of res.headers.getSetCookie()) {
      const [pair, ...attrs] = line.split(/;\s*/);
      const at = pair.indexOf("=");
      const name = pair.slice(0, at);
      const value = decodeURIComponent(pair.slice(at + 1));
      const expired = attrs.some((a) => /^max-age=0$/i.test(a) || (/^expires=/i.test(a) && new Date(a.slice(8)).getTime() <= Date.now()));
      if (expired || value === "") this.jar.delete(name);
      else this.jar.set(name, value);
    }
    return res;
  }
}

/** next-auth's own endpoints under /api/auth/*, as the sign-in form and the sign-out button use them. */
export async function signIn(browser: Browser, auth: Handler, email: string, password: string): Promise<{ ok: boolean; error: string | null; status: number }> {
  const csrf = (await (await browser.call(auth, "GET", "/api/auth/csrf", { params: { nextauth: ["csrf"] } })).json()) as { csrfToken: string };
  const res = await browser.call(auth, "POST", "/api/auth/callback/credentials", {
    params: { nextauth: ["callback", "credentials"] },
    form: { email, password, csrfToken: csrf.csrfToken, callbackUrl: "/", json: "true" },
  });
  const { url } = (await res.json()) as { url: string };
  const error = new URL(url, browser.origin).searchParams.get("error");
  return { ok: !error && browser.jar.has(SESSION_COOKIE), error, status: res.status };
}

export async function signOut(browser: Browser, auth: Handler): Promise<Response> {
  const csrf = (await (await browser.call(auth, "GET", "/api/auth/csrf", { params: { nextauth: ["csrf"] } })).json()) as { csrfToken: string };
  return browser.call(auth, "POST", "/api/auth/signout", { params: { nextauth: ["signout"] }, form: { csrfToken: csrf.csrfToken, callbackUrl: "/", json: "true" } });
}
