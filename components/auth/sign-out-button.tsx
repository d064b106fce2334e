"use client";

import { signOut } from "next-auth/react";

export function SignOutButton() {
  return (
    <button type="button" className="rounded border border-slate-500 px-2 py-1 text-xs text-slate-200 hover:bg-slate-700" onClick={() => signOut({ callbackUrl: "/sign-in" })}>
      Sign out
    </button>
  );
}
