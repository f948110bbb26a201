import { NextResponse } from "next/server";
import { startBriefing } from "@/assessments/briefing/service";
import { handler, readJson } from "@/lib/api";
import { requireApiActor } from "@/lib/auth/api";

/** Starts a briefing against an approved revision of one of the foreman's jobs: `{revisionId, place}`. */
export const POST = handler(async (request: Request) => {
  const actor = await requireApiActor("briefings:run");
  return NextResponse.json(await startBriefing(actor, await readJson(request)), { status: 201 });
});
