"use client";

import { useState } from "react";
import { emailOnlySchema } from "@/lib/auth/sign-up-schema";
import { sendJson } from "@/lib/client/fetcher";
import { useSchemaForm } from "@/lib/client/use-schema-form";
import { Button } from "@/components/ui/button";
import { Field } from "@/components/ui/field";
import { FormMessage } from "./auth-frame";

/** One e-mail field that asks the server to mail a link (a new password, or the confirmation again). */
export function EmailLinkForm({ endpoint, label, defaultEmail = "" }: { endpoint: "/api/password/forgot" | "/api/sign-up/resend"; label: string; defaultEmail?: string }) {
  const form = useSchemaForm(emailOnlySchema, ["email"]);
  const [answer, setAnswer] = useState<string | null>(null);

  async function onSubmit(e: React.FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const email = String(new FormData(e.currentTarget).get("email") ?? "");
    await form.submit({ email }, async (body) => setAnswer((await sendJson<{ message: string }>(endpoint, "POST", body)).message));
  }

  return (
    <form onSubmit={onSubmit} className="space-y-3" aria-label={label} noValidate>
      <Field label="E-mail" name="email" id={`${endpoint}-email`} type="email" autoComplete="email" defaultValue={defaultEmail} required error={form.errors.email} />
      <FormMessage error={form.error} />
      {answer ? (
        <p role="status" className="text-sm text-signal">
          {answer}
        </p>
      ) : null}
      <Button type="submit" variant={endpoint === "/api/sign-up/resend" ? "secondary" : "primary"} disabled={form.busy}>
        {label}
      </Button>
    </form>
  );
}
