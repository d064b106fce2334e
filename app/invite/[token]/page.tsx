import { findInvitation } from "@/lib/server/members";
import { currentActor } from "@/lib/server/session";
import { roleLabels } from "@/lib/auth/permissions";
import { AcceptInviteForm } from "@/components/auth/accept-invite-form";
import { JoinInvitation } from "@/components/auth/join-invitation";
import { Card } from "@/components/ui/card";

export const dynamic = "force-dynamic";

export default async function InvitePage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const inv = token.length <= 200 ? await findInvitation(token) : null;
  const actor = inv?.hasAccount ? await currentActor() : null;
  const signedInAsInvitee = !!actor && actor.email.toLowerCase() === inv?.email;
  const signInHref = `/sign-in?callbackUrl=${encodeURIComponent(`/invite/${token}`)}`;
  return (
    <main className="flex min-h-screen items-center justify-center p-6">
      <div className="w-full max-w-md">
        <p className="mb-6 text-center text-3xl font-semibold tracking-tight">Loopwright</p>
        {!inv ? (
          <Card role="alert">This invitation link is not valid any more. Ask an admin of your organisation for a new one.</Card>
        ) : !inv.hasAccount ? (
          <Card>
            <p className="mb-4 text-sm">
              Join <strong>{inv.organisationName}</strong> as <strong>{roleLabels[inv.role].toLowerCase()}</strong> with <strong>{inv.email}</strong>. Choose your password.
            </p>
            <AcceptInviteForm token={token} email={inv.email} />
          </Card>
        ) : (
          <Card className="space-y-3">
            <p className="text-sm">
              <strong>{inv.organisationName}</strong> invites <strong>{inv.email}</strong> as <strong>{roleLabels[inv.role].toLowerCase()}</strong>.
            </p>
            {signedInAsInvitee ? (
              <JoinInvitation token={token} />
            ) : (
              <p className="text-sm">
                {actor ? `You are signed in as ${actor.email}. ` : ""}
                {inv.email} already has an account: sign in with it to accept; your password stays as it is.{" "}
                {actor ? (
                  "Sign out first, then open this link again."
                ) : (
                  <a className="text-signal underline" href={signInHref}>
                    Sign in as {inv.email}
                  </a>
                )}
              </p>
            )}
          </Card>
        )}
      </div>
    </main>
  );
}
