/**
 * Next.js's proxy, for two jobs, each limited by the matcher so other requests pay nothing:
 * - pages: a Content-Security-Policy with a fresh nonce per request. Next.js reads the nonce from
 *   the request's policy and puts it on its own scripts; 'strict-dynamic' lets those load the rest.
 *   No 'unsafe-eval' (only in development, where React needs it). Pages are rendered per request
 *   (app/layout.tsx), since a nonce cannot live in cached HTML;
 * - server actions: one from another site's page gets 403, and a body declared larger than their
 *   limit a clear 413, before Next.js reads it.
 * Authorization is never decided here: every page, action and route handler checks its caller.
 */
import { NextResponse, type NextRequest } from "next/server";
import { refuseCrossSite } from "@/lib/api";
import { AppError } from "@/lib/errors";

/** Next.js's default body limit for server actions (1 MB). */
export const SERVER_ACTION_BODY_LIMIT = 1024 * 1024;

export function contentSecurityPolicy(nonce: string, development = process.env.NODE_ENV === "development"): string {
  return [
    "default-src 'self'",
    `script-src 'self' 'nonce-${nonce}' 'strict-dynamic'${development ? " 'unsafe-eval'" : ""}`,
    // React and the charts set style attributes; styles cannot run code.
    "style-src 'self' 'unsafe-inline'",
    "img-src 'self' data: blob:",
    "font-src 'self'",
    "connect-src 'self'",
    // The service worker (app/sw.ts) and the web app manifest come from this site only.
    "worker-src 'self'",
    "manifest-src 'self'",
    "object-src 'none'",
    "base-uri 'self'",
    "form-action 'self'",
    "frame-ancestors 'none'",
  ].join("; ");
}

export function proxy(request: NextRequest) {
  if (request.headers.has("next-action")) {
    // The same rule as every route handler: a write from another site's page is refused, with 403.
    try {
      refuseCrossSite(request, new URL(process.env.NEXTAUTH_URL ?? request.nextUrl.origin).origin);
    } catch (err) {
      if (err instanceof AppError) return NextResponse.json(err.toJSON(), { status: err.status });
      throw err;
    }
    if (Number(request.headers.get("content-length") ?? "0") > SERVER_ACTION_BODY_LIMIT)
      return NextResponse.json(
        {
          error: {
            code: "payload_too_large",
            message: "The form sent more than 1 MB: shorten the text or send files separately.",
          },
        },
        { status: 413 },
      );
  }
  const nonce = Buffer.from(crypto.randomUUID()).toString("base64");
  const policy = contentSecurityPolicy(nonce);
  const headers = new Headers(request.headers);
  headers.set("content-security-policy", policy);
  const response = NextResponse.next({ request: { headers } });
  response.headers.set("content-security-policy", policy);
  return response;
}

export const config = {
  matcher: [
    { source: "/:path*", has: [{ type: "header", key: "next-action" }] },
    // Pages, not the API, static files or prefetches.
    {
      source: "/((?!api/|_next/static|_next/image|favicon.ico|icon.svg).*)",
      missing: [
        { type: "header", key: "next-router-prefetch" },
        { type: "header", key: "purpose", value: "prefetch" },
      ],
    },
  ],
};
