import { findInvitation } from "@/lib/server/members";
import { roleLabels } from "@/lib/auth/permissions";
import { AcceptInviteForm } from "@/components/auth/accept-invite-form";
import { Card } from "@/components/ui/card";

export const dynamic = "force-dynamic";

export default async function InvitePage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const inv = token.length <= 200 ? await findInvitation(token) : null;
  return (
    <main className="flex min-h-screen items-center justify-center p-6">
      <div className="w-full max-w-md">
        <p className="mb-6 text-center text-3xl font-semibold tracking-tight">Loopwright</p>
        {inv ? (
          <Card>
            <p className="mb-4 text-sm">
              Join <strong>{inv.organisationName}</strong> as <strong>{roleLabels[inv.role].toLowerCase()}</strong> with <strong>{inv.email}</strong>. Choose your password.
            </p>
            <AcceptInviteForm token={token} email={inv.email} />
          </Card>
        ) : (
          <Card role="alert">This invitation link is not valid any more. Ask an admin of your organisation for a new one.</Card>
        )}
      </div>
    </main>
  );
}
