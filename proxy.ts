/**
 * Runs only for server-action requests (the matcher below asks for the `next-action` header), so
 * other requests pay nothing. A body declared larger than the server actions' limit gets a clear
 * 413 here, before Next.js reads it, instead of an error from inside the framework.
 * Authorization is never decided here: every action checks its caller itself.
 */
import { NextResponse, type NextRequest } from "next/server";

/** Next.js's default body limit for server actions (1 MB). */
export const SERVER_ACTION_BODY_LIMIT = 1024 * 1024;

export function proxy(request: NextRequest) {
  if (Number(request.headers.get("content-length") ?? "0") > SERVER_ACTION_BODY_LIMIT)
    return NextResponse.json({ error: { code: "payload_too_large", message: "The form sent more than 1 MB: shorten the text or send files separately." } }, { status: 413 });
  return NextResponse.next();
}

export const config = { matcher: [{ source: "/:path*", has: [{ type: "header", key: "next-action" }] }] };
