import { NextResponse } from "next/server";
import { createComponent } from "@/assessments/load-register/service";
import { listComponentsPage } from "@/assessments/load-register/queries";
import { handler, readJson } from "@/lib/api";
import { queryOf, requireApiActor } from "@/lib/auth/api";

export const GET = handler(async (request: Request) => {
  const actor = await requireApiActor("components:read");
  return NextResponse.json(await listComponentsPage(actor, queryOf(request)));
});

export const POST = handler(async (request: Request) => {
  const actor = await requireApiActor("components:write");
  return NextResponse.json(await createComponent(actor, await readJson(request)), { status: 201 });
});
