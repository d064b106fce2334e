// The one way to talk to the API from the browser: JSON (or a multipart form) in, JSON out, and a thrown
// FetchError for anything but 2xx. SWR hooks use `fetcher`; every mutation uses `sendJson` or `sendForm`.
import { withFieldLabel } from "@/lib/vocabulary/field-labels";

export interface ApiIssue {
  path: string;
  message: string;
}

export type ApiErrorBody = { error?: string; issues?: ApiIssue[]; [key: string]: unknown };

export class FetchError extends Error {
  constructor(
    /** 0 when the request never got an answer (offline, server down). */
    public readonly status: number,
    message: string,
    public readonly body: ApiErrorBody,
  ) {
    super(message);
    this.name = "FetchError";
  }

  /** The field issues of a 422 (empty otherwise). */
  get issues(): ApiIssue[] {
    return Array.isArray(this.body.issues) ? this.body.issues : [];
  }

  /** True when the request never reached the server: worth keeping and retrying. */
  get unreachable(): boolean {
    return this.status === 0;
  }
}

export type Method = "POST" | "PUT" | "PATCH" | "DELETE";

async function readAnswer<T>(res: Response): Promise<T> {
  const text = await res.text().catch(() => "");
  let body: unknown = {};
  if (text) {
    try {
      body = JSON.parse(text);
    } catch {
      body = res.ok ? {} : { error: "The server sent an unreadable answer." };
    }
  }
  if (!res.ok) {
    const b = (body && typeof body === "object" ? body : {}) as ApiErrorBody;
    throw new FetchError(res.status, typeof b.error === "string" ? b.error : `The server answered ${res.status}.`, b);
  }
  return body as T;
}

async function request<T>(url: string, init: RequestInit): Promise<T> {
  let res: Response;
  try {
    res = await fetch(url, { credentials: "same-origin", ...init });
  } catch {
    throw new FetchError(0, "The server could not be reached.", {});
  }
  return readAnswer<T>(res);
}

/** GET as JSON; the SWR fetcher. */
export function fetcher<T>(url: string): Promise<T> {
  return request<T>(url, { headers: { accept: "application/json" } });
}

/** A JSON mutation. Without a body the request carries none (and no content type). */
export function sendJson<T = unknown>(url: string, method: Method, body?: unknown): Promise<T> {
  return request<T>(
    url,
    body === undefined
      ? { method, headers: { accept: "application/json" } }
      : { method, headers: { "content-type": "application/json", accept: "application/json" }, body: JSON.stringify(body) },
  );
}

/** A multipart upload (files); the browser sets the boundary. */
export function sendForm<T = unknown>(url: string, form: FormData, method: Method = "POST"): Promise<T> {
  return request<T>(url, { method, headers: { accept: "application/json" }, body: form });
}

/** The error sentence with the field issues, for a message line. */
export function describeError(e: unknown): string {
  if (e instanceof FetchError) {
    const issues = e.issues.map((i) => (i.path && i.path !== "(body)" ? withFieldLabel(i.path, i.message) : i.message)).filter(Boolean);
    return issues.length ? `${e.message} ${issues.join("; ")}` : e.message;
  }
  return e instanceof Error ? e.message : String(e);
}
