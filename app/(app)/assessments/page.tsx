import type { Metadata } from "next";
import { ActionLink, PageHeader } from "@/app/_components/page-header";
import { listJobs } from "@/assessments/jobs/queries";
import { listAssessmentsPage, listAuthors } from "@/assessments/revisions/queries";
import { requirePermission } from "@/lib/auth/guard";
import { can } from "@/lib/permissions";
import { AssessmentsTable } from "./assessments-table";

export const metadata: Metadata = { title: "Assessments" };

export default async function AssessmentsPage() {
  const actor = await requirePermission("assessments:read");
  const [jobs, authors, firstPage] = await Promise.all([
    listJobs(actor),
    listAuthors(actor),
    // The table's first view (its default sort, no filter), sent with the HTML in the API's own shape.
    listAssessmentsPage(actor, { limit: 20, sort: "-updatedAt" }).then((page) => JSON.parse(JSON.stringify(page))),
  ]);
  return (
    <div className="space-y-4">
      <PageHeader title="Assessments">
        {can(actor, "assessments:write") && <ActionLink href="/assessments/new">New assessment</ActionLink>}
      </PageHeader>
      <AssessmentsTable jobs={jobs.map((j) => ({ id: j.id, name: j.name }))} authors={authors} firstPage={firstPage} />
    </div>
  );
}
