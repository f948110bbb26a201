import { briefingSheetPdf } from "@/assessments/briefing/service";
import { handler } from "@/lib/api";
import { requireApiActor } from "@/lib/auth/api";

/** The briefing sheet PDF; `?briefing=ID` adds that briefing's record. */
export const GET = handler(async (request: Request, { params }: { params: Promise<{ id: string }> }) => {
  const actor = await requireApiActor("briefings:run");
  const briefingId = new URL(request.url).searchParams.get("briefing") ?? undefined;
  const sheet = await briefingSheetPdf(actor, (await params).id, briefingId);
  return new Response(Buffer.from(sheet.data), {
    headers: {
      "content-type": "application/pdf",
      "content-disposition": `attachment; filename="${sheet.filename}"`,
      "cache-control": "private, no-store",
    },
  });
});
