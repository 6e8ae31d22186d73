import type { Metadata, Viewport } from "next";
import type { ReactNode } from "react";
import { headers } from "next/headers";
import "./globals.css";
import { body, heading } from "./fonts";
import { Providers } from "./providers";
import { SiteHeader } from "@/components/site-header";

export const metadata: Metadata = {
  title: { default: "Placet", template: "%s · Placet" },
  description: "Where a studio and a committee decide a commission together, on the record.",
};

export const viewport: Viewport = { width: "device-width", initialScale: 1, themeColor: "#f6f1e7" };

/**
 * Every page renders per request: its scripts carry the nonce proxy.ts put in this response's
 * Content-Security-Policy (Next.js reads it from the request), so no page is served with a stale one.
 */
export default async function RootLayout({ children }: { children: ReactNode }) {
  await headers();
  return (
    <html lang="en-GB" className={`${heading.variable} ${body.variable}`}>
      <body className="min-h-screen bg-paper text-ink antialiased">
        <Providers>
          <SiteHeader />
          <main className="mx-auto w-full max-w-5xl px-4 pb-16 pt-6 sm:px-6">{children}</main>
        </Providers>
      </body>
    </html>
  );
}
