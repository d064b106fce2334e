import type { Metadata } from "next";
import type { ReactNode } from "react";
import { connection } from "next/server";
import { inter } from "./fonts";
import "./globals.css";

export const metadata: Metadata = {
  title: { default: "Loopwright", template: "%s · Loopwright" },
  description: "Design, check and commission supervised alarm loops.",
  icons: { icon: "/loopwright-mark.svg" },
};

export default async function RootLayout({ children }: { children: ReactNode }) {
  // Every page renders per request: Next can put this request's CSP nonce (proxy.ts) on its scripts only then.
  await connection();
  return (
    <html lang="en" className={inter.variable}>
      <body className="min-h-screen font-sans antialiased">{children}</body>
    </html>
  );
}
