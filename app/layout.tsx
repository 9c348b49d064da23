import type { Metadata, Viewport } from "next";
import { connection } from "next/server";
import { Providers } from "@/components/providers";
import "./globals.css";

export const metadata: Metadata = {
  title: { default: "Rampline", template: "%s · Rampline" },
  description: "Home electrical stimulation programmes, followed up remotely by the treating therapist.",
};

export const viewport: Viewport = { width: "device-width", initialScale: 1, themeColor: "#1b2633" };

export default async function RootLayout({ children }: { children: React.ReactNode }) {
  // Every page is rendered per request so that Next can put the CSP nonce from proxy.ts on its scripts.
  await connection();
  return (
    <html lang="en-GB">
      <body className="antialiased">
        <a
          href="#main"
          className="sr-only focus:not-sr-only focus:absolute focus:left-2 focus:top-2 focus:z-50 focus:rounded focus:bg-card focus:px-3 focus:py-2"
        >
          Skip to main content
        </a>
        <Providers>{children}</Providers>
      </body>
    </html>
  );
}
