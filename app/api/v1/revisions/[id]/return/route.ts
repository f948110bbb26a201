import { NextResponse } from "next/server";
import { returnRevision } from "@/assessments/revisions/approval";
import { handler, readJson } from "@/lib/api";
import { requireApiActor } from "@/lib/auth/api";

/** Returns to the author: `{version, comments: {scope?, sequence?, loads?, hazards?, people?, emergency?}}`. */
export const POST = handler(async (request: Request, { params }: { params: Promise<{ id: string }> }) => {
  const actor = await requireApiActor("reviews:decide");
  const { id } = await params;
  return NextResponse.json({ status: "draft", ...(await returnRevision(actor, id, await readJson(request))) });
});
