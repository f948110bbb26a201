/**
 * The approval workflow after submission: the approval request with the draft pack, the approver's
 * countersignature (the revision is then locked, the pack signed, the previous approved revision
 * superseded) or return with comments, a new revision from an approved one, pack downloads,
 * verification of an uploaded pack, and the audit trail.
 */
import { ukDate } from "@/lib/dates";
import "server-only";
import { and, asc, desc, eq, inArray, ne } from "drizzle-orm";
import { z } from "zod";
import { getDb, type Tx } from "@/db/client";
import {
  assessments,
  auditEvents,
  issuedPacks,
  organisations,
  revisions,
  signatures,
  storedFiles,
  users,
} from "@/db/schema";
import { recordAudit } from "@/lib/audit";
import { sha256Hex } from "@/lib/hash";
import { appUrl } from "@/lib/config";
import { drawnSignatureSchema } from "@/lib/drawn-signature";
import { AppError, parseOrThrow, parseOrThrowAsync } from "@/lib/errors";
import { renderMail } from "@/lib/mail/layout";
import { sendMail, type SendOutcome } from "@/lib/mail/send";
import { authorize, can, type Actor } from "@/lib/permissions";
import { getSigningKey } from "@/lib/signing-keys";
import { putFile } from "@/lib/storage";
import { renderPack } from "../pack/render";
import { STEP_KEYS, submitRevisionSchema } from "./schemas";
import { contentHash, getRevision, loadRevision, reviewOf } from "./service";
import { isAssignedToJob } from "../briefing/assignment";
import { isUuid } from "@/lib/ids";
import { confirmIdentity } from "@/lib/auth/step-up";
import { closeSiteChanges } from "../briefing/site-changes";

export async function storePack(
  tx: Tx,
  organisationId: string,
  revisionId: string,
  pdf: Uint8Array,
  kind: "draft" | "approved",
) {
  const file = await putFile(tx, organisationId, pdf, "application/pdf");
  await tx.insert(issuedPacks).values({ organisationId, revisionId, fileId: file.id, sha256: file.sha256, kind });
}

async function person(id: string | null) {
  if (!id) return null;
  const db = await getDb();
  return (await db.query.users.findFirst({ where: eq(users.id, id) })) ?? null;
}

const packName = (title: string, number: number, kind: string) =>
  `${title
    .replace(/[^A-Za-z0-9]+/g, "-")
    .replace(/^-|-$/g, "")
    .slice(0, 60)}-rev${number}-${kind}.pdf`;

/** Submits a complete draft to a named approver; refused (422) while anything required is missing. */
export async function submitRevision(
  actor: Actor | null,
  revisionId: string,
  input: unknown,
  { notify = true } = {},
): Promise<{ mail: SendOutcome | null }> {
  authorize(actor, "assessments:submit");
  // Whose record first: another organisation's revision is "not found" whatever the body says.
  const current = await getRevision(actor, revisionId);
  const data = parseOrThrow(submitRevisionSchema, input);
  if (current.revision.status !== "draft")
    throw new AppError("conflict", `This revision is already ${current.revision.status}.`);
  if (current.revision.version !== data.version)
    throw new AppError("conflict", "The draft changed since you reviewed it. Review it again before submitting.");
  const review = reviewOf(current);
  if (!review.canSubmit)
    throw new AppError(
      "validation",
      "The assessment is not complete",
      review.missing.map((m) => ({ path: m.step, message: m.message })),
    );
  const db = await getDb();
  const approver = await db.query.users.findFirst({ where: eq(users.id, data.approverId) });
  if (!approver || approver.organisationId !== actor.organisationId || approver.role !== "approver" || !approver.active)
    throw new AppError("validation", "Some fields need attention", [
      { path: "approverId", message: "Choose an active approver of your organisation" },
    ]);
  const hash = contentHash(current.content);
  await db.transaction(async (tx) => {
    const [updated] = await tx
      .update(revisions)
      .set({
        status: "submitted",
        approverId: approver.id,
        reviewDate: data.reviewDate,
        submittedAt: new Date(),
        contentHash: hash,
        results: review.scores,
        worstBand: review.worstBand,
        updatedAt: new Date(),
      })
      .where(and(eq(revisions.id, revisionId), eq(revisions.version, data.version), eq(revisions.status, "draft")))
      .returning({ id: revisions.id });
    if (!updated)
      throw new AppError("conflict", "The draft changed since you reviewed it. Review it again before submitting.");
    await recordAudit(tx, {
      organisationId: actor.organisationId,
      actorId: actor.id,
      action: "revision.submitted",
      entityType: "revision",
      entityId: revisionId,
      contentHash: hash,
      details: { approverId: approver.id },
      auth: actor.auth,
    });
  });
  // After the commit: a failed e-mail is logged and shown, and never undoes the submission.
  return { mail: notify ? await sendApprovalRequest(actor, revisionId) : null };
}

/** After submission: the draft pack, stored, and the approval request e-mailed to the approver with it. */
async function sendApprovalRequest(actor: Actor, revisionId: string): Promise<SendOutcome> {
  const db = await getDb();
  const { revision, assessment, job } = await getRevision(actor, revisionId);
  const approver = await person(revision.approverId);
  if (!approver) throw AppError.notFound("Approver");
  let attachment: { filename: string; content: Buffer; contentType: string } | undefined;
  try {
    const pdf = await db.transaction(async (tx) => {
      const bytes = await renderPack(tx, revisionId);
      await storePack(tx, actor.organisationId, revisionId, bytes, "draft");
      return bytes;
    });
    attachment = {
      filename: packName(assessment.title, revision.number, "draft"),
      content: Buffer.from(pdf),
      contentType: "application/pdf",
    };
  } catch (err) {
    // The submission stands; the e-mail says the pack is on the review page instead.
    console.error("draft pack failed", err);
  }
  const body = renderMail({
    heading: `Please review: ${assessment.title}`,
    paragraphs: [
      `Hello ${approver.name},`,
      `${actor.name} has submitted revision ${revision.number} of "${assessment.title}" (${job.name}) for your countersignature.` +
        (revision.reviewDate ? ` The proposed review date is ${ukDate(revision.reviewDate)}.` : ""),
      attachment
        ? "The draft pack is attached. Review it in Heftwise, then countersign it or return it with comments."
        : "Open the review page to read it, then countersign it or return it with comments.",
    ],
    action: { label: "Open the review", url: appUrl(`/reviews/${revisionId}`) },
    footnote: "The attached draft is not for use on site until it is approved.",
  });
  return sendMail({
    organisationId: actor.organisationId,
    kind: "approval-request",
    to: approver.email,
    subject: `Review requested: ${assessment.title} (rev. ${revision.number})`,
    attachments: attachment ? [attachment] : undefined,
    ...body,
  });
}

/** The revision as its approver reviews it: only the named approver, only while submitted or after. */
export async function getReview(actor: Actor | null, revisionId: string) {
  authorize(actor, "reviews:read");
  const db = await getDb();
  const [row] = isUuid(revisionId) ? await db.select().from(revisions).where(eq(revisions.id, revisionId)) : [];
  if (!row || row.organisationId !== actor.organisationId || row.status === "draft")
    throw AppError.notFound("Revision");
  if (row.approverId !== actor.id) throw new AppError("forbidden", "This revision was submitted to another approver");
  const data = await loadRevision(actor.organisationId, revisionId);
  const signed = await db
    .select({ name: signatures.signerName, role: signatures.signerRole, signedAt: signatures.signedAt })
    .from(signatures)
    .where(eq(signatures.revisionId, revisionId));
  return { ...data, signatures: signed, author: await person(row.authorId) };
}

export const approveSchema = z.object({
  name: z.string().trim().min(2, "Type your name").max(120),
  role: z.string().trim().min(2, "Type your role").max(120),
  signature: drawnSignatureSchema("Draw your signature"),
  version: z.number().int().min(1),
  /** The content hash of the revision the approver read: a signature binds to what was seen. */
  contentHash: z.string().regex(/^[0-9a-f]{64}$/, "Reload the page: the revision's fingerprint is missing"),
  /** Step-up: the approver's password again, and a second-factor code when they have one. */
  password: z.string().min(1, "Enter your password to confirm it is you").max(200),
  code: z.string().trim().max(20).optional(),
});

export const returnSchema = z.object({
  version: z.number().int().min(1),
  comments: z
    .partialRecord(z.enum(STEP_KEYS), z.string().trim().max(4000, "Use at most 4000 characters"))
    .refine((c) => Object.values(c).some((t) => t.length > 0), "Write at least one comment"),
});

async function submittedToMe(actor: Actor, revisionId: string, version: number) {
  const { revision } = await getReview(actor, revisionId);
  if (revision.status !== "submitted") throw new AppError("conflict", `This revision is already ${revision.status}.`);
  if (revision.version !== version)
    throw new AppError("conflict", "The revision changed since you opened it. Reload the page.");
  return revision;
}

/**
 * Countersigns: the approver proves who they are again (step-up) for the content they read, then the
 * revision is locked, the previous approved one superseded, and the signed pack stored. All or nothing.
 */
export async function approveRevision(
  actor: Actor | null,
  revisionId: string,
  input: unknown,
  { notify = true } = {},
): Promise<{ mail: SendOutcome | null }> {
  authorize(actor, "reviews:decide");
  const data = await parseOrThrowAsync(approveSchema, input);
  const png = data.signature;
  const revision = await submittedToMe(actor, revisionId, data.version);
  const hash = revision.contentHash ?? contentHash(revision.content);
  if (data.contentHash !== hash)
    throw new AppError("conflict", "The revision is not the one you read. Reload the page and read it again.");
  const auth = await confirmIdentity(
    actor,
    { password: data.password, code: data.code },
    { address: actor.auth?.address ?? null, client: actor.auth?.client ?? null },
  );
  const db = await getDb();
  const org = await db.query.organisations.findFirst({ where: eq(organisations.id, actor.organisationId) });
  const key = await getSigningKey(actor.organisationId, org!.name);
  await db.transaction(async (tx) => {
    const [locked] = await tx
      .update(revisions)
      .set({ status: "approved", approvedAt: new Date(), version: revision.version + 1, updatedAt: new Date() })
      .where(and(eq(revisions.id, revisionId), eq(revisions.status, "submitted"), eq(revisions.version, data.version)))
      .returning({ id: revisions.id });
    if (!locked) throw new AppError("conflict", "The revision changed since you opened it. Reload the page.");
    const superseded = await tx
      .update(revisions)
      .set({ status: "superseded", updatedAt: new Date() })
      .where(
        and(
          eq(revisions.assessmentId, revision.assessmentId),
          eq(revisions.status, "approved"),
          ne(revisions.id, revisionId),
        ),
      )
      .returning({ id: revisions.id, number: revisions.number });
    await tx.insert(signatures).values({
      organisationId: actor.organisationId,
      revisionId,
      signerId: actor.id,
      signerName: data.name,
      signerRole: data.role,
      image: png,
      contentHash: hash,
    });
    // Recorded before the pack is drawn: its signing record ends with this approval.
    await recordAudit(tx, {
      organisationId: actor.organisationId,
      actorId: actor.id,
      action: "revision.approved",
      entityType: "revision",
      entityId: revisionId,
      contentHash: hash,
      details: { signerName: data.name, signerRole: data.role },
      auth,
    });
    for (const s of superseded)
      await recordAudit(tx, {
        organisationId: actor.organisationId,
        actorId: actor.id,
        action: "revision.superseded",
        entityType: "revision",
        entityId: s.id,
        details: { by: revisionId },
      });
    const pdf = await renderPack(tx, revisionId, key);
    await storePack(tx, actor.organisationId, revisionId, pdf, "approved");
    await recordAudit(tx, {
      organisationId: actor.organisationId,
      actorId: actor.id,
      action: "revision.pack-issued",
      entityType: "revision",
      entityId: revisionId,
      contentHash: hash,
      details: { kind: "approved", packSha256: sha256Hex(pdf) },
    });
  });
  return { mail: notify ? await notifyAuthor(actor, revisionId, "approved") : null };
}

/** Returns the revision to its author as a draft, with comments per section. */
export async function returnRevision(
  actor: Actor | null,
  revisionId: string,
  input: unknown,
): Promise<{ mail: SendOutcome }> {
  authorize(actor, "reviews:decide");
  const data = parseOrThrow(returnSchema, input);
  const revision = await submittedToMe(actor, revisionId, data.version);
  const comments = Object.fromEntries(Object.entries(data.comments).filter(([, t]) => t.length > 0));
  const db = await getDb();
  await db.transaction(async (tx) => {
    const [back] = await tx
      .update(revisions)
      .set({
        status: "draft",
        returnComments: { by: actor.name, at: new Date().toISOString(), comments },
        version: revision.version + 1,
        updatedAt: new Date(),
      })
      .where(and(eq(revisions.id, revisionId), eq(revisions.status, "submitted"), eq(revisions.version, data.version)))
      .returning({ id: revisions.id });
    if (!back) throw new AppError("conflict", "The revision changed since you opened it. Reload the page.");
    await recordAudit(tx, {
      organisationId: actor.organisationId,
      actorId: actor.id,
      action: "revision.returned",
      entityType: "revision",
      entityId: revisionId,
      contentHash: revision.contentHash,
      details: { sections: Object.keys(comments) },
      auth: actor.auth,
    });
  });
  return { mail: await notifyAuthor(actor, revisionId, "returned", comments) };
}

async function notifyAuthor(
  actor: Actor,
  revisionId: string,
  outcome: "approved" | "returned",
  comments?: Record<string, string>,
): Promise<SendOutcome> {
  const db = await getDb();
  const [row] = await db
    .select({ revision: revisions, title: assessments.title })
    .from(revisions)
    .innerJoin(assessments, eq(assessments.id, revisions.assessmentId))
    .where(eq(revisions.id, revisionId));
  const author = await person(row.revision.authorId);
  if (!author) return { id: "", status: "failed", error: "The author has no account" };
  const link = appUrl(`/revisions/${revisionId}`);
  const body =
    outcome === "approved"
      ? renderMail({
          heading: `Approved: ${row.title}`,
          paragraphs: [
            `Hello ${author.name},`,
            `${actor.name} countersigned revision ${row.revision.number}. It is locked, and the signed pack is ready to download and brief from.` +
              (row.revision.reviewDate ? ` Review it by ${ukDate(row.revision.reviewDate)}.` : ""),
          ],
          action: { label: "Open the approved revision", url: link },
        })
      : renderMail({
          heading: `Returned with comments: ${row.title}`,
          paragraphs: [
            `Hello ${author.name},`,
            `${actor.name} returned revision ${row.revision.number} to you. It is a draft again.`,
            ...Object.entries(comments ?? {}).map(([step, text]) => `${step}: ${text}`),
          ],
          action: { label: "Open the draft", url: link },
        });
  return sendMail({
    organisationId: actor.organisationId,
    kind: outcome === "approved" ? "revision-approved" : "revision-returned",
    to: author.email,
    subject: `${outcome === "approved" ? "Approved" : "Returned"}: ${row.title} (rev. ${row.revision.number})`,
    ...body,
  });
}

/** A new draft copied from the latest approved revision; refused while a draft or submission exists. */
export async function startNewRevision(actor: Actor | null, revisionId: string): Promise<{ revisionId: string }> {
  authorize(actor, "assessments:write");
  const { revision } = await getRevision(actor, revisionId);
  if (revision.status !== "approved") throw new AppError("conflict", "A new revision starts from the approved one.");
  const db = await getDb();
  return db.transaction(async (tx) => {
    const siblings = await tx
      .select()
      .from(revisions)
      .where(eq(revisions.assessmentId, revision.assessmentId))
      .orderBy(desc(revisions.number));
    if (siblings.some((s) => s.status === "draft" || s.status === "submitted"))
      throw new AppError("conflict", "This assessment already has a revision in progress.");
    // The new draft becomes the assessment's latest; the unique index allows one at a time.
    await tx
      .update(revisions)
      .set({ isLatest: false })
      .where(and(eq(revisions.assessmentId, revision.assessmentId), eq(revisions.isLatest, true)));
    const [created] = await tx
      .insert(revisions)
      .values({
        organisationId: actor.organisationId,
        assessmentId: revision.assessmentId,
        number: siblings[0].number + 1,
        isLatest: true,
        content: revision.content,
        results: revision.results,
        worstBand: revision.worstBand,
        authorId: actor.id,
      })
      .returning({ id: revisions.id });
    await recordAudit(tx, {
      organisationId: actor.organisationId,
      actorId: actor.id,
      action: "revision.started",
      entityType: "revision",
      entityId: created.id,
      contentHash: contentHash(revision.content),
      details: { from: revision.id },
      auth: actor.auth,
    });
    // A new revision is the adviser's answer to any site change reported against the old one.
    if (revision.needsReview) {
      const decided = await closeSiteChanges(tx, actor, revision.id, "new-revision", null);
      await recordAudit(tx, {
        organisationId: actor.organisationId,
        actorId: actor.id,
        action: "revision.site-change-reviewed",
        entityType: "revision",
        entityId: revision.id,
        details: { decision: "new-revision", revision: created.id, notes: decided },
        auth: actor.auth,
      });
    }
    return { revisionId: created.id };
  });
}

/** The newest pack of a revision (signed once approved), for those allowed to see it. */
export async function getPackFile(
  actor: Actor | null,
  revisionId: string,
): Promise<{ filename: string; data: Uint8Array }> {
  if (!actor) throw new AppError("unauthenticated", "Sign in to continue");
  const db = await getDb();
  const [row] = isUuid(revisionId)
    ? await db
        .select({ revision: revisions, title: assessments.title, jobId: assessments.jobId })
        .from(revisions)
        .innerJoin(assessments, eq(assessments.id, revisions.assessmentId))
        .where(eq(revisions.id, revisionId))
    : [];
  if (!row || row.revision.organisationId !== actor.organisationId) throw AppError.notFound("Pack");
  const r = row.revision;
  const allowed =
    can(actor, "assessments:read") ||
    (can(actor, "reviews:read") && r.approverId === actor.id) ||
    // A foreman: the same rule as the briefings — approved work of the jobs they are assigned to.
    (can(actor, "briefings:run") &&
      (r.status === "approved" || r.status === "superseded") &&
      (await isAssignedToJob(actor, row.jobId)));
  if (!allowed) throw new AppError("forbidden", "Your role does not allow this");
  const [pack] = await db
    .select({ kind: issuedPacks.kind, data: storedFiles.data })
    .from(issuedPacks)
    .innerJoin(storedFiles, eq(storedFiles.id, issuedPacks.fileId))
    .where(eq(issuedPacks.revisionId, revisionId))
    .orderBy(desc(issuedPacks.createdAt))
    .limit(1);
  if (pack) return { filename: packName(row.title, r.number, pack.kind), data: pack.data };
  // A draft never submitted has no stored pack: render a preview, not recorded as issued.
  const data = await db.transaction((tx) => renderPack(tx, revisionId));
  return { filename: packName(row.title, r.number, "preview"), data };
}

export type Verification =
  | {
      result: "authentic";
      status: string;
      title: string;
      revision: number;
      organisation: string;
      approvedAt: Date | null;
      kind: string;
    }
  | { result: "altered"; status: string; title: string; revision: number; organisation: string }
  | { result: "unknown" };

/**
 * What an uploaded pack is: byte for byte one Heftwise issued (and so carrying its signature), an
 * altered copy of one (its revision named inside, its bytes different), or unknown.
 */
export async function verifyPack(data: Uint8Array): Promise<Verification> {
  const db = await getDb();
  const hash = sha256Hex(data);
  const describe = async (revisionId: string) => {
    const [row] = await db
      .select({
        status: revisions.status,
        number: revisions.number,
        approvedAt: revisions.approvedAt,
        title: assessments.title,
        organisation: organisations.name,
      })
      .from(revisions)
      .innerJoin(assessments, eq(assessments.id, revisions.assessmentId))
      .innerJoin(organisations, eq(organisations.id, revisions.organisationId))
      .where(eq(revisions.id, revisionId));
    return row;
  };
  const [issued] = await db
    .select()
    .from(issuedPacks)
    .where(eq(issuedPacks.sha256, hash))
    .orderBy(asc(issuedPacks.createdAt))
    .limit(1);
  if (issued) {
    const r = await describe(issued.revisionId);
    return {
      result: "authentic",
      status: r.status,
      title: r.title,
      revision: r.number,
      organisation: r.organisation,
      approvedAt: r.approvedAt,
      kind: issued.kind,
    };
  }
  // An altered copy is named only when Heftwise issued a pack of that revision: a file that merely
  // contains a revision's id (a draft's, say) learns nothing about it.
  const named = Buffer.from(data)
    .toString("latin1")
    .match(/heftwise-revision:([0-9a-f-]{36})/);
  if (named) {
    const [issuedForRevision] = await db
      .select({ id: issuedPacks.id })
      .from(issuedPacks)
      .where(eq(issuedPacks.revisionId, named[1]))
      .limit(1);
    const r = issuedForRevision ? await describe(named[1]) : undefined;
    if (r)
      return { result: "altered", status: r.status, title: r.title, revision: r.number, organisation: r.organisation };
  }
  return { result: "unknown" };
}

/** Every audit event of an assessment's revisions, in the order of the organisation's chain. */
export async function listAssessmentAudit(actor: Actor | null, assessmentId: string) {
  authorize(actor, "assessments:read");
  const db = await getDb();
  const assessment = isUuid(assessmentId)
    ? await db.query.assessments.findFirst({ where: eq(assessments.id, assessmentId) })
    : undefined;
  if (!assessment || assessment.organisationId !== actor.organisationId) throw AppError.notFound("Assessment");
  const revs = await db
    .select({ id: revisions.id, number: revisions.number })
    .from(revisions)
    .where(eq(revisions.assessmentId, assessmentId));
  const numberOf = new Map(revs.map((r) => [r.id, r.number]));
  const events = await db
    .select({
      id: auditEvents.id,
      seq: auditEvents.seq,
      hash: auditEvents.hash,
      action: auditEvents.action,
      entityId: auditEvents.entityId,
      contentHash: auditEvents.contentHash,
      details: auditEvents.details,
      createdAt: auditEvents.createdAt,
      actorName: users.name,
    })
    .from(auditEvents)
    .leftJoin(users, eq(users.id, auditEvents.actorId))
    .where(
      and(
        eq(auditEvents.organisationId, actor.organisationId),
        eq(auditEvents.entityType, "revision"),
        inArray(
          auditEvents.entityId,
          revs.map((r) => r.id),
        ),
      ),
    )
    .orderBy(asc(auditEvents.seq));
  return { assessment, events: events.map((e) => ({ ...e, revision: numberOf.get(e.entityId!)! })) };
}
