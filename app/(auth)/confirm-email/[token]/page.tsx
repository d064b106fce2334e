import type { Metadata } from "next";
import { AuthFrame } from "@/components/auth/auth-frame";
import { ConfirmEmailButton } from "@/components/auth/confirm-email-button";

export const metadata: Metadata = { title: "Confirm your e-mail address" };
export const dynamic = "force-dynamic";

export default async function ConfirmEmailPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  return (
    <AuthFrame title="Confirm your e-mail address">
      <ConfirmEmailButton token={token} />
    </AuthFrame>
  );
}
