import { NextResponse } from "next/server";
import { getRevision, saveRevision } from "@/assessments/revisions/service";
import { handler, readJson } from "@/lib/api";
import { requireApiActor } from "@/lib/auth/api";

type Context = { params: Promise<{ id: string }> };

export const GET = handler(async (_request: Request, { params }: Context) => {
  const actor = await requireApiActor("assessments:read");
  const { revision, assessment, job, content } = await getRevision(actor, (await params).id);
  return NextResponse.json({
    id: revision.id,
    assessmentId: assessment.id,
    title: assessment.title,
    job: { id: job.id, name: job.name },
    number: revision.number,
    status: revision.status,
    version: revision.version,
    worstBand: revision.worstBand,
    reviewDate: revision.reviewDate,
    content,
    results: revision.results,
  });
});

/** Saves the draft: `{version, content}`; a stale version or a locked revision answers 409. */
export const PUT = handler(async (request: Request, { params }: Context) => {
  const actor = await requireApiActor("assessments:write");
  const { id } = await params;
  return NextResponse.json(await saveRevision(actor, id, await readJson(request)));
});
