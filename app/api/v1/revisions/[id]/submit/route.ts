import { NextResponse } from "next/server";
import { submitRevision } from "@/assessments/revisions/service";
import { handler, readJson } from "@/lib/api";
import { getActor } from "@/lib/auth/session";
import { authorize } from "@/lib/permissions";

export const POST = handler(async (request: Request, { params }: { params: Promise<{ id: string }> }) => {
  const { id } = await params;
  const actor = await getActor();
  authorize(actor, "assessments:submit"); // before reading the body: no session, no parsing
  await submitRevision(actor, id, await readJson(request));
  return NextResponse.json({ status: "submitted" });
});
