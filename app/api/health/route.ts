import { NextResponse } from "next/server";

/**
 * Liveness for a load balancer or a supervisor: the process answers. Public, reads nothing, says
 * nothing about the installation. (Also the framework's own floor in `npm run bench:api`.)
 */
export function GET() {
  return NextResponse.json({ status: "ok" });
}
