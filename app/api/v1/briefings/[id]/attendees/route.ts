import { NextResponse } from "next/server";
import { recordAttendee } from "@/assessments/briefing/service";
import { handler, readJson } from "@/lib/api";
import { requireApiActor } from "@/lib/auth/api";

/** One sign-on: `{key, name, employer, cardNumber, signature, signedAt}`. The same key twice records it once (200, duplicate). */
export const POST = handler(async (request: Request, { params }: { params: Promise<{ id: string }> }) => {
  const actor = await requireApiActor("briefings:run");
  const result = await recordAttendee(actor, (await params).id, await readJson(request));
  return NextResponse.json(result, { status: result.duplicate ? 200 : 201 });
});
