import type { Metadata } from "next";
import { DataTable, EmptyState } from "@/app/_components/table";
import { listJobs } from "@/assessments/jobs/queries";
import Link from "next/link";
import { requirePermission } from "@/lib/auth/guard";
import { can } from "@/lib/permissions";

export const metadata: Metadata = { title: "Jobs" };

export default async function JobsPage() {
  const actor = await requirePermission("jobs:read");
  const rows = await listJobs(actor);
  return (
    <div className="space-y-4">
      <div className="flex flex-wrap items-center justify-between gap-3">
        <h1 className="text-2xl font-bold">Jobs</h1>
        {can(actor, "jobs:write") && (
          <Link href="/jobs/new" className="rounded bg-accent px-4 py-2 font-bold text-white">
            New job
          </Link>
        )}
      </div>
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
