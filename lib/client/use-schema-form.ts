"use client";

import { useState } from "react";
import type { z } from "zod";
import { describeError, FetchError } from "./fetcher";

type Issue = { path: string; message: string };

/** Issues keyed by their first path segment (several joined), for the line beside each field. */
export function issuesByField(issues: Issue[], fields: readonly string[]): Record<string, string> {
  const out: Record<string, string> = {};
  for (const i of issues) {
    const key = i.path.split(".")[0];
    if (!fields.includes(key)) continue;
    out[key] = out[key] ? `${out[key]}; ${i.message}` : i.message;
  }
  return out;
}

/**
 * A form checked with the same zod schema as its route handler: field errors beside each field (from the schema
 * in the browser, or from the server's 422), any other refusal as one sentence.
 */
export function useSchemaForm<S extends z.ZodType>(schema: S, fields: readonly string[]) {
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);

  /** `send` may answer field problems found before sending (e.g. the password strength check) instead of throwing. */
  async function submit(values: unknown, send: (data: z.infer<S>) => Promise<void | Record<string, string>>): Promise<boolean> {
    setError(null);
    const parsed = schema.safeParse(values);
    if (!parsed.success) {
      const byField = issuesByField(parsed.error.issues.map((i) => ({ path: i.path.map(String).join("."), message: i.message })), fields);
      setErrors(byField);
      if (!Object.keys(byField).length) setError(parsed.error.issues[0]?.message ?? "Some fields are not valid.");
      return false;
    }
    setErrors({});
    setBusy(true);
    try {
      const problems = await send(parsed.data);
      if (problems && Object.keys(problems).length) {
        setErrors(problems);
        return false;
      }
      return true;
    } catch (err) {
      const byField = issuesByField(err instanceof FetchError ? err.issues : [], fields);
      setErrors(byField);
      setError(Object.keys(byField).length ? null : describeError(err));
      return false;
    } finally {
      setBusy(false);
    }
  }

  return { errors, error, busy, submit };
}
