import type { Metadata } from "next";
import { headers } from "next/headers";
import { redirect } from "next/navigation";
import { currentActor } from "@/lib/server/session";
import { appOrigin } from "@/lib/server/request-origin";
import { safeCallbackUrl } from "@/lib/http/same-origin";
import { SignInForm } from "@/components/auth/sign-in-form";

export const metadata: Metadata = { title: "Sign in" };

export default async function SignInPage({ searchParams }: { searchParams: Promise<{ callbackUrl?: string }> }) {
  const { callbackUrl } = await searchParams;
  // Only the app's own origin: "/\host", "//host" or an absolute URL here would make the page an open redirect.
  const target = safeCallbackUrl(callbackUrl, appOrigin(await headers()));
  if (await currentActor()) redirect(target);
  return (
    <main className="flex min-h-screen items-center justify-center p-6">
      <div className="w-full max-w-sm">
        <div className="mb-8 text-center">
          <p className="text-3xl font-semibold tracking-tight">Loopwright</p>
          <p className="mt-2 text-sm text-slate-600">Supervised loops, sized power, a sheet the installer can trust.</p>
        </div>
        <SignInForm callbackUrl={target} />
      </div>
    </main>
  );
}
