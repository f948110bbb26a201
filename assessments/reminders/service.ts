/**
 * The reminder job: e-mails advisers and administrators ahead of each approved revision's review
 * date and when it is overdue, and approvers whose review requests have waited too long. Idempotent:
 * each (revision, kind, person) is claimed in `reminders_sent` before its e-mail goes, and only a
 * claim this run made is sent — so running the job twice, or twice at once, sends nothing twice. A
 * failed send gives its claim back for the next run. Every e-mail is logged by `sendMail`.
 */
import "server-only";
import { and, eq, inArray, isNotNull, lte } from "drizzle-orm";
import { getDb } from "@/db/client";
import { assessments, jobs, organisations, remindersSent, revisions, users } from "@/db/schema";
import { appUrl } from "@/lib/config";
import { renderMail } from "@/lib/mail/layout";
import { sendMail } from "@/lib/mail/send";
import { approvalIsWaiting, reviewReminderKind, ukDate, ukToday } from "./schedule";

export interface ReminderRun {
  sent: number;
  failed: number;
}

interface Due {
  organisationId: string;
  revisionId: string;
  kind: string;
  user: { id: string; name: string; email: string };
  mail: { subject: string; heading: string; paragraphs: string[]; action: { label: string; url: string } };
}

async function reviewReminders(now: Date): Promise<Due[]> {
  const db = await getDb();
  const today = ukToday(now);
  // Approved revisions with a review date within the longest lead time any organisation uses.
  const horizon = new Date(Date.parse(`${today}T00:00:00Z`) + 366 * 86_400_000).toISOString().slice(0, 10);
  const rows = await db
    .select({
      revisionId: revisions.id,
      organisationId: revisions.organisationId,
      number: revisions.number,
      reviewDate: revisions.reviewDate,
      authorId: revisions.authorId,
      title: assessments.title,
      job: jobs.name,
      leads: organisations.reviewReminderDays,
    })
    .from(revisions)
    .innerJoin(assessments, eq(assessments.id, revisions.assessmentId))
    .innerJoin(jobs, eq(jobs.id, assessments.jobId))
    .innerJoin(organisations, eq(organisations.id, revisions.organisationId))
    .where(and(eq(revisions.status, "approved"), isNotNull(revisions.reviewDate), lte(revisions.reviewDate, horizon)));
  const due = rows.flatMap((r) => {
    const kind = reviewReminderKind(r.reviewDate!, today, r.leads);
    return kind ? [{ ...r, kind }] : [];
  });
  if (!due.length) return [];
  const orgIds = [...new Set(due.map((d) => d.organisationId))];
  const people = await db
    .select({
      id: users.id,
      name: users.name,
      email: users.email,
      role: users.role,
      organisationId: users.organisationId,
    })
    .from(users)
    .where(and(inArray(users.organisationId, orgIds), eq(users.active, true), isNotNull(users.passwordHash)));
  return due.flatMap((d) => {
    const recipients = people.filter(
      (p) => p.organisationId === d.organisationId && (p.role === "admin" || p.id === d.authorId),
    );
    const overdue = d.kind === "review-overdue";
    return recipients.map((user) => ({
      organisationId: d.organisationId,
      revisionId: d.revisionId,
      kind: d.kind,
      user,
      mail: {
        subject: `${overdue ? "Review overdue" : "Review due"}: ${d.title} (rev. ${d.number})`,
        heading: overdue ? `Review overdue: ${d.title}` : `Review due by ${ukDate(d.reviewDate!)}: ${d.title}`,
        paragraphs: [
          `Hello ${user.name},`,
          overdue
            ? `Revision ${d.number} of this assessment (${d.job}) was due for review on ${ukDate(d.reviewDate!)}. Review it before the work continues: start a new revision if anything has changed, on the site or in the method.`
            : `Revision ${d.number} of this assessment (${d.job}) is due for review on ${ukDate(d.reviewDate!)}. Check that it still matches the work and the site; start a new revision if anything has changed.`,
        ],
        action: { label: "Open the assessment", url: appUrl(`/revisions/${d.revisionId}`) },
      },
    }));
  });
}

async function approvalReminders(now: Date): Promise<Due[]> {
  const db = await getDb();
  const rows = await db
    .select({
      revisionId: revisions.id,
      organisationId: revisions.organisationId,
      number: revisions.number,
      submittedAt: revisions.submittedAt,
      title: assessments.title,
      waitDays: organisations.approvalReminderDays,
      approver: { id: users.id, name: users.name, email: users.email, active: users.active },
    })
    .from(revisions)
    .innerJoin(assessments, eq(assessments.id, revisions.assessmentId))
    .innerJoin(organisations, eq(organisations.id, revisions.organisationId))
    .innerJoin(users, eq(users.id, revisions.approverId))
    .where(and(eq(revisions.status, "submitted"), isNotNull(revisions.submittedAt)));
  return rows
    .filter((r) => r.approver.active && approvalIsWaiting(r.submittedAt!, now, r.waitDays))
    .map((r) => ({
      organisationId: r.organisationId,
      revisionId: r.revisionId,
      kind: "approval-waiting",
      user: r.approver,
      mail: {
        subject: `Waiting for your review: ${r.title} (rev. ${r.number})`,
        heading: `Waiting for your review: ${r.title}`,
        paragraphs: [
          `Hello ${r.approver.name},`,
          `Revision ${r.number} was submitted to you on ${ukDate(ukToday(r.submittedAt!))} and is still waiting for your decision. The work it covers cannot be briefed until it is approved.`,
        ],
        action: { label: "Review it", url: appUrl(`/reviews/${r.revisionId}`) },
      },
    }));
}

/** Sends every reminder due at `now` that has not been sent before. */
export async function runReminders(now = new Date()): Promise<ReminderRun> {
  const db = await getDb();
  const due = [...(await reviewReminders(now)), ...(await approvalReminders(now))];
  let sent = 0;
  let failed = 0;
  for (const d of due) {
    const [claimed] = await db
      .insert(remindersSent)
      .values({ organisationId: d.organisationId, revisionId: d.revisionId, kind: d.kind, userId: d.user.id })
      .onConflictDoNothing()
      .returning({ id: remindersSent.id });
    if (!claimed) continue;
    const outcome = await sendMail({
      organisationId: d.organisationId,
      kind: `reminder-${d.kind.replace(/-\d+$/, "")}`,
      to: d.user.email,
      subject: d.mail.subject,
      ...renderMail({ ...d.mail, footnote: "Heftwise sends each reminder once." }),
    });
    if (outcome.status === "sent") sent++;
    else {
      failed++;
      await db.delete(remindersSent).where(eq(remindersSent.id, claimed.id));
    }
  }
  return { sent, failed };
}
