import type { Metadata } from "next";
import type { ReactNode } from "react";
import { inter } from "./fonts";
import "./globals.css";

export const metadata: Metadata = {
  title: { default: "Loopwright", template: "%s · Loopwright" },
  description: "Design, check and commission supervised alarm loops.",
  icons: { icon: "/loopwright-mark.svg" },
};

export default function RootLayout({ children }: { children: ReactNode }) {
  return (
    <html lang="en" className={inter.variable}>
      <body className="min-h-screen font-sans antialiased">{children}</body>
    </html>
  );
}
