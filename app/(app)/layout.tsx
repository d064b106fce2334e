import type { ReactNode } from "react";
import { redirect } from "next/navigation";
import { currentActor } from "@/lib/server/session";
import { AppNav } from "@/components/shell/app-nav";
import { FormatProvider } from "@/components/format/format-provider";

export const dynamic = "force-dynamic";

// The layout only draws the frame; every page and handler checks its own permission.
export default async function AppLayout({ children }: { children: ReactNode }) {
  const actor = await currentActor();
  if (!actor) redirect("/sign-in");
  return (
    <>
      <AppNav actor={actor} />
      <FormatProvider settings={{ locale: actor.settings.locale, timeZone: actor.settings.timeZone, currency: actor.settings.currency, units: actor.settings.units }}>
        <main className="mx-auto max-w-7xl px-4 py-6">{children}</main>
      </FormatProvider>
    </>
  );
}
