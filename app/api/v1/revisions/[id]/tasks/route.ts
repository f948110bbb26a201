import { NextResponse } from "next/server";
import { addTask, listTasks } from "@/assessments/revisions/service";
import { handler, readJson } from "@/lib/api";
import { requireApiActor } from "@/lib/auth/api";

type Context = { params: Promise<{ id: string }> };

/** The draft's tasks, each with its score. */
export const GET = handler(async (_request: Request, { params }: Context) => {
  const actor = await requireApiActor("assessments:read");
  return NextResponse.json(await listTasks(actor, (await params).id));
});

/** Adds a task: `{version, task}`; answers the new version. */
export const POST = handler(async (request: Request, { params }: Context) => {
  const actor = await requireApiActor("assessments:write");
  const { id } = await params;
  return NextResponse.json(await addTask(actor, id, await readJson(request)), { status: 201 });
});
