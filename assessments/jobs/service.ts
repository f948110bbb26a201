import "server-only";
import { and, eq } from "drizzle-orm";
import { getDb } from "@/db/client";
import { jobs } from "@/db/schema";
import { recordAudit } from "@/lib/audit";
import { AppError, parseOrThrow } from "@/lib/errors";
import { authorize, type Actor } from "@/lib/permissions";
import { jobSchema } from "./schemas";
import { isUuid } from "@/lib/ids";

export async function getJob(actor: Actor | null, jobId: string) {
  authorize(actor, "jobs:read");
  const db = await getDb();
  const job = isUuid(jobId) ? await db.query.jobs.findFirst({ where: eq(jobs.id, jobId) }) : undefined;
  if (!job || job.organisationId !== actor.organisationId) throw AppError.notFound("Job");
  return job;
}

export async function createJob(actor: Actor | null, input: unknown) {
  authorize(actor, "jobs:write");
  const data = parseOrThrow(jobSchema, input);
  const db = await getDb();
  return db.transaction(async (tx) => {
    const [job] = await tx
      .insert(jobs)
      .values({ ...data, organisationId: actor.organisationId, createdBy: actor.id })
      .returning();
    await recordAudit(tx, {
      organisationId: actor.organisationId,
      actorId: actor.id,
      action: "job.created",
      entityType: "job",
      entityId: job.id,
    });
    return job;
  });
}

export async function updateJob(actor: Actor | null, jobId: string, input: unknown) {
  authorize(actor, "jobs:write");
  await getJob(actor, jobId);
  const data = parseOrThrow(jobSchema, input);
  const db = await getDb();
  return db.transaction(async (tx) => {
    const [job] = await tx
      .update(jobs)
      .set({ ...data, updatedAt: new Date() })
      .where(and(eq(jobs.id, jobId), eq(jobs.organisationId, actor.organisationId)))
      .returning();
    await recordAudit(tx, {
      organisationId: actor.organisationId,
      actorId: actor.id,
      action: "job.updated",
      entityType: "job",
      entityId: job.id,
    });
    return job;
  });
}
