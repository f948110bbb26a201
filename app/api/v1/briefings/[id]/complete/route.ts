import { NextResponse } from "next/server";
import { completeBriefing } from "@/assessments/briefing/service";
import { handler, readJson } from "@/lib/api";
import { requireApiActor } from "@/lib/auth/api";

/** The foreman signs last: `{signature, key?, signedAt?}`. The same key again is the same sign-off (duplicate). */
export const POST = handler(async (request: Request, { params }: { params: Promise<{ id: string }> }) => {
  const actor = await requireApiActor("briefings:run");
  const { duplicate } = await completeBriefing(actor, (await params).id, await readJson(request));
  return NextResponse.json({ status: "completed", duplicate });
});
