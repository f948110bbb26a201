"use server";

import { revalidatePath } from "next/cache";
import { createJob, updateJob } from "@/assessments/jobs/service";
import { runAction } from "@/lib/actions";
import { getActor } from "@/lib/auth/session";

export async function saveJobAction(jobId: string | null, values: unknown) {
  return runAction(async () => {
    const actor = await getActor();
    const job = jobId ? await updateJob(actor, jobId, values) : await createJob(actor, values);
    revalidatePath("/jobs");
    return { message: "Job saved.", data: { id: job.id } };
  });
}
