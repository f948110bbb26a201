import type { Metadata } from "next";
import Link from "next/link";
import { listJobs } from "@/assessments/jobs/queries";
import { listAuthors } from "@/assessments/revisions/service";
import { requirePermission } from "@/lib/auth/guard";
import { can } from "@/lib/permissions";
import { AssessmentsTable } from "./assessments-table";

export const metadata: Metadata = { title: "Assessments" };

export default async function AssessmentsPage() {
  const actor = await requirePermission("assessments:read");
  const [jobs, authors] = await Promise.all([listJobs(actor), listAuthors(actor)]);
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
      <AssessmentsTable jobs={jobs.map((j) => ({ id: j.id, name: j.name }))} authors={authors} />
    </div>
  );
}
