/**
 * The foreman's side, read: assigned jobs with their approved revisions, a briefing's script and
 * record, the foremen of a job. Writes are in service.ts.
 */
import "server-only";
import { and, asc, desc, eq, gte, inArray, isNull } from "drizzle-orm";
import { getDb } from "@/db/client";
import {
  assessments,
  briefingAttendees,
  briefings,
  components,
  jobAssignments,
  jobs,
  revisions,
  siteChangeNotes,
  users,
} from "@/db/schema";
import { AppError } from "@/lib/errors";
import { authorize, type Actor } from "@/lib/permissions";
import { contentSchema } from "../method-statement/content";
import type { TaskScore } from "../method-statement/score-task";
import { briefingScript } from "./instructions";
import { isAssignedToJob } from "./assignment";
import { isUuid } from "@/lib/ids";

const startOfToday = () => {
  const d = new Date();
  d.setUTCHours(0, 0, 0, 0);
  return d;
};

/** The foreman's jobs, each with its current approved revision (never a draft) and today's briefings. */
export async function listForemanJobs(actor: Actor | null) {
  authorize(actor, "briefings:run");
  const db = await getDb();
  const assigned = await db
    .select({ job: jobs })
    .from(jobAssignments)
    .innerJoin(jobs, eq(jobs.id, jobAssignments.jobId))
    .where(and(eq(jobAssignments.userId, actor.id), eq(jobAssignments.organisationId, actor.organisationId)))
    .orderBy(asc(jobs.name));
  const jobIds = assigned.map((a) => a.job.id);
  const approved = jobIds.length
    ? await db
        .select({
          revisionId: revisions.id,
          number: revisions.number,
          reviewDate: revisions.reviewDate,
          needsReview: revisions.needsReview,
          worstBand: revisions.worstBand,
          title: assessments.title,
          jobId: assessments.jobId,
        })
        .from(revisions)
        .innerJoin(assessments, eq(assessments.id, revisions.assessmentId))
        .where(and(inArray(assessments.jobId, jobIds), eq(revisions.status, "approved")))
        .orderBy(asc(assessments.title))
    : [];
  const today = approved.length
    ? await db
        .select({
          id: briefings.id,
          revisionId: briefings.revisionId,
          startedAt: briefings.startedAt,
          completedAt: briefings.completedAt,
          place: briefings.place,
        })
        .from(briefings)
        .where(
          and(
            inArray(
              briefings.revisionId,
              approved.map((a) => a.revisionId),
            ),
            gte(briefings.startedAt, startOfToday()),
          ),
        )
        .orderBy(desc(briefings.startedAt))
    : [];
  return assigned.map(({ job }) => ({
    job,
    revisions: approved
      .filter((r) => r.jobId === job.id)
      .map((r) => ({ ...r, briefingsToday: today.filter((b) => b.revisionId === r.revisionId) })),
  }));
}

/**
 * What a foreman's phone keeps a copy of while it has signal: each approved revision of their jobs,
 * with where its briefing page and sheet are. `checkedAt` is when this list was true.
 */
export async function listBriefableRevisions(actor: Actor | null) {
  const jobs = await listForemanJobs(actor);
  return {
    checkedAt: new Date().toISOString(),
    revisions: jobs.flatMap(({ job, revisions }) =>
      revisions.map((r) => ({
        revisionId: r.revisionId,
        number: r.number,
        title: r.title,
        jobName: job.name,
        reviewDate: r.reviewDate,
        needsReview: r.needsReview,
        page: `/briefings/${r.revisionId}`,
        sheet: `/api/v1/revisions/${r.revisionId}/briefing-sheet`,
      })),
    ),
  };
}

export type BriefableRevisions = Awaited<ReturnType<typeof listBriefableRevisions>>;

/**
 * An approved revision of one of the foreman's jobs; anything else is "not found". A superseded one is
 * returned only where asked for: a phone without signal may have briefed from it.
 */
export async function briefableRevision(
  actor: Actor,
  revisionId: string,
  { superseded = "refuse" }: { superseded?: "allow" | "refuse" } = {},
) {
  const db = await getDb();
  const [row] = isUuid(revisionId)
    ? await db
        .select({ revision: revisions, assessment: assessments, job: jobs })
        .from(revisions)
        .innerJoin(assessments, eq(assessments.id, revisions.assessmentId))
        .innerJoin(jobs, eq(jobs.id, assessments.jobId))
        .where(eq(revisions.id, revisionId))
    : [];
  const briefable =
    row?.revision.status === "approved" || (superseded === "allow" && row?.revision.status === "superseded");
  if (!row || row.revision.organisationId !== actor.organisationId || !briefable)
    throw AppError.notFound("Approved revision");
  if (!(await isAssignedToJob(actor, row.job.id))) throw AppError.notFound("Approved revision");
  return row;
}

/** What the foreman reads out for a revision, with any site change notes to warn of. */
export async function getBriefingScript(actor: Actor | null, revisionId: string) {
  authorize(actor, "briefings:run");
  const { revision, assessment, job } = await briefableRevision(actor, revisionId);
  const db = await getDb();
  const names = Object.fromEntries(
    (
      await db
        .select({ id: components.id, name: components.name })
        .from(components)
        .where(eq(components.organisationId, actor.organisationId))
    ).map((c) => [c.id, c.name]),
  );
  const notes = await db
    .select()
    .from(siteChangeNotes)
    // Only notes the adviser has not decided on: a decided one no longer warns.
    .where(and(eq(siteChangeNotes.revisionId, revisionId), isNull(siteChangeNotes.decision)))
    .orderBy(desc(siteChangeNotes.createdAt));
  const content = contentSchema.parse(revision.content);
  return {
    revision: {
      id: revision.id,
      number: revision.number,
      needsReview: revision.needsReview,
      reviewDate: revision.reviewDate,
    },
    title: assessment.title,
    job: {
      name: job.name,
      accessPoint: job.accessPoint,
      siteContactName: job.siteContactName,
      siteContactPhone: job.siteContactPhone,
    },
    script: briefingScript(content, (revision.results ?? []) as TaskScore[], names),
    siteChanges: notes.map((n) => ({ text: n.text, by: n.authorName, at: n.createdAt.toISOString() })),
  };
}

export async function ownBriefing(actor: Actor, briefingId: string) {
  const db = await getDb();
  const row = isUuid(briefingId)
    ? await db.query.briefings.findFirst({ where: eq(briefings.id, briefingId) })
    : undefined;
  if (!row || row.organisationId !== actor.organisationId || row.foremanId !== actor.id)
    throw AppError.notFound("Briefing");
  return row;
}

/** A briefing with its attendees, for the record (the foreman who ran it, or the organisation's advisers). */
export async function getBriefingRecord(actor: Actor | null, briefingId: string) {
  if (!actor) throw new AppError("unauthenticated", "Sign in to continue");
  const db = await getDb();
  const briefing = isUuid(briefingId)
    ? await db.query.briefings.findFirst({ where: eq(briefings.id, briefingId) })
    : undefined;
  if (!briefing || briefing.organisationId !== actor.organisationId) throw AppError.notFound("Briefing");
  if (!(briefing.foremanId === actor.id || ["admin", "adviser"].includes(actor.role)))
    throw AppError.notFound("Briefing");
  const [context] = await db
    .select({ title: assessments.title, number: revisions.number, job: jobs.name })
    .from(revisions)
    .innerJoin(assessments, eq(assessments.id, revisions.assessmentId))
    .innerJoin(jobs, eq(jobs.id, assessments.jobId))
    .where(eq(revisions.id, briefing.revisionId));
  const attendees = await db
    .select()
    .from(briefingAttendees)
    .where(eq(briefingAttendees.briefingId, briefingId))
    .orderBy(asc(briefingAttendees.signedAt));
  return { briefing, context, attendees };
}

/** Foremen of the organisation and the jobs each is assigned to (for the job form). */
export async function listForemen(actor: Actor | null, jobId: string) {
  authorize(actor, "jobs:write");
  const db = await getDb();
  const job = isUuid(jobId) ? await db.query.jobs.findFirst({ where: eq(jobs.id, jobId) }) : undefined;
  if (!job || job.organisationId !== actor.organisationId) throw AppError.notFound("Job");
  const foremen = await db
    .select({ id: users.id, name: users.name })
    .from(users)
    .where(and(eq(users.organisationId, actor.organisationId), eq(users.role, "foreman"), eq(users.active, true)))
    .orderBy(asc(users.name));
  const assigned = isUuid(jobId)
    ? await db.select({ userId: jobAssignments.userId }).from(jobAssignments).where(eq(jobAssignments.jobId, jobId))
    : [];
  return foremen.map((f) => ({ ...f, assigned: assigned.some((a) => a.userId === f.id) }));
}

/** A revision's site change notes still waiting for the adviser's decision, newest first. */
export async function listOpenSiteChanges(actor: Actor | null, revisionId: string) {
  authorize(actor, "assessments:read");
  const db = await getDb();
  return db
    .select({
      id: siteChangeNotes.id,
      text: siteChangeNotes.text,
      by: siteChangeNotes.authorName,
      at: siteChangeNotes.createdAt,
      photo: siteChangeNotes.photoFileId,
    })
    .from(siteChangeNotes)
    .where(
      and(
        eq(siteChangeNotes.organisationId, actor.organisationId),
        eq(siteChangeNotes.revisionId, revisionId),
        isNull(siteChangeNotes.decision),
      ),
    )
    .orderBy(desc(siteChangeNotes.createdAt));
}
