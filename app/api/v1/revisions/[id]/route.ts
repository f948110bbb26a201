import { NextResponse } from "next/server";
import { getRevision, saveRevision } from "@/assessments/revisions/service";
import { handler, readJson } from "@/lib/api";
import { getActor } from "@/lib/auth/session";
import { authorize } from "@/lib/permissions";

type Context = { params: Promise<{ id: string }> };

export const GET = handler(async (_request: Request, { params }: Context) => {
  const { id } = await params;
  const { revision, assessment, job, content } = await getRevision(await getActor(), id);
  return NextResponse.json({
    id: revision.id,
    assessmentId: assessment.id,
    title: assessment.title,
    job: { id: job.id, name: job.name },
    number: revision.number,
    status: revision.status,
    version: revision.version,
    worstBand: revision.worstBand,
    content,
    results: revision.results,
  });
});

/** Saves the draft: `{version, content}`; a stale version answers 409. */
export const PUT = handler(async (request: Request, { params }: Context) => {
  const { id } = await params;
  const actor = await getActor();
  authorize(actor, "assessments:write"); // before reading the body: no session, no parsing
  const body = await readJson(request);
  return NextResponse.json(await saveRevision(actor, id, body));
});
