import type { Metadata } from "next";
import Link from "next/link";
import { AuthFrame } from "@/components/auth/auth-frame";
import { EmailLinkForm } from "@/components/auth/email-link-form";
import { Card } from "@/components/ui/card";

export const metadata: Metadata = { title: "Forgot password" };
export const dynamic = "force-dynamic";

export default function ForgotPasswordPage() {
  return (
    <AuthFrame title="Choose a new password">
      <Card className="space-y-3">
        <p className="text-sm">We will mail you a link to choose a new password. It works once, for one hour.</p>
        <EmailLinkForm endpoint="/api/password/forgot" label="Send the link" />
        <p className="text-sm">
          <Link className="text-signal underline" href="/sign-in">
            Back to sign-in
          </Link>
        </p>
      </Card>
    </AuthFrame>
  );
}
