import { NextResponse } from "next/server";
import { removeTask, replaceTask } from "@/assessments/revisions/service";
import { handler, readJson } from "@/lib/api";
import { requireApiActor } from "@/lib/auth/api";

type Context = { params: Promise<{ id: string; taskId: string }> };

/** Replaces a task: `{version, task}`. */
export const PUT = handler(async (request: Request, { params }: Context) => {
  const actor = await requireApiActor("assessments:write");
  const { id, taskId } = await params;
  return NextResponse.json(await replaceTask(actor, id, taskId, await readJson(request)));
});

/** Removes a task: `{version}`. */
export const DELETE = handler(async (request: Request, { params }: Context) => {
  const actor = await requireApiActor("assessments:write");
  const { id, taskId } = await params;
  return NextResponse.json(await removeTask(actor, id, taskId, await readJson(request)));
});
