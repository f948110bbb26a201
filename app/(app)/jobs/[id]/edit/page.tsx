import type { Metadata } from "next";
import { getJob } from "@/assessments/jobs/service";
import { requirePermission } from "@/lib/auth/guard";
import { listForemen } from "@/assessments/briefing/queries";
import { JobForm } from "../../job-form";
import { ForemenForm } from "./foremen-form";
import { foundOr404 } from "@/lib/pages";

export const metadata: Metadata = { title: "Edit job" };

export default async function EditJobPage({ params }: { params: Promise<{ id: string }> }) {
  const actor = await requirePermission("jobs:write");
  const { id } = await params;
  const job = await foundOr404(getJob(actor, id));
  const {
    name,
    client,
    location,
    lineReference,
    mileage,
    accessPoint,
    nearestHospital,
    emergencyArrangements,
    siteContactName,
    siteContactPhone,
  } = job;
  return (
    <div className="max-w-4xl space-y-4">
      <h1 className="text-2xl font-bold">Edit job</h1>
      <JobForm
        jobId={job.id}
        initial={{
          name,
          client,
          location,
          lineReference,
          mileage,
          accessPoint,
          nearestHospital,
          emergencyArrangements,
          siteContactName,
          siteContactPhone,
        }}
      />
      <ForemenForm jobId={job.id} foremen={await listForemen(actor, job.id)} />
    </div>
  );
}
