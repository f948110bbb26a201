/**
 * The reminder job against the demo organisation, through the SMTP fake: review dates ahead and
 * overdue reach the author and the administrators, a waiting review request reaches its approver,
 * and running the job again sends nothing twice.
 */
import { eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { runReminders } from "@/assessments/reminders/service";
import { listAssessments } from "@/assessments/revisions/queries";
import { getDb } from "@/db/client";
import { outboundEmails, revisions } from "@/db/schema";
import { startMailFake, type MailFake } from "@/lib/mail/fake-server";
import type { Actor } from "@/lib/permissions";
import { actorFor, demoOrganisation } from "./helpers";

let fake: MailFake;
let adviser: Actor;
let admin: Actor;
let approvedId: string;

beforeAll(async () => {
  fake = await startMailFake({ smtpPort: 0, httpPort: 0 });
  process.env.SMTP_URL = `smtp://127.0.0.1:${fake.smtpPort}`;
  const { organisationId } = await demoOrganisation();
  adviser = await actorFor("adviser", organisationId);
  admin = await actorFor("admin", organisationId);
  approvedId = (await listAssessments(adviser)).find((a) => a.status === "approved")!.revisionId;
});
afterAll(() => fake.close());

const NOW = new Date("2027-02-01T08:00:00Z");
const inbox = (subject: RegExp) => fake.messages.filter((m) => subject.test(m.subject));

describe("the reminder job", () => {
  it("reminds the author and the administrators ahead of a review date, once however often it runs", async () => {
    const db = await getDb();
    await db.update(revisions).set({ reviewDate: "2027-02-06" }).where(eq(revisions.id, approvedId));
    const first = await runReminders(NOW);
    expect(first.sent).toBeGreaterThanOrEqual(2);
    const due = inbox(/^Review due: /);
    expect(due.map((m) => m.to[0]).sort()).toEqual([admin.email, adviser.email].sort());
    expect(due[0].text).toContain("due for review on 06-02-2027");
    expect(due[0].text).toContain(`/revisions/${approvedId}`);

    const again = await runReminders(NOW);
    expect(again).toEqual({ sent: 0, failed: 0 });
    expect(inbox(/^Review due: /)).toHaveLength(due.length);
    // Logged like every e-mail.
    const logged = await db.select().from(outboundEmails).where(eq(outboundEmails.kind, "reminder-review-due"));
    expect(logged.filter((l) => l.status === "sent")).toHaveLength(due.length);
  });

  it("and once more when it is overdue", async () => {
    await runReminders(new Date("2027-02-07T08:00:00Z"));
    await runReminders(new Date("2027-02-08T08:00:00Z"));
    const overdue = inbox(/^Review overdue: /);
    expect(overdue.map((m) => m.to[0]).sort()).toEqual([admin.email, adviser.email].sort());
  });

  it("reminds an approver whose review request has waited the organisation's days", async () => {
    const db = await getDb();
    const approver = await actorFor("approver", adviser.organisationId);
    const draft = (await listAssessments(adviser)).find((a) => a.status === "draft")!;
    await db
      .update(revisions)
      .set({ status: "submitted", approverId: approver.id, submittedAt: new Date("2027-02-01T08:00:00Z") })
      .where(eq(revisions.id, draft.revisionId));
    expect((await runReminders(new Date("2027-02-03T08:00:00Z"))).sent).toBe(0);
    expect((await runReminders(new Date("2027-02-04T08:00:00Z"))).sent).toBe(1);
    expect((await runReminders(new Date("2027-02-05T08:00:00Z"))).sent).toBe(0);
    const waiting = inbox(/^Waiting for your review: /);
    expect(waiting).toHaveLength(1);
    expect(waiting[0].to).toEqual([approver.email]);
    expect(waiting[0].text).toContain(`/reviews/${draft.revisionId}`);
  });
});
