"use client";

import { useState } from "react";
import Link from "next/link";
import { resetPasswordSchema } from "@/lib/auth/sign-up-schema";
import { sendJson } from "@/lib/client/fetcher";
import { useSchemaForm } from "@/lib/client/use-schema-form";
import { Button } from "@/components/ui/button";
import { Card } from "@/components/ui/card";
import { Field } from "@/components/ui/field";
import { FormMessage } from "./auth-frame";
import { PASSWORD_HINT, strengthProblem } from "./password-hint";

export function ResetPasswordForm({ token }: { token: string }) {
  const form = useSchemaForm(resetPasswordSchema, ["password"]);
  const [done, setDone] = useState(false);

  async function onSubmit(e: React.FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const password = String(new FormData(e.currentTarget).get("password") ?? "");
    await form.submit({ token, password }, async (body) => {
      const weak = await strengthProblem(body.password, {});
      if (weak) return { password: weak };
      await sendJson("/api/password/reset", "POST", body);
      setDone(true);
    });
  }

  if (done)
    return (
      <Card role="status">
        <p className="text-sm">
          Your new password is set, and every other session of your account has ended.{" "}
          <Link className="text-signal underline" href="/sign-in">
            Sign in
          </Link>
        </p>
      </Card>
    );
  return (
    <Card>
      <form onSubmit={onSubmit} className="space-y-4" aria-label="New password" noValidate>
        <Field label="New password" name="password" type="password" autoComplete="new-password" required error={form.errors.password} hint={PASSWORD_HINT} />
        <FormMessage error={form.error} />
        <Button type="submit" className="w-full" disabled={form.busy}>
          {form.busy ? "Saving…" : "Set the new password"}
        </Button>
      </form>
    </Card>
  );
}
