import { NextResponse } from "next/server";
import { importComponents, previewImport } from "@/assessments/load-register/service";
import { handler } from "@/lib/api";
import { requireApiActor } from "@/lib/auth/api";
import { AppError } from "@/lib/errors";

const MAX_CSV_BYTES = 1_000_000;

/** Body: the CSV file as text/csv. `?dryRun=1` answers the preview (each row and its errors) and writes nothing. */
export const POST = handler(async (request: Request) => {
  const actor = await requireApiActor("components:write");
  const type = request.headers.get("content-type") ?? "";
  if (!type.startsWith("text/csv") && !type.startsWith("text/plain")) throw new AppError("unsupported_media_type", "Send the file as text/csv");
  const csv = await request.text();
  if (Buffer.byteLength(csv) > MAX_CSV_BYTES) throw new AppError("payload_too_large", "The file is larger than 1 MB");
  if (new URL(request.url).searchParams.get("dryRun") === "1") return NextResponse.json(await previewImport(actor, csv));
  return NextResponse.json(await importComponents(actor, csv), { status: 201 });
});
