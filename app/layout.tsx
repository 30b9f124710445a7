import type { Metadata, Viewport } from "next";
import { connection } from "next/server";
import "./globals.css";

export const metadata: Metadata = {
  title: { default: "Seepline", template: "%s · Seepline" },
  description: "Chain of custody and hydraulic test records for a GCL testing laboratory",
};

export const viewport: Viewport = { width: "device-width", initialScale: 1 };

export default async function RootLayout({ children }: { children: React.ReactNode }) {
  // Every page is rendered per request, so each carries the nonce of its own Content-Security-Policy (proxy.ts).
  await connection();
  return (
    <html lang="en">
      <body>
        {/* The first tab stop of every page: past the navigation to the page's main landmark. */}
        <a className="skip-link" href="#main">Skip to main content</a>
        {children}
      </body>
    </html>
  );
}
