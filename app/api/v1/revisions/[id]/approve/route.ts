import { NextResponse } from "next/server";
import { approveRevision } from "@/assessments/revisions/approval";
import { handler, readJson } from "@/lib/api";
import { requireApiActor } from "@/lib/auth/api";

/** Countersigns: `{version, name, role, signature}` (signature: a PNG data URL of the drawn signature). */
export const POST = handler(async (request: Request, { params }: { params: Promise<{ id: string }> }) => {
  const actor = await requireApiActor("reviews:decide");
  const { id } = await params;
  return NextResponse.json({ status: "approved", ...(await approveRevision(actor, id, await readJson(request))) });
});
