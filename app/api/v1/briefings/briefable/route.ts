import { NextResponse } from "next/server";
import { listBriefableRevisions } from "@/assessments/briefing/queries";
import { handler } from "@/lib/api";
import { requireApiActor } from "@/lib/auth/api";

/** The approved revisions the foreman can brief from, for the copies a phone keeps while it has signal. */
export const GET = handler(async () => {
  const actor = await requireApiActor("briefings:run");
  return NextResponse.json(await listBriefableRevisions(actor), { headers: { "cache-control": "no-store" } });
});
