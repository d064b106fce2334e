"use client";

import { useState } from "react";
import Link from "next/link";
import { confirmEmailSchema } from "@/lib/auth/sign-up-schema";
import { sendJson } from "@/lib/client/fetcher";
import { useSchemaForm } from "@/lib/client/use-schema-form";
import { Button } from "@/components/ui/button";
import { Card } from "@/components/ui/card";
import { FormMessage } from "./auth-frame";

// A button, not an automatic request on page load: mail scanners open links, and must not use them up.
export function ConfirmEmailButton({ token }: { token: string }) {
  const form = useSchemaForm(confirmEmailSchema, []);
  const [email, setEmail] = useState<string | null>(null);

  if (email)
    return (
      <Card role="status">
        <p className="text-sm">
          <strong>{email}</strong> is confirmed.{" "}
          <Link className="text-signal underline" href="/sign-in">
            Sign in
          </Link>
        </p>
      </Card>
    );
  return (
    <Card className="space-y-4">
      <p className="text-sm">Confirm that this e-mail address is yours to start using your organisation.</p>
      <FormMessage error={form.error} />
      <Button
        type="button"
        className="w-full"
        disabled={form.busy}
        onClick={() => form.submit({ token }, async (body) => setEmail((await sendJson<{ email: string }>("/api/sign-up/confirm", "POST", body)).email))}
      >
        {form.busy ? "Confirming…" : "Confirm my e-mail address"}
      </Button>
    </Card>
  );
}
