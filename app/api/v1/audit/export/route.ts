import { exportAuditCsv } from "@/assessments/audit-trail/queries";
import { handler } from "@/lib/api";
import { requireApiActor } from "@/lib/auth/api";

/** The organisation's whole audit trail as CSV, streamed oldest first. */
export const GET = handler(async () => {
  const actor = await requireApiActor("audit:read");
  const rows = exportAuditCsv(actor);
  const encoder = new TextEncoder();
  const stream = new ReadableStream<Uint8Array>({
    async pull(controller) {
      const next = await rows.next();
      if (next.done) controller.close();
      else controller.enqueue(encoder.encode(next.value));
    },
  });
  return new Response(stream, {
    headers: {
      "content-type": "text/csv; charset=utf-8",
      "content-disposition": `attachment; filename="heftwise-audit-trail-${new Date().toISOString().slice(0, 10)}.csv"`,
    },
  });
});
