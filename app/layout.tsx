import type { Metadata, Viewport } from "next";
import { connection } from "next/server";
import { hyperlegible } from "./fonts";
import "./globals.css";

export const metadata: Metadata = {
  title: { default: "Heftwise", template: "%s · Heftwise" },
  description: "Manual-handling and lift-plan risk assessments for lineside and civils work.",
  applicationName: "Heftwise",
  appleWebApp: { capable: true, title: "Heftwise", statusBarStyle: "default" },
  icons: { apple: "/icons/apple-touch-icon.png" },
};

export const viewport: Viewport = { width: "device-width", initialScale: 1, themeColor: "#16302b" };

export default async function RootLayout({ children }: { children: React.ReactNode }) {
  // Every page is rendered per request: its scripts carry the nonce of that request's
  // Content-Security-Policy (proxy.ts), which cached HTML could not.
  await connection();
  return (
    <html lang="en-GB" className={hyperlegible.variable}>
      <body className="min-h-screen font-sans antialiased">{children}</body>
    </html>
  );
}
