"use client";

import { useState } from "react";
import Link from "next/link";
import { joinSchema } from "@/lib/members/member-schema";
import { sendJson } from "@/lib/client/fetcher";
import { useSchemaForm } from "@/lib/client/use-schema-form";
import { Button } from "@/components/ui/button";
import { FormMessage } from "./auth-frame";

/** The signed-in account accepts an invitation to its own address; nothing about its password changes. */
export function JoinInvitation({ token }: { token: string }) {
  const form = useSchemaForm(joinSchema, []);
  const [done, setDone] = useState(false);
  if (done)
    return (
      <p role="status" className="text-sm">
        Done.{" "}
        <Link className="text-signal underline" href="/">
          Open the organisation
        </Link>
        .
      </p>
    );
  return (
    <div className="space-y-3">
      <FormMessage error={form.error} />
      <Button type="button" disabled={form.busy} onClick={() => form.submit({ token }, async (body) => (await sendJson("/api/invitations/join", "POST", body), setDone(true)))}>
        {form.busy ? "Accepting…" : "Accept the invitation"}
      </Button>
    </div>
  );
}
