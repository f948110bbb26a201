/** The one rule for what a foreman may see: the jobs they are assigned to. Briefings and pack downloads both ask it. */
import { and, eq } from "drizzle-orm";
import { getDb } from "@/db/client";
import { jobAssignments } from "@/db/schema";
import type { Actor } from "@/lib/permissions";

export async function isAssignedToJob(actor: Actor, jobId: string): Promise<boolean> {
  const db = await getDb();
  const [assigned] = await db
    .select({ jobId: jobAssignments.jobId })
    .from(jobAssignments)
    .where(
      and(
        eq(jobAssignments.jobId, jobId),
        eq(jobAssignments.userId, actor.id),
        eq(jobAssignments.organisationId, actor.organisationId),
      ),
    );
  return !!assigned;
}
