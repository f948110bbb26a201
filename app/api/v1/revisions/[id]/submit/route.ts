import { NextResponse } from "next/server";
import { submitRevision } from "@/assessments/revisions/approval";
import { handler, readJson } from "@/lib/api";
import { requireApiActor } from "@/lib/auth/api";

/** Submits a complete draft: `{version, approverId, reviewDate}`; 422 lists what is missing. */
export const POST = handler(async (request: Request, { params }: { params: Promise<{ id: string }> }) => {
  const actor = await requireApiActor("assessments:submit");
  const { id } = await params;
  const { mail } = await submitRevision(actor, id, await readJson(request));
  return NextResponse.json({ status: "submitted", mail });
});
