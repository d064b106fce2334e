"use client";

import { useState } from "react";
import { changePasswordSchema } from "@/lib/auth/sign-up-schema";
import { sendJson } from "@/lib/client/fetcher";
import { useSchemaForm } from "@/lib/client/use-schema-form";
import { Button } from "@/components/ui/button";
import { Card } from "@/components/ui/card";
import { Field } from "@/components/ui/field";
import { FormMessage } from "./auth-frame";
import { PASSWORD_HINT, strengthProblem } from "./password-hint";

export function ChangePasswordForm({ person }: { person: { name: string; email: string } }) {
  const form = useSchemaForm(changePasswordSchema, ["currentPassword", "newPassword"]);
  const [done, setDone] = useState(false);

  async function onSubmit(e: React.FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const target = e.currentTarget;
    const d = new FormData(target);
    setDone(false);
    const ok = await form.submit({ currentPassword: String(d.get("currentPassword") ?? ""), newPassword: String(d.get("newPassword") ?? "") }, async (body) => {
      const weak = await strengthProblem(body.newPassword, person);
      if (weak) return { newPassword: weak };
      await sendJson("/api/account/password", "POST", body);
    });
    if (ok) {
      target.reset();
      setDone(true);
    }
  }

  return (
    <Card className="max-w-md">
      <form onSubmit={onSubmit} className="space-y-4" aria-label="Change password" noValidate>
        <Field label="Current password" name="currentPassword" type="password" autoComplete="current-password" required error={form.errors.currentPassword} />
        <Field label="New password" name="newPassword" type="password" autoComplete="new-password" required error={form.errors.newPassword} hint={PASSWORD_HINT} />
        <FormMessage error={form.error} />
        {done ? (
          <p role="status" className="text-sm text-signal">
            Password changed. Your other sessions have ended; this one goes on.
          </p>
        ) : null}
        <Button type="submit" disabled={form.busy}>
          {form.busy ? "Saving…" : "Change password"}
        </Button>
      </form>
    </Card>
  );
}
