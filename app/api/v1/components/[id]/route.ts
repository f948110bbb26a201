import { NextResponse } from "next/server";
import { getComponent, updateComponent } from "@/assessments/load-register/service";
import { handler, readJson } from "@/lib/api";
import { requireApiActor } from "@/lib/auth/api";

type Context = { params: Promise<{ id: string }> };

export const GET = handler(async (_request: Request, { params }: Context) => {
  const actor = await requireApiActor("components:read");
  return NextResponse.json(await getComponent(actor, (await params).id));
});

export const PUT = handler(async (request: Request, { params }: Context) => {
  const actor = await requireApiActor("components:write");
  const { id } = await params;
  return NextResponse.json(await updateComponent(actor, id, await readJson(request)));
});
