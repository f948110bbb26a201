import { NextResponse } from "next/server";
import { startBriefing } from "@/assessments/briefing/service";
import { handler, readJson } from "@/lib/api";
import { requireApiActor } from "@/lib/auth/api";

/**
 * Starts a briefing against an approved revision of one of the foreman's jobs:
 * `{revisionId, place, key?, startedAt?}`. The same key again answers 200 with the same briefing.
 */
export const POST = handler(async (request: Request) => {
  const actor = await requireApiActor("briefings:run");
  const started = await startBriefing(actor, await readJson(request));
  return NextResponse.json(started, { status: started.duplicate ? 200 : 201 });
});
