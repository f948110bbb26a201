import { NextResponse } from "next/server";
import { getJob, updateJob } from "@/assessments/jobs/service";
import { handler, readJson } from "@/lib/api";
import { requireApiActor } from "@/lib/auth/api";

type Context = { params: Promise<{ id: string }> };

export const GET = handler(async (_request: Request, { params }: Context) => {
  const actor = await requireApiActor("jobs:read");
  return NextResponse.json(await getJob(actor, (await params).id));
});

export const PUT = handler(async (request: Request, { params }: Context) => {
  const actor = await requireApiActor("jobs:write");
  const { id } = await params;
  return NextResponse.json(await updateJob(actor, id, await readJson(request)));
});
