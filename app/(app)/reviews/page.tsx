import type { Metadata } from "next";
import Link from "next/link";
import { DataTable, EmptyState } from "@/app/_components/table";
import { listAwaitingReview } from "@/assessments/revisions/queries";
import { requirePermission } from "@/lib/auth/guard";
import { ukDate } from "@/lib/dates";

export const metadata: Metadata = { title: "For review" };

export default async function ReviewsPage() {
  const actor = await requirePermission("reviews:read");
  const rows = await listAwaitingReview(actor);
  return (
    <div className="space-y-4">
      <h1 className="text-2xl font-bold">For review</h1>
      <p className="text-sm text-muted">Assessments submitted to you for countersignature.</p>
      {rows.length === 0 ? (
        <EmptyState>Nothing is waiting for your countersignature.</EmptyState>
      ) : (
        <DataTable head={["Assessment", "Job", "Revision", "Submitted"]} caption="Awaiting review">
          {rows.map((r) => (
            <tr key={r.revisionId} className="border-t border-rule">
              <td className="px-3 py-2 font-bold">
                <Link href={`/reviews/${r.revisionId}`} className="text-accent underline">
                  {r.title}
                </Link>
              </td>
              <td className="px-3 py-2">{r.jobName}</td>
              <td className="px-3 py-2">{r.number}</td>
              <td className="px-3 py-2">{ukDate(r.submittedAt)}</td>
            </tr>
          ))}
        </DataTable>
      )}
    </div>
  );
}
