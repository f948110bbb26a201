/**
 * The foreman's side: assigned jobs with their approved revision, briefings with sign-on (idempotent,
 * for phones that lose signal), completion with the foreman's own signature, site change notes, and
 * the briefing sheet.
 */
import "server-only";
import { and, eq, inArray, isNull } from "drizzle-orm";
import { getDb } from "@/db/client";
import { closeSiteChanges } from "./site-changes";
import {
  briefingAttendees,
  briefings,
  jobAssignments,
  jobs,
  organisations,
  revisions,
  siteChangeNotes,
  users,
} from "@/db/schema";
import { recordAudit } from "@/lib/audit";
import { sha256Hex } from "@/lib/hash";
import { appUrl } from "@/lib/config";
import { AppError, parseOrThrow, parseOrThrowAsync } from "@/lib/errors";
import { renderMail } from "@/lib/mail/layout";
import { sendMail, type SendOutcome } from "@/lib/mail/send";
import { authorize, type Actor } from "@/lib/permissions";
import { getSigningKey } from "@/lib/signing-keys";
import { putFile } from "@/lib/storage";
import { renderPack } from "../pack/render";
import { storePack } from "../revisions/approval";
import {
  assignmentSchema,
  attendeeSchema,
  completeBriefingSchema,
  siteChangeSchema,
  startBriefingSchema,
  siteChangeDecisionSchema,
} from "./schemas";
import { briefableRevision, getBriefingRecord, getBriefingScript, ownBriefing } from "./queries";
import { isUuid } from "@/lib/ids";
import { requireFileType } from "@/lib/files";
import { ukDateTime } from "@/lib/dates";

/** What the phone learns when its start reaches the server. */
export interface StartedBriefing {
  briefingId: string;
  /** The same start was received before (the phone sent it again after losing the answer). */
  duplicate: boolean;
  /** Set when the revision had been superseded: the briefing is recorded as such and the adviser told. */
  superseded: { revisionNumber: number; currentRevisionNumber: number | null } | null;
}

/**
 * Starts a briefing. A phone sends its own key and the time it started: the same key again returns the
 * same briefing. A phone that had no signal may have briefed from a revision superseded meanwhile; that
 * briefing is recorded, flagged and reported to the adviser, never silently accepted. Without a key (a
 * plain API call) only the current approved revision can be briefed.
 */
export async function startBriefing(actor: Actor | null, input: unknown): Promise<StartedBriefing> {
  authorize(actor, "briefings:run");
  const data = parseOrThrow(startBriefingSchema, input);
  const db = await getDb();
  if (data.key) {
    const earlier = await briefingByDeviceKey(actor, data.key);
    if (earlier) return earlier;
  }
  const { revision, assessment, job } = await briefableRevision(actor, data.revisionId, {
    superseded: data.key ? "allow" : "refuse",
  });
  const againstSuperseded = revision.status === "superseded";
  const current = againstSuperseded ? await currentApprovedRevision(revision.assessmentId) : null;
  const started = await db.transaction(async (tx) => {
    const [row] = await tx
      .insert(briefings)
      .values({
        organisationId: actor.organisationId,
        revisionId: data.revisionId,
        foremanId: actor.id,
        foremanName: actor.name,
        place: data.place,
        deviceKey: data.key ?? null,
        ...(data.startedAt ? { startedAt: new Date(data.startedAt) } : {}),
        againstSuperseded,
      })
      .onConflictDoNothing({ target: briefings.deviceKey })
      .returning({ id: briefings.id });
    // The same key arrived twice at once: the other request recorded it.
    if (!row) return null;
    await recordAudit(tx, {
      organisationId: actor.organisationId,
      actorId: actor.id,
      action: "briefing.started",
      entityType: "revision",
      entityId: data.revisionId,
      details: {
        briefingId: row.id,
        place: data.place,
        ...(data.startedAt ? { startedOnPhoneAt: data.startedAt } : {}),
        ...(againstSuperseded ? { againstSuperseded: true, currentRevisionNumber: current?.number ?? null } : {}),
      },
      auth: actor.auth,
    });
    return row.id;
  });
  if (!started) {
    const earlier = await briefingByDeviceKey(actor, data.key!);
    if (earlier) return earlier;
    throw new AppError("conflict", "This briefing could not be recorded: send it again.");
  }
  const superseded = againstSuperseded
    ? { revisionNumber: revision.number, currentRevisionNumber: current?.number ?? null }
    : null;
  if (superseded) {
    await reportSupersededBriefing(actor, {
      briefingId: started,
      title: assessment.title,
      jobName: job.name,
      place: data.place,
      startedAt: data.startedAt ? new Date(data.startedAt) : new Date(),
      revision,
      current,
    });
  }
  return { briefingId: started, duplicate: false, superseded };
}

/** A briefing this foreman's phone already sent under that key; another person's key is a conflict. */
async function briefingByDeviceKey(actor: Actor, key: string): Promise<StartedBriefing | null> {
  const db = await getDb();
  const [row] = await db
    .select({
      id: briefings.id,
      foremanId: briefings.foremanId,
      organisationId: briefings.organisationId,
      againstSuperseded: briefings.againstSuperseded,
      revisionNumber: revisions.number,
      assessmentId: revisions.assessmentId,
    })
    .from(briefings)
    .innerJoin(revisions, eq(revisions.id, briefings.revisionId))
    .where(eq(briefings.deviceKey, key));
  if (!row) return null;
  if (row.organisationId !== actor.organisationId || row.foremanId !== actor.id)
    throw new AppError("conflict", "This briefing key belongs to another briefing.");
  const current = row.againstSuperseded ? await currentApprovedRevision(row.assessmentId) : null;
  return {
    briefingId: row.id,
    duplicate: true,
    superseded: row.againstSuperseded
      ? { revisionNumber: row.revisionNumber, currentRevisionNumber: current?.number ?? null }
      : null,
  };
}

async function currentApprovedRevision(assessmentId: string) {
  const db = await getDb();
  const [row] = await db
    .select({ id: revisions.id, number: revisions.number, authorId: revisions.authorId })
    .from(revisions)
    .where(and(eq(revisions.assessmentId, assessmentId), eq(revisions.status, "approved")));
  return row ?? null;
}

/** The adviser to tell about a revision: its author's account, if it still exists. */
async function authorOf(authorId: string | null) {
  if (!authorId) return undefined;
  return (await getDb()).query.users.findFirst({ where: eq(users.id, authorId) });
}

const NO_AUTHOR: SendOutcome = { id: "", status: "failed", error: "The assessment has no author to tell" };

/**
 * Tells the adviser that a gang was briefed from a superseded revision: the author of the current
 * revision (else of the superseded one) is e-mailed; the briefing record and the audit trail carry it.
 */
async function reportSupersededBriefing(
  actor: Actor,
  briefing: {
    briefingId: string;
    title: string;
    jobName: string;
    place: string;
    startedAt: Date;
    revision: { id: string; number: number; authorId: string | null };
    current: { id: string; number: number; authorId: string | null } | null;
  },
): Promise<SendOutcome> {
  const adviser = await authorOf(briefing.current?.authorId ?? briefing.revision.authorId);
  if (!adviser) return NO_AUTHOR;
  const body = renderMail({
    heading: `Briefed from a superseded revision: ${briefing.title}`,
    paragraphs: [
      `Hello ${adviser.name},`,
      `${actor.name} briefed a gang at ${briefing.place} (${briefing.jobName}) on ${ukDateTime(briefing.startedAt)} ` +
        `from revision ${briefing.revision.number}, which had been superseded` +
        (briefing.current ? ` by revision ${briefing.current.number}.` : "."),
      "The phone had no signal, so it still held the old revision. The briefing is recorded as taken against a " +
        "superseded revision. Check whether the changes matter to the work and whether the gang must be briefed again.",
    ],
    action: { label: "Open the briefing record", url: appUrl(`/briefings/record/${briefing.briefingId}`) },
  });
  return sendMail({
    organisationId: actor.organisationId,
    kind: "briefing-superseded",
    to: adviser.email,
    subject: `Briefed from a superseded revision: ${briefing.title}`,
    ...body,
  });
}

/** Records one sign-on. Sending the same key again returns the first record: nothing is duplicated. */
export async function recordAttendee(
  actor: Actor | null,
  briefingId: string,
  input: unknown,
): Promise<{ id: string; duplicate: boolean }> {
  authorize(actor, "briefings:run");
  const briefing = await ownBriefing(actor, briefingId);
  const data = await parseOrThrowAsync(attendeeSchema, input);
  if (briefing.completedAt) {
    const db = await getDb();
    const existing = await db.query.briefingAttendees.findFirst({
      where: eq(briefingAttendees.idempotencyKey, data.key),
    });
    if (existing?.briefingId === briefingId) return { id: existing.id, duplicate: true };
    throw new AppError("conflict", "This briefing is closed: the foreman has signed it off.");
  }
  const db = await getDb();
  // The briefing row is the lock: a sign-on waits for a sign-off in progress, then sees it closed,
  // so nobody signs on after the record was put into the re-issued pack.
  const inserted = await db.transaction(async (tx) => {
    const [open] = await tx
      .select({ completedAt: briefings.completedAt })
      .from(briefings)
      .where(eq(briefings.id, briefingId))
      .for("update");
    if (open?.completedAt) return "closed" as const;
    const [row] = await tx
      .insert(briefingAttendees)
      .values({
        organisationId: actor.organisationId,
        briefingId,
        idempotencyKey: data.key,
        name: data.name,
        employer: data.employer,
        cardNumber: data.cardNumber,
        signature: data.signature,
        signedAt: new Date(data.signedAt),
      })
      .onConflictDoNothing({ target: briefingAttendees.idempotencyKey })
      .returning({ id: briefingAttendees.id });
    return row;
  });
  if (inserted === "closed") {
    const existing = await db.query.briefingAttendees.findFirst({
      where: eq(briefingAttendees.idempotencyKey, data.key),
    });
    if (existing?.briefingId === briefingId) return { id: existing.id, duplicate: true };
    throw new AppError("conflict", "This briefing is closed: the foreman has signed it off.");
  }
  if (inserted) return { id: inserted.id, duplicate: false };
  const existing = await db.query.briefingAttendees.findFirst({
    where: eq(briefingAttendees.idempotencyKey, data.key),
  });
  if (!existing || existing.briefingId !== briefingId)
    throw new AppError("conflict", "This sign-on key belongs to another briefing.");
  return { id: existing.id, duplicate: true };
}

/** The foreman signs last; the briefing is then closed. */
export async function completeBriefing(
  actor: Actor | null,
  briefingId: string,
  input: unknown,
): Promise<{ duplicate: boolean }> {
  authorize(actor, "briefings:run");
  const briefing = await ownBriefing(actor, briefingId);
  const data = await parseOrThrowAsync(completeBriefingSchema, input);
  if (briefing.completedAt) {
    // The phone sent its sign-off again after losing the answer: the same key is the same sign-off.
    if (data.key && briefing.completionKey === data.key) return { duplicate: true };
    throw new AppError("conflict", "This briefing is already signed off.");
  }
  const db = await getDb();
  const attendees = await db
    .select({ id: briefingAttendees.id })
    .from(briefingAttendees)
    .where(eq(briefingAttendees.briefingId, briefingId));
  if (attendees.length === 0)
    throw new AppError("validation", "At least one operative must sign on first", [
      { path: "attendees", message: "At least one operative must sign on first" },
    ]);
  // The briefing record joins the pack: the organisation re-issues the approved pack with it, newly
  // signed and recorded for /verify (earlier issues stay verifiable). Key fetched before the transaction.
  const org = await db.query.organisations.findFirst({ where: eq(organisations.id, actor.organisationId) });
  const key = await getSigningKey(actor.organisationId, org!.name);
  try {
    await signOff(actor, briefing, attendees.length, data, key);
  } catch (err) {
    // The same sign-off sent twice at once: the other request recorded it.
    if (err instanceof AppError && err.code === "conflict" && data.key) {
      const again = await ownBriefing(actor, briefingId);
      if (again.completionKey === data.key) return { duplicate: true };
    }
    throw err;
  }
  return { duplicate: false };
}

async function signOff(
  actor: Actor,
  briefing: typeof briefings.$inferSelect,
  attendeeCount: number,
  data: { signature: Uint8Array; key?: string; signedAt?: string },
  key: Awaited<ReturnType<typeof getSigningKey>>,
) {
  const briefingId = briefing.id;
  const db = await getDb();
  await db.transaction(async (tx) => {
    // Claim the sign-off: of two at once, only one updates the row and re-issues the pack.
    const [claimed] = await tx
      .update(briefings)
      .set({
        // Signed on the phone without signal: the time it was signed, never before the briefing began.
        completedAt: data.signedAt
          ? new Date(Math.max(Date.parse(data.signedAt), briefing.startedAt.getTime()))
          : new Date(),
        foremanSignature: data.signature,
        completionKey: data.key ?? null,
      })
      .where(and(eq(briefings.id, briefingId), isNull(briefings.completedAt)))
      .returning({ id: briefings.id });
    if (!claimed) throw new AppError("conflict", "This briefing is already signed off.");
    // Recorded before the pack is drawn, so the re-issued pack's signing record ends with it.
    await recordAudit(tx, {
      organisationId: actor.organisationId,
      actorId: actor.id,
      action: "briefing.completed",
      entityType: "revision",
      entityId: briefing.revisionId,
      details: { briefingId, attendees: attendeeCount },
      auth: actor.auth,
    });
    const pdf = await renderPack(tx, briefing.revisionId, key);
    await storePack(tx, actor.organisationId, briefing.revisionId, pdf, "approved");
    await recordAudit(tx, {
      organisationId: actor.organisationId,
      actorId: actor.id,
      action: "revision.pack-issued",
      entityType: "revision",
      entityId: briefing.revisionId,
      details: {
        kind: "approved",
        reason: "briefing",
        briefingId,
        packSha256: sha256Hex(pdf),
      },
    });
  });
}

/**
 * The adviser's decision on a revision's open site change notes: the assessment still holds (with the
 * reason). The revision no longer needs review and briefings stop warning of those notes. Starting a
 * new revision is the other decision (`startNewRevision` records it).
 */
export async function decideSiteChanges(actor: Actor | null, revisionId: string, input: unknown): Promise<void> {
  authorize(actor, "assessments:write");
  const db = await getDb();
  const [revision] = isUuid(revisionId) ? await db.select().from(revisions).where(eq(revisions.id, revisionId)) : [];
  if (!revision || revision.organisationId !== actor.organisationId) throw AppError.notFound("Revision");
  const { note } = parseOrThrow(siteChangeDecisionSchema, input);
  await db.transaction(async (tx) => {
    const decided = await closeSiteChanges(tx, actor, revisionId, "no-change", note);
    if (!decided) throw new AppError("conflict", "There is no site change waiting for a decision on this revision.");
    await recordAudit(tx, {
      organisationId: actor.organisationId,
      actorId: actor.id,
      action: "revision.site-change-reviewed",
      entityType: "revision",
      entityId: revisionId,
      details: { decision: "no-change", note, notes: decided },
      auth: actor.auth,
    });
  });
}

/** Conditions differ from the assessment: recorded with an optional photo, the revision marked, the adviser e-mailed. */
export async function createSiteChangeNote(
  actor: Actor | null,
  input: unknown,
  photo?: { name: string; data: Uint8Array },
): Promise<{ mail: SendOutcome }> {
  authorize(actor, "site-notes:create");
  const data = parseOrThrow(siteChangeSchema, input);
  const { revision, assessment, job } = await briefableRevision(actor, data.revisionId);
  let photoType: string | undefined;
  if (photo) {
    if (photo.data.byteLength > 10 * 1024 * 1024)
      throw new AppError("payload_too_large", "Photos can be at most 10 MB");
    photoType = (
      await requireFileType(
        photo.data,
        ["image/jpeg", "image/png", "image/webp"],
        "Attach a photograph (JPEG, PNG or WebP)",
      )
    ).mime;
  }
  const db = await getDb();
  await db.transaction(async (tx) => {
    const file = photo && photoType ? await putFile(tx, actor.organisationId, photo.data, photoType) : null;
    await tx.insert(siteChangeNotes).values({
      organisationId: actor.organisationId,
      revisionId: revision.id,
      authorId: actor.id,
      authorName: actor.name,
      text: data.text,
      photoFileId: file?.id ?? null,
    });
    await tx.update(revisions).set({ needsReview: true }).where(eq(revisions.id, revision.id));
    await recordAudit(tx, {
      organisationId: actor.organisationId,
      actorId: actor.id,
      action: "revision.site-change",
      entityType: "revision",
      entityId: revision.id,
      details: { text: data.text, photo: !!file },
      auth: actor.auth,
    });
  });
  const author = await authorOf(revision.authorId);
  if (!author) return { mail: NO_AUTHOR };
  const body = renderMail({
    heading: `Site change: ${assessment.title}`,
    paragraphs: [
      `Hello ${author.name},`,
      `${actor.name} reports that conditions at ${job.name} differ from revision ${revision.number}:`,
      data.text,
      "The revision is marked as needing review, and the next briefing shows this warning.",
    ],
    action: {
      label: "Open the assessment",
      url: appUrl(`/revisions/${revision.id}`),
    },
  });
  return {
    mail: await sendMail({
      organisationId: actor.organisationId,
      kind: "site-change",
      to: author.email,
      subject: `Site change reported: ${assessment.title}`,
      ...body,
    }),
  };
}

export async function setJobForemen(actor: Actor | null, jobId: string, input: unknown): Promise<void> {
  authorize(actor, "jobs:write");
  const db = await getDb();
  const job = isUuid(jobId) ? await db.query.jobs.findFirst({ where: eq(jobs.id, jobId) }) : undefined;
  if (!job || job.organisationId !== actor.organisationId) throw AppError.notFound("Job");
  const { foremanIds } = parseOrThrow(assignmentSchema, input);
  const valid = foremanIds.length
    ? await db
        .select({ id: users.id })
        .from(users)
        .where(
          and(inArray(users.id, foremanIds), eq(users.organisationId, actor.organisationId), eq(users.role, "foreman")),
        )
    : [];
  if (valid.length !== new Set(foremanIds).size)
    throw new AppError("validation", "Some fields need attention", [
      { path: "foremanIds", message: "Choose foremen of your organisation" },
    ]);
  await db.transaction(async (tx) => {
    await tx.delete(jobAssignments).where(eq(jobAssignments.jobId, jobId));
    if (valid.length)
      await tx
        .insert(jobAssignments)
        .values(valid.map((v) => ({ organisationId: actor.organisationId, jobId, userId: v.id })));
    await recordAudit(tx, {
      organisationId: actor.organisationId,
      actorId: actor.id,
      action: "job.foremen-assigned",
      entityType: "job",
      entityId: jobId,
      details: { foremanIds: valid.map((v) => v.id) },
    });
  });
}

/** The briefing sheet PDF of a revision; with a briefing's record when one is named. */
export async function briefingSheetPdf(
  actor: Actor | null,
  revisionId: string,
  briefingId?: string,
): Promise<{ filename: string; data: Uint8Array }> {
  const { script, title, job, revision, siteChanges } = await getBriefingScript(actor, revisionId);
  const { buildBriefingSheet } = await import("../pack/briefing-sheet");
  const { packFonts } = await import("../pack/render");
  let record;
  if (briefingId) {
    const r = await getBriefingRecord(actor, briefingId);
    if (r.briefing.revisionId !== revisionId) throw AppError.notFound("Briefing");
    record = {
      place: r.briefing.place,
      startedAt: r.briefing.startedAt,
      foremanName: r.briefing.foremanName,
      attendees: r.attendees,
    };
  }
  const data = await buildBriefingSheet(
    { title, jobName: job.name, revisionNumber: revision.number, script, siteChanges, record },
    await packFonts(),
  );
  return { filename: `briefing-${title.replace(/[^A-Za-z0-9]+/g, "-").slice(0, 50)}-rev${revision.number}.pdf`, data };
}

/** E-mails the briefing sheet to the foreman asking for it. */
export async function emailBriefingSheet(actor: Actor | null, revisionId: string): Promise<SendOutcome> {
  const sheet = await briefingSheetPdf(actor, revisionId);
  const { title, job } = await getBriefingScript(actor, revisionId);
  const body = renderMail({
    heading: `Briefing sheet: ${title}`,
    paragraphs: [
      `Hello ${actor!.name},`,
      `The briefing sheet for ${job.name} is attached, for when the signal is poor at the access point.`,
    ],
    footnote:
      "Brief from the approved revision only. If conditions differ on site, record a site change note in Heftwise.",
  });
  return sendMail({
    organisationId: actor!.organisationId,
    kind: "briefing-sheet",
    to: actor!.email,
    subject: `Briefing sheet: ${title}`,
    attachments: [{ filename: sheet.filename, content: Buffer.from(sheet.data), contentType: "application/pdf" }],
    ...body,
  });
}
