"use client";

import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";

/** The same rule the server applies, loaded only when the form is sent (its dictionaries are large). */
async function passwordProblem(password: string, person: { name: string; email: string }): Promise<string | null> {
  const rule = await import("@/lib/auth/password");
  const shape = rule.passwordSchema.safeParse(password);
  if (!shape.success) return shape.error.issues.map((i) => i.message).join("; ");
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
    const name = String(form.get("name") ?? "");
    const password = String(form.get("password") ?? "");
    setBusy(true);
    const problem = await passwordProblem(password, { name, email }).catch(() => null); // the server checks again
    if (problem) {
      setBusy(false);
      setError(null);
      return setErrors({ password: problem });
    }
    const res = await fetch("/api/invitations/accept", { method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify({ token, name, password }) });
    setBusy(false);
    const json = await res.json();
    if (res.ok) return setDone(true);
    setError(json.error);
    const byField: Record<string, string> = {};
    for (const i of (json.issues ?? []) as { path: string; message: string }[]) byField[i.path] = byField[i.path] ? `${byField[i.path]}; ${i.message}` : i.message;
    setErrors(byField);
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
