import type { Metadata } from "next";
import { DataTable, EmptyState } from "@/app/_components/table";
import { listBriefable } from "@/assessments/revisions/queries";
import { requirePermission } from "@/lib/auth/guard";

export const metadata: Metadata = { title: "Briefings" };

export default async function BriefingsPage() {
  const actor = await requirePermission("briefings:run");
  const rows = await listBriefable(actor);
  return (
    <div className="space-y-4">
      <h1 className="text-2xl font-bold">Briefings</h1>
      <p className="text-sm text-muted">Approved assessments you can brief the gang from. Drafts never appear here.</p>
      {rows.length === 0 ? (
        <EmptyState>No approved assessment is ready to brief yet.</EmptyState>
      ) : (
        <DataTable head={["Assessment", "Job", "Revision", "Review by"]} caption="Approved assessments">
          {rows.map((r) => (
            <tr key={r.revisionId} className="border-t border-rule">
              <td className="px-3 py-2 font-bold">{r.title}</td>
              <td className="px-3 py-2">{r.jobName}</td>
              <td className="px-3 py-2">{r.number}</td>
              <td className="px-3 py-2">{r.reviewDate ?? "—"}</td>
            </tr>
          ))}
        </DataTable>
      )}
    </div>
  );
}
