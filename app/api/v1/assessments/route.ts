import { NextResponse } from "next/server";
import { createAssessment } from "@/assessments/revisions/service";
import { listAssessmentsPage } from "@/assessments/revisions/queries";
import { handler, readJson } from "@/lib/api";
import { queryOf, requireApiActor } from "@/lib/auth/api";

/** The latest revision of each assessment: `?q=&status=&jobId=&worstBand=&authorId=&sort=&limit=&cursor=`. */
export const GET = handler(async (request: Request) => {
  const actor = await requireApiActor("assessments:read");
  return NextResponse.json(await listAssessmentsPage(actor, queryOf(request)));
});

/** Creates an assessment and its first draft revision: `{jobId, title, templateId?}`. */
export const POST = handler(async (request: Request) => {
  const actor = await requireApiActor("assessments:write");
  return NextResponse.json(await createAssessment(actor, await readJson(request)), { status: 201 });
});
