import "server-only";
import { NextResponse, type NextRequest } from "next/server";
import { z, ZodError } from "zod";
import { BaseError, ConnectionError, TimeoutError, UniqueConstraintError, ForeignKeyConstraintError } from "sequelize";
import { ApiError, type ApiErrorIssue } from "./errors";
import { requireActor, type Actor } from "./session";
import type { Permission } from "@/lib/auth/permissions";
import { db } from "./db";

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
  if (e instanceof ConnectionError || e instanceof TimeoutError) return true;
  type Cause = { code?: string; sqlState?: string };
  const cause = (e as { original?: Cause; parent?: Cause })?.original ?? (e as { parent?: Cause })?.parent;
  // SQLSTATE class 08 is "connection exception"
  return (!!cause?.code && connectionLost.test(cause.code)) || (!!cause?.sqlState && cause.sqlState.startsWith("08"));
}

/** Maps anything thrown to the one JSON error shape; internals never leave the server. */
export function errorResponse(e: unknown): NextResponse<ErrorBody> {
  if (e instanceof ApiError) return NextResponse.json({ error: e.message, ...(e.issues ? { issues: e.issues } : {}), ...e.extra }, { status: e.status });
  if (e instanceof ZodError) return NextResponse.json({ error: "Some fields are not valid.", issues: zodIssues(e) }, { status: 422 });
  if (isDatabaseDown(e))
    return NextResponse.json({ error: "The database is not answering right now; nothing was saved. Try again in a moment." }, { status: 503, headers: { "Retry-After": "2" } });
  if (e instanceof UniqueConstraintError) return NextResponse.json({ error: "That already exists." }, { status: 409 });
  if (e instanceof ForeignKeyConstraintError) return NextResponse.json({ error: "That refers to something that does not exist." }, { status: 422 });
  console.error(e instanceof BaseError ? `${e.name}: ${e.message}` : e);
  return NextResponse.json({ error: "Something went wrong on our side. The error has been logged." }, { status: 500 });
}

const MAX_JSON_BYTES = 2 * 1024 * 1024;

async function readJson(req: NextRequest, maxBytes: number): Promise<unknown> {
  const type = req.headers.get("content-type") ?? "";
  if (!/^application\/json\b/i.test(type)) throw new ApiError(415, "Send the body as JSON (Content-Type: application/json).");
  const length = Number(req.headers.get("content-length") ?? 0);
  if (length > maxBytes) throw new ApiError(413, `The body is too large (limit ${Math.round(maxBytes / 1024)} KiB).`);
  const text = await req.text();
  if (text.length > maxBytes) throw new ApiError(413, `The body is too large (limit ${Math.round(maxBytes / 1024)} KiB).`);
  try {
    return JSON.parse(text);
  } catch {
    throw new ApiError(400, "The body is not valid JSON.");
  }
}

type RouteContext = { params: Promise<Record<string, string | string[]>> };

interface Options<P extends z.ZodType, B extends z.ZodType, Q extends z.ZodType> {
  /** null only for public routes (health, sign-in helpers). */
  permission: Permission | null;
  params?: P;
  body?: B;
  query?: Q;
  maxBodyBytes?: number;
}

export interface HandlerContext<P, B, Q> {
  actor: Actor;
  params: P;
  body: B;
  query: Q;
  req: NextRequest;
}

/**
 * The one wrapper for route handlers: session and permission, zod-parsed params/query/body,
 * errors mapped to one JSON shape. A handler returns a Response or a JSON-able value (200).
 */
export function route<P extends z.ZodType = z.ZodUnknown, B extends z.ZodType = z.ZodUnknown, Q extends z.ZodType = z.ZodUnknown>(
  options: Options<P, B, Q>,
  fn: (ctx: HandlerContext<z.infer<P>, z.infer<B>, z.infer<Q>>) => Promise<unknown>,
) {
  return async function handle(req: NextRequest, context: RouteContext): Promise<Response> {
    try {
      db();
      const actor = options.permission ? await requireActor(options.permission) : (null as unknown as Actor);
      const rawParams = context?.params ? await context.params : {};
      const params = options.params ? parseOr404(options.params, rawParams) : rawParams;
      const query = options.query ? parse422(options.query, Object.fromEntries(req.nextUrl.searchParams)) : {};
      const body = options.body ? parse422(options.body, await readJson(req, options.maxBodyBytes ?? MAX_JSON_BYTES)) : undefined;
      const result = await fn({ actor, params, body, query, req } as HandlerContext<z.infer<P>, z.infer<B>, z.infer<Q>>);
      if (result instanceof Response) return result;
      return NextResponse.json(result ?? { ok: true });
    } catch (e) {
      return errorResponse(e);
    }
  };
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
