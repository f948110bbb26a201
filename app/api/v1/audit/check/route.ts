import { NextResponse } from "next/server";
import { checkAuditChain } from "@/assessments/audit-trail/queries";
import { handler } from "@/lib/api";
import { requireApiActor } from "@/lib/auth/api";

/** Checks the organisation's audit chain: intact with its head, or the first broken link. */
export const GET = handler(async () => {
  const actor = await requireApiActor("audit:read");
  return NextResponse.json(await checkAuditChain(actor));
});
