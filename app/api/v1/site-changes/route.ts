import { NextResponse } from "next/server";
import { createSiteChangeNote } from "@/assessments/briefing/service";
import { formFile, handler, readForm } from "@/lib/api";
import { requireApiActor } from "@/lib/auth/api";

/** A site change note as multipart/form-data: `revisionId`, `text`, optional `photo`. */
export const POST = handler(async (request: Request) => {
  const actor = await requireApiActor("site-notes:create");
  const form = await readForm(request, 11 * 1024 * 1024, "Send the note as multipart/form-data");
  const result = await createSiteChangeNote(
    actor,
    { revisionId: form.get("revisionId"), text: form.get("text") },
    await formFile(form, "photo"),
  );
  return NextResponse.json(result, { status: 201 });
});
