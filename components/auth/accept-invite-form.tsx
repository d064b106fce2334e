"use client";

import { useState } from "react";
import { acceptSchema } from "@/lib/members/member-schema";
import { describeError, FetchError, sendJson } from "@/lib/client/fetcher";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";

const FIELDS = ["name", "password"];

/** The issues about the form's fields, keyed by field (several joined), for the line under each field. */
function byField(issues: { path: string; message: string }[]): Record<string, string> {
  const out: Record<string, string> = {};
  for (const i of issues.filter((i) => FIELDS.includes(i.path))) out[i.path] = out[i.path] ? `${out[i.path]}; ${i.message}` : i.message;
  return out;
}

/** The strength rule the server applies too, loaded only when the form is sent (its dictionaries are large). */
async function strengthProblem(password: string, person: { name: string; email: string }): Promise<string | null> {
  const rule = await import("@/lib/auth/password");
  return rule.passwordStrengthProblem(password, person);
}

export function AcceptInviteForm({ token, email }: { token: string; email: string }) {
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [error, setError] = useState<string | null>(null);
  const [done, setDone] = useState(false);
  const [busy, setBusy] = useState(false);

  async function onSubmit(e: React.FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const form = new FormData(e.currentTarget);
    const parsed = acceptSchema.safeParse({ token, name: form.get("name"), password: form.get("password") });
    if (!parsed.success) {
      const fields = byField(parsed.error.issues.map((i) => ({ path: i.path.map(String).join("."), message: i.message })));
      setErrors(fields);
      // the token is not a field: a mangled link is said in words
      setError(Object.keys(fields).length ? null : "This invitation link is not valid. Open the link from the e-mail again.");
      return;
    }
    setBusy(true);
    try {
      const problem = await strengthProblem(parsed.data.password, { name: parsed.data.name, email }).catch(() => null); // the server checks again
      if (problem) {
        setError(null);
        setErrors({ password: problem });
        return;
      }
      await sendJson("/api/invitations/accept", "POST", parsed.data);
      setDone(true);
    } catch (err) {
      const fields = byField(err instanceof FetchError ? err.issues : []);
      setErrors(fields);
      setError(Object.keys(fields).length ? null : describeError(err));
    } finally {
      setBusy(false);
    }
  }

  if (done)
    return (
      <p role="status" className="text-sm">
        Your password is set. <a className="text-signal underline" href="/sign-in">Sign in</a>.
      </p>
    );
  return (
    <form onSubmit={onSubmit} className="space-y-3">
      <Field label="Your name" name="name" required error={errors.name} />
      <Field
        label="Password"
        name="password"
        type="password"
        autoComplete="new-password"
        required
        error={errors.password}
        hint="At least 10 characters with letters and digits or symbols, hard to guess and not built from your name or e-mail; a few unrelated words work well. At most 72 bytes."
      />
      {error && !Object.keys(errors).length ? <p role="alert" className="text-sm text-fault">{error}</p> : null}
      <Button type="submit" disabled={busy}>
        {busy ? "Checking…" : "Set password and join"}
      </Button>
    </form>
  );
}
