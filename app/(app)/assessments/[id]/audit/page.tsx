import type { Metadata } from "next";
import { DataTable } from "@/app/_components/table";
import { listAssessmentAudit } from "@/assessments/revisions/approval";
import { describeEventAuth, LIFE_EVENTS } from "@/assessments/revisions/signing-record";
import { requirePermission } from "@/lib/auth/guard";
import { foundOr404 } from "@/lib/pages";
import { ukDateTime } from "@/lib/dates";

export const metadata: Metadata = { title: "Audit trail" };

export default async function AuditPage({ params }: { params: Promise<{ id: string }> }) {
  const actor = await requirePermission("assessments:read");
  const { id } = await params;
  const { assessment, events } = await foundOr404(listAssessmentAudit(actor, id));
  return (
    <div className="space-y-4">
      <h1 className="text-2xl font-bold">Audit trail: {assessment.title}</h1>
      <p className="text-sm text-muted">
        Every event of every revision: who, when, how they were authenticated, and the SHA-256 of the content at that
        moment. The number and event hash are the event&apos;s place in the organisation&apos;s tamper-evident chain, as
        printed in each signed pack&apos;s signing record.
      </p>
      <DataTable
        head={["No.", "When", "Revision", "What", "Who", "How authenticated", "Content / event hash"]}
        caption="Audit trail"
      >
        {events.map((e) => (
          <tr key={e.id} className="border-t border-rule align-top">
            <td className="px-3 py-2 tabular-nums">{e.seq}</td>
            <td className="px-3 py-2 tabular-nums">{ukDateTime(e.createdAt)}</td>
            <td className="px-3 py-2">{e.revision}</td>
            <td className="px-3 py-2">{LIFE_EVENTS[e.action] ?? e.action}</td>
            <td className="px-3 py-2">{e.actorName ?? "—"}</td>
            <td className="px-3 py-2 text-sm">{describeEventAuth(e.action, e.details)}</td>
            <td className="px-3 py-2 font-mono text-xs break-all">
              {e.contentHash?.slice(0, 12) ?? "—"} / {e.hash?.slice(0, 12) ?? "—"}
            </td>
          </tr>
        ))}
      </DataTable>
    </div>
  );
}
