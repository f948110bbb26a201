import type { Metadata } from "next";
import { TEMPLATES } from "@/assessments/method-statement/templates";
import { listJobs } from "@/assessments/jobs/queries";
import { requirePermission } from "@/lib/auth/guard";
import { NewAssessmentForm } from "./new-assessment-form";

export const metadata: Metadata = { title: "New assessment" };

export default async function NewAssessmentPage() {
  const actor = await requirePermission("assessments:write");
  const jobs = await listJobs(actor);
  return (
    <div className="max-w-3xl space-y-4">
      <h1 className="text-2xl font-bold">New assessment</h1>
      <NewAssessmentForm
        jobs={jobs.map((j) => ({ id: j.id, name: j.name }))}
        templates={TEMPLATES.map((t) => ({ id: t.id, name: t.name, description: t.description }))}
      />
    </div>
  );
}
