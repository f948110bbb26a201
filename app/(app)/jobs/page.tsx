import type { Metadata } from "next";
import Link from "next/link";
import { ActionLink, PageHeader } from "@/app/_components/page-header";
import { DataTable, EmptyState } from "@/app/_components/table";
import { listJobs } from "@/assessments/jobs/queries";
import { requirePermission } from "@/lib/auth/guard";
import { can } from "@/lib/permissions";

export const metadata: Metadata = { title: "Jobs" };

export default async function JobsPage() {
  const actor = await requirePermission("jobs:read");
  const rows = await listJobs(actor);
  return (
    <div className="space-y-4">
      <PageHeader title="Jobs">
        {can(actor, "jobs:write") && <ActionLink href="/jobs/new">New job</ActionLink>}
      </PageHeader>
      {rows.length === 0 ? (
        <EmptyState>No jobs yet.</EmptyState>
      ) : (
        <DataTable head={["Job", "Client", "Location", "Line and mileage", "Access point", "Emergency"]} caption="Jobs">
          {rows.map((job) => (
            <tr key={job.id} className="border-t border-rule align-top">
              <td className="px-3 py-2 font-bold">
                {can(actor, "jobs:write") ? (
                  <Link href={`/jobs/${job.id}/edit`} className="text-accent underline">
                    {job.name}
                  </Link>
                ) : (
                  job.name
                )}
              </td>
              <td className="px-3 py-2">{job.client}</td>
              <td className="px-3 py-2">{job.location}</td>
              <td className="px-3 py-2">{[job.lineReference, job.mileage].filter(Boolean).join(" · ") || "—"}</td>
              <td className="px-3 py-2">{job.accessPoint ?? "—"}</td>
              <td className="px-3 py-2">
                {job.nearestHospital ?? "—"}
                {job.siteContactName && (
                  <div className="text-muted">
                    Site contact: {job.siteContactName} {job.siteContactPhone}
                  </div>
                )}
              </td>
            </tr>
          ))}
        </DataTable>
      )}
    </div>
  );
}
