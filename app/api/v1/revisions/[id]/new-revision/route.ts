import { NextResponse } from "next/server";
import { startNewRevision } from "@/assessments/revisions/approval";
import { handler } from "@/lib/api";
import { requireApiActor } from "@/lib/auth/api";

/** Starts a draft copy of an approved revision. */
export const POST = handler(async (_request: Request, { params }: { params: Promise<{ id: string }> }) => {
  const actor = await requireApiActor("assessments:write");
  return NextResponse.json(await startNewRevision(actor, (await params).id), { status: 201 });
});
