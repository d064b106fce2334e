import "server-only";
import { NextResponse, type NextRequest } from "next/server";
import { z, ZodError } from "zod";
import { BaseError, ConnectionError, TimeoutError, UniqueConstraintError, ForeignKeyConstraintError } from "sequelize";
import { ApiError, type ApiErrorIssue } from "./errors";
import { requireActor, type Actor } from "./session";
import type { Permission } from "@/lib/auth/permissions";
import { bindModels } from "./db";
import { refuseForeignOrigin } from "./request-origin";
import { isNodeNotReady, isWriteConflict } from "./db-errors";

export interface ErrorBody {
  error: string;
  issues?: ApiErrorIssue[];
  [key: string]: unknown;
}

export function zodIssues(error: ZodError): ApiErrorIssue[] {
  return error.issues.map((i) => ({ path: i.path.map(String).join(".") || "(body)", message: i.message }));
}

// The mariadb connector's codes for a server that went away: refused, reset, closed under a query
// (ER_SOCKET_UNEXPECTED_CLOSE), a pooled connection closed since (ER_CMD_CONNECTION_CLOSED), killed at shutdown.
const connectionLost = /^(ECONNREFUSED|ECONNRESET|EHOSTUNREACH|ETIMEDOUT|EPIPE|ER_GET_CONNECTION_TIMEOUT|ER_CONNECTION_TIMEOUT|ER_SOCKET_UNEXPECTED_CLOSE|ER_SOCKET_TIMEOUT|ER_CMD_CONNECTION_CLOSED|ER_CONNECTION_ALREADY_CLOSED|ER_CONNECTION_KILLED|ER_SERVER_SHUTDOWN)$/;

function isDatabaseDown(e: unknown): boolean {
  if (e instanceof ConnectionError || e instanceof TimeoutError || isNodeNotReady(e)) return true;
  type Cause = { code?: string; sqlState?: string };
  const cause = (e as { original?: Cause; parent?: Cause })?.original ?? (e as { parent?: Cause })?.parent;
  // SQLSTATE class 08 is "connection exception"
  return (!!cause?.code && connectionLost.test(cause.code)) || (!!cause?.sqlState && cause.sqlState.startsWith("08"));
}

/** Maps anything thrown to the one JSON error shape; internals never leave the server. */
export function errorResponse(e: unknown): NextResponse<ErrorBody> {
  if (e instanceof ApiError) return NextResponse.json({ error: e.message, ...(e.issues ? { issues: e.issues } : {}), ...e.extra }, { status: e.status });
  if (e instanceof ZodError) return NextResponse.json({ error: "Some fields are not valid.", issues: zodIssues(e) }, { status: 422 });
  // a connection that drops during COMMIT leaves the outcome unknown to us: the write may have landed
  if (isDatabaseDown(e))
    return NextResponse.json({ error: "The database is not answering right now; a change you sent may or may not have been stored. Reload to check before trying again." }, { status: 503, headers: { "Retry-After": "2" } });
  // a deadlock or a Galera certification conflict that reached here: rolled back whole, so nothing was stored
  if (isWriteConflict(e)) return NextResponse.json({ error: "Another change was being written at the same moment; nothing was saved. Try again." }, { status: 409 });
  if (e instanceof UniqueConstraintError) return NextResponse.json({ error: "That already exists." }, { status: 409 });
  if (e instanceof ForeignKeyConstraintError) return NextResponse.json({ error: "That refers to something that does not exist." }, { status: 422 });
  console.error(e instanceof BaseError ? `${e.name}: ${e.message}` : e);
  return NextResponse.json({ error: "Something went wrong on our side. The error has been logged." }, { status: 500 });
}

const MAX_JSON_BYTES = 2 * 1024 * 1024;

const tooLarge = (maxBytes: number) => new ApiError(413, `The body is too large (limit ${Math.round(maxBytes / 1024)} KiB).`);

/**
 * Reads a request body as a stream and stops at `maxBytes`: a chunked body (no Content-Length) or one that
 * understates its length is cut off at the limit, never buffered whole.
 */
export async function readBodyLimited(req: Request, maxBytes: number, refuse: () => ApiError = () => tooLarge(maxBytes)): Promise<Uint8Array> {
  const declared = Number(req.headers.get("content-length") ?? 0);
  if (declared > maxBytes) throw refuse();
  if (!req.body) return new Uint8Array();
  const reader = req.body.getReader();
  const chunks: Uint8Array[] = [];
  let total = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    total += value.length;
    if (total > maxBytes) {
      await reader.cancel().catch(() => undefined);
      throw refuse();
    }
    chunks.push(value);
  }
  const out = new Uint8Array(total);
  let at = 0;
  for (const c of chunks) {
    out.set(c, at);
    at += c.length;
  }
  return out;
}

const strictUtf8 = new TextDecoder("utf-8", { fatal: true, ignoreBOM: true });
// In a /u regex a surrogate range matches only unpaired halves: a pair is one code point.
const loneSurrogate = /[\uD800-\uDFFF]/u;

/**
 * The path of the first string (value or key) holding a lone UTF-16 surrogate, which no database column can
 * store; null when there is none. Iterative, with parent links instead of copied paths: a body may nest
 * 200,000 levels deep (the schemas refuse it later; this walk must not overflow the stack first).
 */
export function findInvalidUnicode(root: unknown): string | null {
  type Step = { value: unknown; key: string | number | null; parent: Step | null };
  const pathOf = (step: Step, lastKey?: string) => {
    const keys: (string | number)[] = lastKey === undefined ? [] : [lastKey];
    for (let s: Step | null = step; s && s.key !== null; s = s.parent) keys.push(s.key);
    return keys.reverse().join(".") || "(body)";
  };
  const stack: Step[] = [{ value: root, key: null, parent: null }];
  while (stack.length) {
    const step = stack.pop()!;
    const v = step.value;
    if (typeof v === "string") {
      if (loneSurrogate.test(v)) return pathOf(step);
    } else if (Array.isArray(v)) {
      for (let i = v.length - 1; i >= 0; i--) stack.push({ value: v[i], key: i, parent: step });
    } else if (v && typeof v === "object") {
      const entries = Object.entries(v);
      for (const [k] of entries) if (loneSurrogate.test(k)) return pathOf(step, k);
      for (let i = entries.length - 1; i >= 0; i--) stack.push({ value: entries[i][1], key: entries[i][0], parent: step });
    }
  }
  return null;
}

async function readJson(req: NextRequest, maxBytes: number): Promise<unknown> {
  const type = req.headers.get("content-type") ?? "";
  if (!/^application\/json\b/i.test(type)) throw new ApiError(415, "Send the body as JSON (Content-Type: application/json).");
  const bytes = await readBodyLimited(req, maxBytes);
  let text: string;
  try {
    text = strictUtf8.decode(bytes);
  } catch {
    throw new ApiError(400, "The body is not valid UTF-8 text.");
  }
  let value: unknown;
  try {
    value = JSON.parse(text);
  } catch {
    throw new ApiError(400, "The body is not valid JSON.");
  }
  const bad = findInvalidUnicode(value);
  if (bad !== null) throw new ApiError(422, "Some fields are not valid.", [{ path: bad, message: "contains invalid Unicode (a lone surrogate); send well-formed text" }]);
  return value;
}

type RouteContext = { params: Promise<Record<string, string | string[]>> };

interface BaseOptions<P extends z.ZodType, B extends z.ZodType, Q extends z.ZodType> {
  params?: P;
  body?: B;
  query?: Q;
  maxBodyBytes?: number;
}

interface SignedInOptions<P extends z.ZodType, B extends z.ZodType, Q extends z.ZodType> extends BaseOptions<P, B, Q> {
  permission: Permission;
}

interface PublicOptions<P extends z.ZodType, B extends z.ZodType, Q extends z.ZodType> extends BaseOptions<P, B, Q> {
  /** Only for public routes (health, sign-in helpers, invitation acceptance). */
  permission: null;
}

export interface HandlerContext<P, B, Q, A extends Actor | null = Actor> {
  /** The signed-in member; public routes read no session, so theirs is null and typed so they must check. */
  actor: A;
  params: P;
  body: B;
  query: Q;
  req: NextRequest;
}

type Handler = (req: NextRequest, context: RouteContext) => Promise<Response>;

// Responses that carry a member's data stay out of shared caches and off the disk of a shared computer.
const PRIVATE_CACHE = "private, no-store";

/**
 * The one wrapper for route handlers: forged-origin refusal, session and permission, zod-parsed
 * params/query/body, errors mapped to one JSON shape. A handler returns a Response or a JSON-able value (200).
 */
export function route<P extends z.ZodType = z.ZodUnknown, B extends z.ZodType = z.ZodUnknown, Q extends z.ZodType = z.ZodUnknown>(
  options: SignedInOptions<P, B, Q>,
  fn: (ctx: HandlerContext<z.infer<P>, z.infer<B>, z.infer<Q>, Actor>) => Promise<unknown>,
): Handler;
export function route<P extends z.ZodType = z.ZodUnknown, B extends z.ZodType = z.ZodUnknown, Q extends z.ZodType = z.ZodUnknown>(
  options: PublicOptions<P, B, Q>,
  fn: (ctx: HandlerContext<z.infer<P>, z.infer<B>, z.infer<Q>, Actor | null>) => Promise<unknown>,
): Handler;
export function route<P extends z.ZodType, B extends z.ZodType, Q extends z.ZodType>(
  options: SignedInOptions<P, B, Q> | PublicOptions<P, B, Q>,
  fn: ((ctx: HandlerContext<z.infer<P>, z.infer<B>, z.infer<Q>, Actor>) => Promise<unknown>) | ((ctx: HandlerContext<z.infer<P>, z.infer<B>, z.infer<Q>, Actor | null>) => Promise<unknown>),
): Handler {
  // The overloads tie the two together: `actor` is an Actor exactly when a permission was required.
  const call = fn as (ctx: HandlerContext<z.infer<P>, z.infer<B>, z.infer<Q>, Actor | null>) => Promise<unknown>;
  return async function handle(req: NextRequest, context: RouteContext): Promise<Response> {
    const res = await run(req, context);
    return options.permission ? withHeader(res, "cache-control", PRIVATE_CACHE) : res;
  };

  async function run(req: NextRequest, context: RouteContext): Promise<Response> {
    try {
      refuseForeignOrigin(req);
      bindModels();
      const actor = options.permission ? await requireActor(options.permission) : null;
      const rawParams = context?.params ? await context.params : {};
      const params = options.params ? parseOr404(options.params, rawParams) : rawParams;
      const query = options.query ? parse422(options.query, Object.fromEntries(req.nextUrl.searchParams)) : {};
      const body = options.body ? parse422(options.body, await readJson(req, options.maxBodyBytes ?? MAX_JSON_BYTES)) : undefined;
      const result = await call({ actor, params, body, query, req } as HandlerContext<z.infer<P>, z.infer<B>, z.infer<Q>, Actor | null>);
      if (result instanceof Response) return result;
      return NextResponse.json(result ?? { ok: true });
    } catch (e) {
      return errorResponse(e);
    }
  }
}

/** Sets a header, copying the response first when its headers are immutable (e.g. a fetched one). */
function withHeader(res: Response, name: string, value: string): Response {
  try {
    res.headers.set(name, value);
    return res;
  } catch {
    const copy = new Response(res.body, res);
    copy.headers.set(name, value);
    return copy;
  }
}

function parse422<T extends z.ZodType>(schema: T, value: unknown): z.infer<T> {
  const r = schema.safeParse(value);
  if (!r.success) throw new ApiError(422, "Some fields are not valid.", zodIssues(r.error));
  return r.data;
}

// A malformed id in the path names nothing: 404, not 422.
function parseOr404<T extends z.ZodType>(schema: T, value: unknown): z.infer<T> {
  const r = schema.safeParse(value);
  if (!r.success) throw new ApiError(404, "Nothing was found at that address.");
  return r.data;
}

export const idParam = z.coerce.number().int().positive().max(2 ** 31);
