import type { NextConfig } from "next";

const nextConfig: NextConfig = {
  // PGlite ships WebAssembly and data files it loads relative to itself: keep it out of the bundle.
  serverExternalPackages: ["@electric-sql/pglite"],
  poweredByHeader: false,
  // forbidden() answers 403 with app/forbidden.tsx when a role lacks a page's permission.
  experimental: { authInterrupts: true },
};

export default nextConfig;
