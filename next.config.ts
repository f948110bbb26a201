import { withSerwist } from "@serwist/turbopack";
import type { NextConfig } from "next";

/**
 * Headers on every response. The Content-Security-Policy here only forbids framing (clickjacking);
 * a script policy with per-request nonces for Next.js's inline scripts is still to come.
 * HSTS only where the app is served over https (NEXTAUTH_URL), so a plain-http demo stays reachable.
 */
const securityHeaders = [
  { key: "Content-Security-Policy", value: "frame-ancestors 'none'" },
  { key: "X-Frame-Options", value: "DENY" },
  { key: "X-Content-Type-Options", value: "nosniff" },
  { key: "Referrer-Policy", value: "strict-origin-when-cross-origin" },
  { key: "Permissions-Policy", value: "camera=(), microphone=(), geolocation=(), payment=(), usb=()" },
  ...((process.env.NEXTAUTH_URL ?? "").startsWith("https://")
    ? [{ key: "Strict-Transport-Security", value: "max-age=31536000; includeSubDomains" }]
    : []),
];

const nextConfig: NextConfig = {
  async headers() {
    return [{ source: "/:path*", headers: securityHeaders }];
  },
  // PGlite ships WebAssembly and data files it loads relative to itself: keep it out of the bundle.
  serverExternalPackages: ["@electric-sql/pglite"],
  poweredByHeader: false,
  // forbidden() answers 403 with app/forbidden.tsx when a role lacks a page's permission.
  experimental: { authInterrupts: true },
};

// The service worker is bundled by a route handler (app/serwist/[path]/route.ts) with esbuild.
export default withSerwist(nextConfig);
