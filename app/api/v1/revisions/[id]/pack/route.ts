import { getPackFile } from "@/assessments/revisions/approval";
import { handler } from "@/lib/api";
import { getActor } from "@/lib/auth/session";

/** The revision's pack PDF (signed once approved). Who may read it is decided by getPackFile. */
export const GET = handler(async (_request: Request, { params }: { params: Promise<{ id: string }> }) => {
  const file = await getPackFile(await getActor(), (await params).id);
  return new Response(Buffer.from(file.data), {
    headers: {
      "content-type": "application/pdf",
      "content-disposition": `attachment; filename="${file.filename}"`,
      "cache-control": "private, no-store",
    },
  });
});
