// One way to talk to the API from the browser: JSON in, JSON out, and a thrown FetchError for anything but 2xx.

export interface ApiIssue {
  path: string;
  message: string;
}

export class FetchError extends Error {
  constructor(
    public readonly status: number,
    message: string,
    public readonly body: { error?: string; issues?: ApiIssue[]; [key: string]: unknown },
  ) {
    super(message);
  }
}

/** status 0: the request never got an answer (offline, server down). */
async function readAnswer<T>(res: Response): Promise<T> {
  const body = await res.json().catch(() => ({ error: "The server sent an unreadable answer." }));
  if (!res.ok) throw new FetchError(res.status, body.error ?? `The server answered ${res.status}.`, body);
  return body as T;
}

export async function fetcher<T>(url: string): Promise<T> {
  let res: Response;
  try {
    res = await fetch(url, { headers: { accept: "application/json" } });
  } catch {
    throw new FetchError(0, "The server could not be reached.", {});
  }
  return readAnswer<T>(res);
}

export async function sendJson<T>(url: string, method: "POST" | "PUT" | "PATCH" | "DELETE", body: unknown = {}): Promise<T> {
  let res: Response;
  try {
    res = await fetch(url, { method, headers: { "content-type": "application/json", accept: "application/json" }, body: JSON.stringify(body) });
  } catch {
    throw new FetchError(0, "The server could not be reached.", {});
  }
  return readAnswer<T>(res);
}

/** The error sentence with the field issues, for a message line. */
export function describeError(e: unknown): string {
  if (e instanceof FetchError) return e.body.issues?.length ? `${e.message} ${e.body.issues.map((i) => `${i.path}: ${i.message}`).join("; ")}` : e.message;
  return e instanceof Error ? e.message : String(e);
}
