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

export async function startBriefing(actor: Actor | null, input: unknown): Promise<{ briefingId: string }> {
  authorize(actor, "briefings:run");
  const data = parseOrThrow(startBriefingSchema, input);
  await briefableRevision(actor, data.revisionId);
  const db = await getDb();
  return db.transaction(async (tx) => {
    const [row] = await tx
      .insert(briefings)
      .values({
        organisationId: actor.organisationId,
        revisionId: data.revisionId,
        foremanId: actor.id,
        foremanName: actor.name,
        place: data.place,
      })
      .returning({ id: briefings.id });
    await recordAudit(tx, {
      organisationId: actor.organisationId,
      actorId: actor.id,
      action: "briefing.started",
      entityType: "revision",
      entityId: data.revisionId,
      details: { briefingId: row.id, place: data.place },
      auth: actor.auth,
    });
    return { briefingId: row.id };
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
export async function completeBriefing(actor: Actor | null, briefingId: string, input: unknown): Promise<void> {
  authorize(actor, "briefings:run");
  const briefing = await ownBriefing(actor, briefingId);
  const data = await parseOrThrowAsync(completeBriefingSchema, input);
  if (briefing.completedAt) throw new AppError("conflict", "This briefing is already signed off.");
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
  await db.transaction(async (tx) => {
    // Claim the sign-off: of two at once, only one updates the row and re-issues the pack.
    const [claimed] = await tx
      .update(briefings)
      .set({ completedAt: new Date(), foremanSignature: data.signature })
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
      details: { briefingId, attendees: attendees.length },
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
  const author = revision.authorId
    ? await db.query.users.findFirst({ where: eq(users.id, revision.authorId) })
    : undefined;
  if (!author) return { mail: { id: "", status: "failed", error: "The assessment has no author to tell" } };
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
