import { NextResponse } from "next/server";
import { createAssessment, listAssessments } from "@/assessments/revisions/service";
import { handler, readJson } from "@/lib/api";
import { getActor } from "@/lib/auth/session";
import { authorize } from "@/lib/permissions";

export const GET = handler(async () => NextResponse.json({ items: await listAssessments(await getActor()) }));

export const POST = handler(async (request: Request) => {
  const actor = await getActor();
  authorize(actor, "assessments:write"); // before reading the body: no session, no parsing
  const created = await createAssessment(actor, await readJson(request));
  return NextResponse.json(created, { status: 201 });
});
