import "server-only";
import { z } from "zod";
import { ApiError } from "./errors";
import { requireActor, type Actor } from "./session";
import { errorResponse, zodIssues } from "./route";
import type { Permission } from "@/lib/auth/permissions";

export type ActionResult<T> = { ok: true; data: T } | { ok: false; status: number; error: string; issues?: { path: string; message: string }[] };

/** Server actions are public endpoints: every one checks the session and validates its input here. */
export function action<S extends z.ZodType, T>(permission: Permission, schema: S, fn: (input: z.infer<S>, actor: Actor) => Promise<T>) {
  return async (input: unknown): Promise<ActionResult<T>> => {
    try {
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
