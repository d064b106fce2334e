// JSON requests from the review, sheet and commissioning screens, with the API's one error shape turned into a sentence.

export class HttpError extends Error {
  constructor(
    public readonly status: number,
    message: string,
    public readonly body: unknown,
  ) {
    super(message);
  }
}

/** The API's `{ error, issues? }` as one readable sentence. */
export function errorText(body: unknown, status: number): string {
  const b = body as { error?: unknown; issues?: { path?: string; message?: string }[] } | null;
  const base = typeof b?.error === "string" ? b.error : `The server answered ${status}.`;
  const issues = Array.isArray(b?.issues) ? b.issues.map((i) => (i.path && i.path !== "(body)" ? `${i.path}: ${i.message}` : i.message)).filter(Boolean) : [];
  return issues.length ? `${base} ${issues.join("; ")}` : base;
}

/** Sends JSON and returns the parsed answer; throws HttpError for a 4xx/5xx, TypeError when the network fails. */
export async function sendJson<T = unknown>(url: string, method: "POST" | "PUT" | "PATCH" | "DELETE", body?: unknown): Promise<T> {
  const res = await fetch(url, { method, headers: body === undefined ? {} : { "content-type": "application/json" }, body: body === undefined ? undefined : JSON.stringify(body) });
  const json = await res.json().catch(() => null);
  if (!res.ok) throw new HttpError(res.status, errorText(json, res.status), json);
  return json as T;
}
