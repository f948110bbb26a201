import "server-only";
import { and, count, desc, eq, asc, ilike, inArray, lte, type SQL } from "drizzle-orm";
import { getDb } from "@/db/client";
import { assessments, jobs, revisions, users } from "@/db/schema";
import { authorize, type Actor } from "@/lib/permissions";
import { cachedRead, readKey } from "@/lib/read-cache";
import { z } from "zod";
import { parseOrThrow } from "@/lib/errors";
import { afterCursor, keysetPage, orderOf, pageQuerySchema, keysetColumns, type Keyset } from "@/lib/pagination";
import { escapeLike } from "@/lib/sql";

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

export const assessmentListQuerySchema = pageQuerySchema.extend({
  q: z.string().trim().max(100).optional(),
  status: z.enum(["draft", "submitted", "approved", "superseded"]).optional(),
  jobId: z.uuid().optional(),
  worstBand: z.enum(["clear", "watch", "act", "stop"]).optional(),
  authorId: z.uuid().optional(),
  /** "30": approved revisions whose review date falls within the next 30 days (or has passed). */
  reviewDue: z.enum(["30"]).optional(),
  sort: z.enum(["updatedAt", "-updatedAt", "title", "-title"]).default("-updatedAt"),
});

/** The list's orders; each walks an index (db/schema.ts) from the cursor on. */
const ASSESSMENT_ORDERS = {
  updatedAt: { column: revisions.updatedAt, id: revisions.id, type: "timestamptz" },
  title: { column: assessments.title, id: assessments.id, type: "text" },
} as const;

function assessmentKeyset(sort: z.infer<typeof assessmentListQuerySchema>["sort"]): Keyset {
  const descending = sort.startsWith("-");
  return {
    name: sort,
    descending,
    ...ASSESSMENT_ORDERS[descending ? (sort.slice(1) as "updatedAt" | "title") : (sort as "updatedAt" | "title")],
  };
}

/** The latest revision of each assessment, filtered, sorted and paged by keyset; the total counted in SQL. */
export async function listAssessmentsPage(actor: Actor | null, query: unknown) {
  authorize(actor, "assessments:read");
  const q = parseOrThrow(assessmentListQuerySchema, query, "Invalid query");
  return cachedRead(
    readKey("assessments", actor.organisationId, q, new Date().toISOString().slice(0, 10)),
    async () => {
      const keyset = assessmentKeyset(q.sort);
      const db = await getDb();
      // Conditions on the revision, and on the assessment; both tables are named by organisation, so
      // that either sort can walk its own index (db/schema.ts).
      const onRevision: SQL[] = [eq(revisions.organisationId, actor.organisationId), eq(revisions.isLatest, true)];
      const onAssessment: SQL[] = [eq(assessments.organisationId, actor.organisationId)];
      if (q.q) onAssessment.push(ilike(assessments.title, `%${escapeLike(q.q)}%`));
      if (q.jobId) onAssessment.push(eq(assessments.jobId, q.jobId));
      if (q.status) onRevision.push(eq(revisions.status, q.status));
      if (q.worstBand) onRevision.push(eq(revisions.worstBand, q.worstBand));
      if (q.authorId) onRevision.push(eq(revisions.authorId, q.authorId));
      if (q.reviewDue) {
        const limit = new Date(Date.now() + Number(q.reviewDue) * 86_400_000).toISOString().slice(0, 10);
        onRevision.push(eq(revisions.status, "approved"), lte(revisions.reviewDate, limit));
      }
      const where = [...onRevision, ...onAssessment];
      const after = afterCursor(keyset, q.cursor);
      const [rows, [{ total }]] = await Promise.all([
        db
          .select({
            assessmentId: assessments.id,
            title: assessments.title,
            jobId: jobs.id,
            jobName: jobs.name,
            revisionId: revisions.id,
            number: revisions.number,
            status: revisions.status,
            worstBand: revisions.worstBand,
            reviewDate: revisions.reviewDate,
            updatedAt: revisions.updatedAt,
            authorId: revisions.authorId,
            authorName: users.name,
            ...keysetColumns(keyset),
          })
          .from(revisions)
          .innerJoin(assessments, eq(assessments.id, revisions.assessmentId))
          .innerJoin(jobs, eq(jobs.id, assessments.jobId))
          .leftJoin(users, eq(users.id, revisions.authorId))
          .where(and(...where, after))
          .orderBy(...orderOf(keyset))
          .limit(q.limit + 1),
        // The count reads the assessments only when a filter does: the latest revisions alone are one index.
        q.q || q.jobId
          ? db
              .select({ total: count() })
              .from(revisions)
              .innerJoin(assessments, eq(assessments.id, revisions.assessmentId))
              .where(and(...where))
          : db
              .select({ total: count() })
              .from(revisions)
              .where(and(...onRevision)),
      ]);
      return keysetPage(rows, keyset, q.limit, Number(total));
    },
  );
}

/** Every assessment's latest revision (first page of 100), newest first. */
export async function listAssessments(actor: Actor | null) {
  return (await listAssessmentsPage(actor, { limit: 100 })).items;
}

/** People who can author assessments, for the list's author filter. */
export async function listAuthors(actor: Actor | null) {
  authorize(actor, "assessments:read");
  return cachedRead(readKey("authors", actor.organisationId), async () => {
    const db = await getDb();
    return db
      .select({ id: users.id, name: users.name })
      .from(users)
      .where(and(eq(users.organisationId, actor.organisationId), inArray(users.role, ["admin", "adviser"])))
      .orderBy(asc(users.name));
  });
}
