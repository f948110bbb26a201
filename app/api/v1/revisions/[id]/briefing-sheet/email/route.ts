import { NextResponse } from "next/server";
import { emailBriefingSheet } from "@/assessments/briefing/service";
import { handler } from "@/lib/api";
import { requireApiActor } from "@/lib/auth/api";

/** E-mails the briefing sheet to the signed-in foreman. */
export const POST = handler(async (_request: Request, { params }: { params: Promise<{ id: string }> }) => {
  const actor = await requireApiActor("briefings:run");
  return NextResponse.json({ mail: await emailBriefingSheet(actor, (await params).id) });
});
