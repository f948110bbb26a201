import type { Metadata } from "next";
import { requirePermission } from "@/lib/auth/guard";
import { JobForm } from "../job-form";

export const metadata: Metadata = { title: "New job" };

export default async function NewJobPage() {
  await requirePermission("jobs:write");
  return (
    <div className="max-w-4xl space-y-4">
      <h1 className="text-2xl font-bold">New job</h1>
      <JobForm jobId={null} />
    </div>
  );
}
