import { NextResponse } from "next/server";
import { setJobForemen } from "@/assessments/briefing/service";
import { listForemen } from "@/assessments/briefing/queries";
import { handler, readJson } from "@/lib/api";
import { requireApiActor } from "@/lib/auth/api";

type Context = { params: Promise<{ id: string }> };

export const GET = handler(async (_request: Request, { params }: Context) => {
  const actor = await requireApiActor("jobs:write");
  return NextResponse.json({ foremen: await listForemen(actor, (await params).id) });
});

/** Assigns the job's foremen: `{foremanIds}`. */
export const PUT = handler(async (request: Request, { params }: Context) => {
  const actor = await requireApiActor("jobs:write");
  await setJobForemen(actor, (await params).id, await readJson(request));
  return NextResponse.json({ status: "saved" });
});
