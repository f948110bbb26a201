import { NextResponse } from "next/server";
import { addAttachment, getComponent, MAX_ATTACHMENT_BYTES } from "@/assessments/load-register/service";
import { formFile, handler, readForm } from "@/lib/api";
import { requireApiActor } from "@/lib/auth/api";
import { AppError } from "@/lib/errors";

/** Upload one file as multipart/form-data, field `file`. */
export const POST = handler(async (request: Request, { params }: { params: Promise<{ id: string }> }) => {
  const actor = await requireApiActor("components:write");
  const { id } = await params;
  await getComponent(actor, id);
  const form = await readForm(
    request,
    MAX_ATTACHMENT_BYTES + 64 * 1024,
    "Send the file as multipart/form-data in a field named file",
  );
  const file = await formFile(form, "file");
  if (!file) throw new AppError("validation", "Choose a file", [{ path: "file", message: "Choose a file" }]);
  const row = await addAttachment(actor, id, file);
  return NextResponse.json(row, { status: 201 });
});
