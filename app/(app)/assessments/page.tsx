import type { Metadata } from "next";
import { ActionLink, PageHeader } from "@/app/_components/page-header";
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
      <PageHeader title="Assessments">
        {can(actor, "assessments:write") && <ActionLink href="/assessments/new">New assessment</ActionLink>}
      </PageHeader>
      <AssessmentsTable jobs={jobs.map((j) => ({ id: j.id, name: j.name }))} authors={authors} />
    </div>
  );
}
