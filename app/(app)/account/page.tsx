import type { Metadata } from "next";
import { pageActor } from "@/lib/server/session";
import { PageHeader } from "@/components/ui/page-header";
import { Refusal } from "@/components/ui/refusal";
import { ChangePasswordForm } from "@/components/auth/change-password-form";

export const metadata: Metadata = { title: "Your account" };

export default async function AccountPage() {
  const { actor, allowed, reason } = await pageActor("account:manage", "/account");
  if (!allowed) return <Refusal reason={reason} />;
  return (
    <>
      <PageHeader title="Your account" subtitle={`${actor.name} · ${actor.email}`} />
      <ChangePasswordForm person={{ name: actor.name, email: actor.email }} />
    </>
  );
}
