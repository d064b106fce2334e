"use client";

import { useState } from "react";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";

export function AcceptInviteForm({ token }: { token: string }) {
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [error, setError] = useState<string | null>(null);
  const [done, setDone] = useState(false);

  async function onSubmit(e: React.FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const form = new FormData(e.currentTarget);
    const res = await fetch("/api/invitations/accept", { method: "POST", headers: { "content-type": "application/json" }, body: JSON.stringify({ token, name: form.get("name"), password: form.get("password") }) });
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
      <Field label="Password" name="password" type="password" autoComplete="new-password" required error={errors.password} hint="At least 10 characters, letters mixed with digits or symbols." />
      {error && !Object.keys(errors).length ? <p role="alert" className="text-sm text-fault">{error}</p> : null}
      <Button type="submit">Set password and join</Button>
    </form>
  );
}
