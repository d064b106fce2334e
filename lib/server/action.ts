import "server-only";
import { headers } from "next/headers";
import { z } from "zod";
import { ApiError } from "./errors";
import { requireActor, type Actor } from "./session";
import { errorResponse, zodIssues } from "./route";
import { refuseForeignOrigin } from "./request-origin";
import type { Permission } from "@/lib/auth/permissions";

export type ActionResult<T> = { ok: true; data: T } | { ok: false; status: number; error: string; issues?: { path: string; message: string }[] };

/**
 * Server actions are public endpoints: every one checks where the call came from, the session and its input
 * here. Next itself aborts an action whose Origin host differs from X-Forwarded-Host / Host (its
 * action-handler), but a page on a rebound name sends that name as Host too; this check compares the scheme,
 * host and port with the configured public origin (NEXTAUTH_URL), as route handlers do.
 */
export function action<S extends z.ZodType, T>(permission: Permission, schema: S, fn: (input: z.infer<S>, actor: Actor) => Promise<T>) {
  return async (input: unknown): Promise<ActionResult<T>> => {
    try {
      // Actions are always POSTs.
      refuseForeignOrigin({ method: "POST", headers: await headers() });
      const actor = await requireActor(permission);
      const parsed = schema.safeParse(input);
      if (!parsed.success) throw new ApiError(422, "Some fields are not valid.", zodIssues(parsed.error));
      return { ok: true, data: await fn(parsed.data, actor) };
    } catch (e) {
      const res = errorResponse(e);
      const body = (await res.json()) as { error: string; issues?: { path: string; message: string }[] };
      return { ok: false, status: res.status, error: body.error, issues: body.issues };
    }
  };
}
