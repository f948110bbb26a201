import type { Metadata } from "next";
import Link from "next/link";
import { BandChip } from "@/app/_components/results/band";
import { DataTable, EmptyState } from "@/app/_components/table";
import { listAssessments } from "@/assessments/revisions/service";
import type { Band } from "@/assessments/rules/types";
import { requirePermission } from "@/lib/auth/guard";
import { can } from "@/lib/permissions";

export const metadata: Metadata = { title: "Assessments" };

const STATUS_LABELS = { draft: "Draft", submitted: "Submitted", approved: "Approved", superseded: "Superseded" } as const;

export default async function AssessmentsPage() {
  const actor = await requirePermission("assessments:read");
  const rows = await listAssessments(actor);
  return (
    <div className="space-y-4">
      <div className="flex flex-wrap items-center justify-between gap-3">
        <h1 className="text-2xl font-bold">Assessments</h1>
        {can(actor, "assessments:write") && (
          <Link href="/assessments/new" className="rounded bg-accent px-4 py-2 font-bold text-white">
            New assessment
          </Link>
        )}
      </div>
      {rows.length === 0 ? (
        <EmptyState>No assessments yet. Start one from a template of a common job.</EmptyState>
      ) : (
        <DataTable head={["Assessment", "Job", "Revision", "Status", "Worst band", "Author", "Last saved"]} caption="Assessments">
          {rows.map((r) => (
            <tr key={r.revisionId} className="border-t border-rule">
              <td className="px-3 py-2 font-bold">
                <Link href={`/revisions/${r.revisionId}`} className="text-accent underline">
                  {r.title}
                </Link>
              </td>
              <td className="px-3 py-2">{r.jobName}</td>
              <td className="px-3 py-2">{r.number}</td>
              <td className="px-3 py-2">{STATUS_LABELS[r.status]}</td>
              <td className="px-3 py-2">
                <BandChip band={(r.worstBand as Band | null) ?? null} />
              </td>
              <td className="px-3 py-2">{r.authorName ?? "—"}</td>
              <td className="px-3 py-2">{r.updatedAt.toISOString().slice(0, 16).replace("T", " ")}</td>
            </tr>
          ))}
        </DataTable>
      )}
    </div>
  );
}
