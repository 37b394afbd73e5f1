import type { Metadata, Viewport } from "next";
import { headers } from "next/headers";
import type { ReactNode } from "react";
import { Providers } from "@/components/providers";
import { SkipLink } from "@/components/ui";
import { display, sans } from "./fonts";
import "./globals.css";

export const metadata: Metadata = {
  title: { default: "Mottle", template: "%s · Mottle" },
  description: "Finishes, sample boards, client decisions and specifications for design studios.",
};

export const viewport: Viewport = { width: "device-width", initialScale: 1, themeColor: "#fafafa" };

export default async function RootLayout({ children }: { children: ReactNode }) {
  // Reading the request makes every page render per request, so each gets its own CSP nonce.
  await headers();
  return (
    <html lang="en-AU" className={`${sans.variable} ${display.variable}`}>
      <body className="min-h-dvh bg-paper font-sans text-ink antialiased">
        <SkipLink />
        <Providers>{children}</Providers>
      </body>
    </html>
  );
}
