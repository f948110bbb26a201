import { NextResponse } from "next/server";
import { importComponents, previewImport } from "@/assessments/load-register/service";
import { handler, readText } from "@/lib/api";
import { requireApiActor } from "@/lib/auth/api";

const MAX_CSV_BYTES = 1_000_000;

/** Body: the CSV file as text/csv. `?dryRun=1` answers the preview (each row and its errors) and writes nothing. */
export const POST = handler(async (request: Request) => {
  const actor = await requireApiActor("components:write");
  const csv = await readText(request, ["text/csv", "text/plain"], MAX_CSV_BYTES, "Send the file as text/csv");
  if (new URL(request.url).searchParams.get("dryRun") === "1")
    return NextResponse.json(await previewImport(actor, csv));
  return NextResponse.json(await importComponents(actor, csv), { status: 201 });
});
