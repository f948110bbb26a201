import "server-only";
import { and, count, desc, eq } from "drizzle-orm";
import { getDb } from "@/db/client";
import { assessments, jobs, revisions } from "@/db/schema";
import { authorize, type Actor } from "@/lib/permissions";
import { cachedRead, readKey } from "@/lib/read-cache";

const summaryColumns = {
  revisionId: revisions.id,
  number: revisions.number,
  status: revisions.status,
  reviewDate: revisions.reviewDate,
  submittedAt: revisions.submittedAt,
  approvedAt: revisions.approvedAt,
  title: assessments.title,
  jobName: jobs.name,
};

/** Revisions waiting for this approver's countersignature. */
export async function listAwaitingReview(actor: Actor | null) {
  authorize(actor, "reviews:read");
  const db = await getDb();
  return db
    .select(summaryColumns)
    .from(revisions)
    .innerJoin(assessments, eq(assessments.id, revisions.assessmentId))
    .innerJoin(jobs, eq(jobs.id, assessments.jobId))
    .where(
      and(
        eq(revisions.organisationId, actor.organisationId),
        eq(revisions.status, "submitted"),
        eq(revisions.approverId, actor.id),
      ),
    )
    .orderBy(desc(revisions.submittedAt));
}

/** Revision counts by status, for the overview. */
export async function countRevisionsByStatus(actor: Actor | null) {
  authorize(actor, "assessments:read");
  return cachedRead(readKey("revision-status-counts", actor.organisationId), async () => {
    const db = await getDb();
    const rows = await db
      .select({ status: revisions.status, n: count() })
      .from(revisions)
      .where(eq(revisions.organisationId, actor.organisationId))
      .groupBy(revisions.status);
    return Object.fromEntries(rows.map((r) => [r.status, Number(r.n)])) as Partial<
      Record<(typeof rows)[number]["status"], number>
    >;
  });
}

/** How many revisions wait for this approver's countersignature (overview). */
export async function countAwaitingReview(actor: Actor | null): Promise<number> {
  authorize(actor, "reviews:read");
  return cachedRead(readKey("awaiting-review-count", actor.organisationId, actor.id), async () => {
    const db = await getDb();
    const [{ n }] = await db
      .select({ n: count() })
      .from(revisions)
      .where(
        and(
          eq(revisions.organisationId, actor.organisationId),
          eq(revisions.status, "submitted"),
          eq(revisions.approverId, actor.id),
        ),
      );
    return Number(n);
  });
}
