import { NextResponse } from "next/server";
import { createSiteChangeNote } from "@/assessments/briefing/service";
import { handler } from "@/lib/api";
import { requireApiActor } from "@/lib/auth/api";
import { AppError } from "@/lib/errors";

/** A site change note as multipart/form-data: `revisionId`, `text`, optional `photo`. */
export const POST = handler(async (request: Request) => {
  const actor = await requireApiActor("site-notes:create");
  if (!(request.headers.get("content-type") ?? "").startsWith("multipart/form-data")) throw new AppError("unsupported_media_type", "Send the note as multipart/form-data");
  if (Number(request.headers.get("content-length") ?? "0") > 11 * 1024 * 1024) throw new AppError("payload_too_large", "Photos can be at most 10 MB");
  const form = await request.formData().catch(() => {
    throw new AppError("bad_request", "The note could not be read");
  });
  const photo = form.get("photo");
  const file = photo instanceof File && photo.size > 0 ? { name: photo.name, data: new Uint8Array(await photo.arrayBuffer()) } : undefined;
  const result = await createSiteChangeNote(actor, { revisionId: form.get("revisionId"), text: form.get("text") }, file);
  return NextResponse.json(result, { status: 201 });
});
