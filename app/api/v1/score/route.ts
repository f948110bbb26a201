import { NextResponse } from "next/server";
import { scoreUnknown } from "@/assessments/rules";
import { handler, readJson } from "@/lib/api";
import { requireApiActor } from "@/lib/auth/api";

const MAX_BATCH = 500;

/** Scores one request or an array of them; the body and answer are the scoring CLI's JSON. */
export const POST = handler(async (request: Request) => {
  await requireApiActor("score:use");
  const body = await readJson(request);
  if (Array.isArray(body)) {
    if (body.length > MAX_BATCH)
      return NextResponse.json(
        { error: { code: "payload_too_large", message: `At most ${MAX_BATCH} requests in one batch` } },
        { status: 413 },
      );
    const results = body.map(scoreUnknown);
    return NextResponse.json(results, { status: results.some((r) => "error" in r) ? 422 : 200 });
  }
  const result = scoreUnknown(body);
  if ("error" in result) return NextResponse.json({ error: { code: "validation", ...result.error } }, { status: 422 });
  return NextResponse.json(result);
});
