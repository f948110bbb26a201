import type { Metadata } from "next";
import { DataTable } from "@/app/_components/table";
import { listAssessmentAudit } from "@/assessments/revisions/approval";
import { requirePermission } from "@/lib/auth/guard";
import { foundOr404 } from "@/lib/pages";

export const metadata: Metadata = { title: "Audit trail" };

const ACTIONS: Record<string, string> = {
  "assessment.created": "Created",
  "revision.submitted": "Submitted for approval",
  "revision.approved": "Approved and countersigned",
  "revision.returned": "Returned with comments",
  "revision.superseded": "Superseded",
  "revision.started": "New revision started",
};

export default async function AuditPage({ params }: { params: Promise<{ id: string }> }) {
  const actor = await requirePermission("assessments:read");
  const { id } = await params;
  const { assessment, events } = await foundOr404(listAssessmentAudit(actor, id));
  return (
    <div className="space-y-4">
      <h1 className="text-2xl font-bold">Audit trail: {assessment.title}</h1>
      <p className="text-sm text-muted">
        Every transition of every revision: who, when, what, and the SHA-256 of the content at that moment.
      </p>
      <DataTable head={["When (UTC)", "Revision", "What", "Who", "Content hash"]} caption="Audit trail">
        {events.map((e) => (
          <tr key={e.id} className="border-t border-rule align-top">
            <td className="px-3 py-2 tabular-nums">{e.createdAt.toISOString().slice(0, 19).replace("T", " ")}</td>
            <td className="px-3 py-2">{e.revision}</td>
            <td className="px-3 py-2">{ACTIONS[e.action] ?? e.action}</td>
            <td className="px-3 py-2">{e.actorName ?? "—"}</td>
            <td className="px-3 py-2 font-mono text-xs break-all">{e.contentHash ?? "—"}</td>
          </tr>
        ))}
      </DataTable>
    </div>
  );
}
