import { NextResponse } from "next/server";
import { verifyPack } from "@/assessments/revisions/approval";
import { formFile, handler, readForm } from "@/lib/api";
import { AppError } from "@/lib/errors";

export const MAX_VERIFY_BYTES = 20 * 1024 * 1024;

/**
 * Public: anyone holding a pack may check it. Upload as multipart/form-data (`file`); only PDFs,
 * at most 20 MB. The answer names the revision only for a pack Heftwise issued or an altered copy of one.
 */
export const POST = handler(async (request: Request) => {
  const form = await readForm(request, MAX_VERIFY_BYTES + 64 * 1024, "Upload the PDF as multipart/form-data");
  const file = await formFile(form, "file");
  if (!file || file.data.byteLength === 0)
    throw new AppError("validation", "Choose a PDF", [{ path: "file", message: "Choose a PDF" }]);
  if (file.data.byteLength > MAX_VERIFY_BYTES) throw new AppError("payload_too_large", "The file is larger than 20 MB");
  const { data } = file;
  if (Buffer.from(data.subarray(0, 5)).toString("latin1") !== "%PDF-")
    throw new AppError("unsupported_media_type", "This file is not a PDF");
  return NextResponse.json(await verifyPack(data));
});
