/**
 * Assessments and their revisions: create (blank or from a template), read for editing, save a
 * draft (optimistic concurrency by version), submit. Every function checks the permission table and
 * the organisation first; another organisation's record is "not found".
 */
import "server-only";
import { createHash } from "node:crypto";
import { and, asc, eq, inArray, sql } from "drizzle-orm";
import { getDb } from "@/db/client";
import { assessments, components, jobs, revisions, users } from "@/db/schema";
import { recordAudit } from "@/lib/audit";
import { AppError, parseOrThrow } from "@/lib/errors";
import { isUuid } from "@/lib/ids";
import { cachedRead, readKey } from "@/lib/read-cache";
import { authorize, type Actor } from "@/lib/permissions";
import { contentSchema, emptyContent, type Content } from "../method-statement/content";
import { reviewContent, type RegisterEntry, type Review } from "../method-statement/score-task";
import { findTemplate } from "../method-statement/templates";
import { createAssessmentSchema, saveRevisionSchema, taskBodySchema, versionBodySchema } from "./schemas";

export function contentHash(content: unknown): string {
  return createHash("sha256").update(JSON.stringify(content)).digest("hex");
}

const registerColumns = {
  id: components.id,
  name: components.name,
  massKg: components.massKg,
  grip: components.grip,
  massSource: components.massSource,
};

/**
 * The register entries a content's tasks name: scoring needs those and no others, so a register of
 * fifty thousand components costs a draft nothing.
 */
export async function registerFor(organisationId: string, content: Pick<Content, "tasks">): Promise<RegisterEntry[]> {
  const ids = [...new Set(content.tasks.map((t) => t.componentId).filter(isUuid))];
  if (ids.length === 0) return [];
  const db = await getDb();
  return db
    .select(registerColumns)
    .from(components)
    .where(and(eq(components.organisationId, organisationId), inArray(components.id, ids)));
}

/** Register entries by name (any case), for a template's components. */
async function registerNamed(organisationId: string, names: string[]): Promise<RegisterEntry[]> {
  if (names.length === 0) return [];
  const db = await getDb();
  return db
    .select(registerColumns)
    .from(components)
    .where(
      and(
        eq(components.organisationId, organisationId),
        inArray(
          sql`lower(${components.name})`,
          names.map((n) => n.toLowerCase()),
        ),
      ),
    );
}

export async function createAssessment(
  actor: Actor | null,
  input: unknown,
): Promise<{ assessmentId: string; revisionId: string }> {
  authorize(actor, "assessments:write");
  const data = parseOrThrow(createAssessmentSchema, input);
  const db = await getDb();
  const job = await db.query.jobs.findFirst({ where: eq(jobs.id, data.jobId) });
  if (!job || job.organisationId !== actor.organisationId)
    throw new AppError("validation", "Some fields need attention", [
      { path: "jobId", message: "Choose one of your jobs" },
    ]);
  let content: Content = emptyContent();
  if (data.templateId) {
    const template = findTemplate(data.templateId);
    if (!template)
      throw new AppError("validation", "Some fields need attention", [
        { path: "templateId", message: "Unknown template" },
      ]);
    // The template names its components; build once to learn which, then with their ids.
    const named: string[] = [];
    template.build((name) => (named.push(name), null));
    const entries = await registerNamed(actor.organisationId, named);
    content = template.build((name) => entries.find((e) => e.name.toLowerCase() === name.toLowerCase())?.id ?? null);
  }
  content.emergency.nearestHospital ||= job.nearestHospital ?? "";
  content.emergency.arrangements ||= job.emergencyArrangements ?? "";
  content.lineside.accessPoint ||= job.accessPoint ?? "";
  // A job on the railway starts as near the line: saying it is not is a choice, never a default.
  if (job.lineReference?.trim() && !data.templateId) content.lineside.nearLine = "near";
  const review = reviewContent(content, await registerFor(actor.organisationId, content));
  return db.transaction(async (tx) => {
    const [assessment] = await tx
      .insert(assessments)
      .values({ organisationId: actor.organisationId, jobId: job.id, title: data.title, createdBy: actor.id })
      .returning();
    const [revision] = await tx
      .insert(revisions)
      .values({
        organisationId: actor.organisationId,
        assessmentId: assessment.id,
        number: 1,
        isLatest: true,
        content,
        authorId: actor.id,
        results: review.scores,
        worstBand: review.worstBand,
      })
      .returning();
    await recordAudit(tx, {
      organisationId: actor.organisationId,
      actorId: actor.id,
      action: "assessment.created",
      entityType: "revision",
      entityId: revision.id,
      contentHash: contentHash(content),
      details: { templateId: data.templateId ?? null },
      auth: actor.auth,
    });
    return { assessmentId: assessment.id, revisionId: revision.id };
  });
}

/**
 * A revision with its assessment, job and the register entries its tasks name; no permission check
 * (callers check). Kept until the next write (lib/read-cache.ts), frozen: the wizard's page, its API
 * and every use case that checks a revision first read it, most of them more than once.
 */
export async function loadRevision(organisationId: string, revisionId: string) {
  if (!isUuid(revisionId)) throw AppError.notFound("Revision");
  return cachedRead(readKey("revision", organisationId, revisionId), async () => {
    const db = await getDb();
    const [row] = await db
      .select({ revision: revisions, assessment: assessments, job: jobs })
      .from(revisions)
      .innerJoin(assessments, eq(assessments.id, revisions.assessmentId))
      .innerJoin(jobs, eq(jobs.id, assessments.jobId))
      .where(eq(revisions.id, revisionId));
    if (!row || row.revision.organisationId !== organisationId) throw AppError.notFound("Revision");
    const content = contentSchema.parse(row.revision.content);
    return { ...row, content, register: await registerFor(organisationId, content) };
  });
}

const reviews = new WeakMap<object, Review>();

/**
 * The engine's review of a revision as loaded. A kept revision is one frozen object until the next
 * write (loadRevision), so its review is worked out once, not on every page that shows it.
 */
export function reviewOf(data: Awaited<ReturnType<typeof loadRevision>>): Review {
  let review = reviews.get(data);
  if (!review) {
    review = reviewContent(data.content, data.register);
    reviews.set(data, review);
  }
  return review;
}

export async function getRevision(actor: Actor | null, revisionId: string) {
  authorize(actor, "assessments:read");
  return loadRevision(actor.organisationId, revisionId);
}

/** Saves a draft. A stale version answers 409 and nothing is written; so does a locked revision. */
export async function saveRevision(
  actor: Actor | null,
  revisionId: string,
  input: unknown,
): Promise<{ version: number; worstBand: string | null }> {
  authorize(actor, "assessments:write");
  // Whose record first: another organisation's revision is "not found" whatever the body says. Only
  // its owner and status are read: the stored content is about to be replaced.
  const db = await getDb();
  const [current] = isUuid(revisionId)
    ? await db
        .select({ organisationId: revisions.organisationId, status: revisions.status })
        .from(revisions)
        .where(eq(revisions.id, revisionId))
    : [];
  if (!current || current.organisationId !== actor.organisationId) throw AppError.notFound("Revision");
  const data = parseOrThrow(saveRevisionSchema, input, "The draft has fields that need attention");
  if (current.status !== "draft")
    throw new AppError("conflict", `This revision is ${current.status} and can no longer be edited.`);
  const review = reviewContent(data.content, await registerFor(actor.organisationId, data.content));
  const [saved] = await db
    .update(revisions)
    .set({
      content: data.content,
      results: review.scores,
      worstBand: review.worstBand,
      version: data.version + 1,
      updatedAt: new Date(),
    })
    .where(and(eq(revisions.id, revisionId), eq(revisions.version, data.version), eq(revisions.status, "draft")))
    .returning({ version: revisions.version });
  if (!saved)
    throw new AppError(
      "conflict",
      "Someone else saved this draft after you opened it. Your changes are kept on screen: copy what you need, then reload.",
    );
  return { version: saved.version, worstBand: review.worstBand };
}

export async function listApprovers(actor: Actor | null) {
  authorize(actor, "assessments:submit");
  return cachedRead(readKey("approvers", actor.organisationId), async () => {
    const db = await getDb();
    return db
      .select({ id: users.id, name: users.name })
      .from(users)
      .where(and(eq(users.organisationId, actor.organisationId), eq(users.role, "approver"), eq(users.active, true)))
      .orderBy(asc(users.name));
  });
}

/** One task of a draft, changed through the same save (and the same version check) as the whole draft. */
async function changeTasks(
  actor: Actor | null,
  revisionId: string,
  version: unknown,
  change: (tasks: Content["tasks"]) => Content["tasks"],
) {
  authorize(actor, "assessments:write");
  const current = await getRevision(actor, revisionId);
  const content = { ...current.content, tasks: change(current.content.tasks) };
  return saveRevision(actor, revisionId, { version, content });
}

export async function listTasks(actor: Actor | null, revisionId: string) {
  const data = await getRevision(actor, revisionId);
  const { content, revision } = data;
  const review = reviewOf(data);
  return { version: revision.version, tasks: content.tasks.map((task, i) => ({ task, score: review.scores[i] })) };
}

export async function addTask(actor: Actor | null, revisionId: string, input: unknown) {
  authorize(actor, "assessments:write");
  await getRevision(actor, revisionId);
  const { version, task } = parseOrThrow(taskBodySchema, input);
  return changeTasks(actor, revisionId, version, (tasks) => {
    if (tasks.some((t) => t.id === task.id)) throw new AppError("conflict", `A task with id ${task.id} already exists`);
    return [...tasks, task];
  });
}

export async function replaceTask(actor: Actor | null, revisionId: string, taskId: string, input: unknown) {
  authorize(actor, "assessments:write");
  await getRevision(actor, revisionId);
  const { version, task } = parseOrThrow(taskBodySchema, input);
  return changeTasks(actor, revisionId, version, (tasks) => {
    if (!tasks.some((t) => t.id === taskId)) throw AppError.notFound("Task");
    return tasks.map((t) => (t.id === taskId ? { ...task, id: taskId } : t));
  });
}

export async function removeTask(actor: Actor | null, revisionId: string, taskId: string, input: unknown) {
  authorize(actor, "assessments:write");
  await getRevision(actor, revisionId);
  const { version } = parseOrThrow(versionBodySchema, input);
  return changeTasks(actor, revisionId, version, (tasks) => {
    if (!tasks.some((t) => t.id === taskId)) throw AppError.notFound("Task");
    return tasks.filter((t) => t.id !== taskId);
  });
}
