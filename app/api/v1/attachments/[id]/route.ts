import { NextResponse } from "next/server";
import { readAttachment, removeAttachment } from "@/assessments/load-register/service";
import { handler } from "@/lib/api";
import { requireApiActor } from "@/lib/auth/api";

type Context = { params: Promise<{ id: string }> };

export const GET = handler(async (_request: Request, { params }: Context) => {
  const actor = await requireApiActor("components:read");
  const file = await readAttachment(actor, (await params).id);
  return new Response(Buffer.from(file.data), {
    headers: {
      "content-type": file.contentType,
      "content-disposition": `attachment; filename*=UTF-8''${encodeURIComponent(file.filename)}`,
      "x-content-type-options": "nosniff",
    },
  });
});

export const DELETE = handler(async (_request: Request, { params }: Context) => {
  const actor = await requireApiActor("components:write");
  await removeAttachment(actor, (await params).id);
  return new NextResponse(null, { status: 204 });
});
