import { NextResponse } from "next/server";
import { listJobsPage } from "@/assessments/jobs/queries";
import { createJob } from "@/assessments/jobs/service";
import { handler, readJson } from "@/lib/api";
import { queryOf, requireApiActor } from "@/lib/auth/api";

export const GET = handler(async (request: Request) => {
  const actor = await requireApiActor("jobs:read");
  return NextResponse.json(await listJobsPage(actor, queryOf(request)));
});

export const POST = handler(async (request: Request) => {
  const actor = await requireApiActor("jobs:write");
  return NextResponse.json(await createJob(actor, await readJson(request)), { status: 201 });
});
