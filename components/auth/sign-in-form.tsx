"use client";

import { useState } from "react";
import { signIn } from "next-auth/react";
import { useRouter } from "next/navigation";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { Card } from "@/components/ui/card";
import Link from "next/link";
import { signInSchema } from "@/lib/auth/sign-in-schema";
import { UNCONFIRMED_EMAIL } from "@/lib/auth/sign-up-schema";
import { EmailLinkForm } from "./email-link-form";

export function SignInForm({ callbackUrl }: { callbackUrl: string }) {
  const router = useRouter();
  const [error, setError] = useState<string | null>(null);
  const [fieldErrors, setFieldErrors] = useState<Record<string, string>>({});
  const [busy, setBusy] = useState(false);
  const [unconfirmed, setUnconfirmed] = useState<string | null>(null);

  async function onSubmit(e: React.FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const form = new FormData(e.currentTarget);
    setError(null);
    setUnconfirmed(null);
    const parsed = signInSchema.safeParse({ email: String(form.get("email") ?? ""), password: String(form.get("password") ?? "") });
    if (!parsed.success) {
      const byField: Record<string, string> = {};
      for (const i of parsed.error.issues) byField[String(i.path[0])] ??= i.message;
      setFieldErrors(byField);
      return;
    }
    setFieldErrors({});
    setBusy(true);
    const res = await signIn("credentials", { ...parsed.data, redirect: false });
    setBusy(false);
    if (res?.error === UNCONFIRMED_EMAIL) setUnconfirmed(parsed.data.email);
    if (!res || res.error) {
      setError(res?.error && res.error !== "CredentialsSignin" ? res.error : "That e-mail and password do not match an account.");
      return;
    }
    router.push(callbackUrl);
    router.refresh();
  }

  return (
    <Card>
      <form onSubmit={onSubmit} className="space-y-4" aria-label="Sign in">
        <Field label="E-mail" name="email" type="email" autoComplete="username" required error={fieldErrors.email} />
        <Field label="Password" name="password" type="password" autoComplete="current-password" required error={fieldErrors.password} />
        {error ? (
          <p role="alert" className="rounded-md bg-fault-soft px-3 py-2 text-sm text-fault">
            {error}
          </p>
        ) : null}
        <Button type="submit" className="w-full" disabled={busy}>
          {busy ? "Signing in…" : "Sign in"}
        </Button>
      </form>
      {unconfirmed ? (
        <div className="mt-4 border-t border-line pt-4">
          <EmailLinkForm endpoint="/api/sign-up/resend" label="Send the link again" defaultEmail={unconfirmed} />
        </div>
      ) : null}
      <div className="mt-4 flex flex-wrap justify-between gap-2 text-sm">
        <Link className="text-signal underline" href="/forgot-password">
          Forgot your password?
        </Link>
        <Link className="text-signal underline" href="/sign-up">
          Start a new organisation
        </Link>
      </div>
    </Card>
  );
}
