"use client";

import { useState } from "react";
import Link from "next/link";
import { signUpSchema } from "@/lib/auth/sign-up-schema";
import { sendJson } from "@/lib/client/fetcher";
import { useSchemaForm } from "@/lib/client/use-schema-form";
import { Button } from "@/components/ui/button";
import { Card } from "@/components/ui/card";
import { Field } from "@/components/ui/field";
import { FormMessage } from "./auth-frame";
import { PASSWORD_HINT, strengthProblem } from "./password-hint";

const FIELDS = ["organisationName", "name", "email", "password"] as const;

export function SignUpForm() {
  const form = useSchemaForm(signUpSchema, FIELDS);
  const [sentTo, setSentTo] = useState<string | null>(null);

  async function onSubmit(e: React.FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const data = new FormData(e.currentTarget);
    const values = Object.fromEntries(FIELDS.map((f) => [f, String(data.get(f) ?? "")]));
    await form.submit(values, async (body) => {
      const weak = await strengthProblem(body.password, { name: body.name, email: body.email });
      if (weak) return { password: weak };
      await sendJson("/api/sign-up", "POST", body);
      setSentTo(body.email);
    });
  }

  if (sentTo)
    return (
      <Card role="status">
        <p className="text-sm">
          Nearly there. We sent a link to <strong>{sentTo}</strong>: open it to confirm your address, then sign in.
        </p>
        <p className="mt-3 text-sm">
          <Link className="text-signal underline" href="/sign-in">
            Go to sign-in
          </Link>
        </p>
      </Card>
    );
  return (
    <Card>
      <form onSubmit={onSubmit} className="space-y-4" aria-label="Start an organisation" noValidate>
        <Field label="Organisation name" name="organisationName" autoComplete="organization" required error={form.errors.organisationName} />
        <Field label="Your name" name="name" autoComplete="name" required error={form.errors.name} />
        <Field label="E-mail" name="email" type="email" autoComplete="email" required error={form.errors.email} />
        <Field label="Password" name="password" type="password" autoComplete="new-password" required error={form.errors.password} hint={PASSWORD_HINT} />
        <FormMessage error={form.error} />
        <Button type="submit" className="w-full" disabled={form.busy}>
          {form.busy ? "Checking…" : "Start the organisation"}
        </Button>
        <p className="text-center text-sm text-slate-600">
          Already have an account?{" "}
          <Link className="text-signal underline" href="/sign-in">
            Sign in
          </Link>
        </p>
      </form>
    </Card>
  );
}
