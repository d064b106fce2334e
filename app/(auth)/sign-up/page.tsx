import type { Metadata } from "next";
import { redirect } from "next/navigation";
import { currentActor } from "@/lib/server/session";
import { AuthFrame } from "@/components/auth/auth-frame";
import { SignUpForm } from "@/components/auth/sign-up-form";

export const metadata: Metadata = { title: "Start an organisation" };
export const dynamic = "force-dynamic";

export default async function SignUpPage() {
  if (await currentActor()) redirect("/");
  return (
    <AuthFrame title="Start an organisation: you become its admin and invite the others" wide>
      <SignUpForm />
    </AuthFrame>
  );
}
