/**
 * Signing assurance: step-up at countersignature bound to the content hash, how each signer was
 * authenticated in the audit trail, the signing record in the signed pack matching the trail, and
 * the trail's hash chain — intact, then broken by an edit and by a removal, found by the check.
 */
import { execFileSync } from "node:child_process";
import { mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { and, asc, eq, sql } from "drizzle-orm";
import { generate } from "otplib";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { checkChain, exportAuditCsv } from "@/assessments/audit-trail/queries";
import { DEMO_PASSWORD } from "@/assessments/demo/scenario";
import {
  approveRevision,
  getPackFile,
  getReview,
  listAssessmentAudit,
  startNewRevision,
  submitRevision,
} from "@/assessments/revisions/approval";
import { listAssessments } from "@/assessments/revisions/queries";
import { getRevision } from "@/assessments/revisions/service";
import { getDb } from "@/db/client";
import { auditEvents, signInAttempts, users } from "@/db/schema";
import { confirmSecondFactor, startSecondFactor } from "@/lib/account/service";
import { recordAudit } from "@/lib/audit";
import { AppError } from "@/lib/errors";
import { startMailFake, type MailFake } from "@/lib/mail/fake-server";
import { drawnSignaturePng } from "@/lib/png";
import type { Actor } from "@/lib/permissions";
import { actorFor, demoOrganisation, reviewDateIn } from "./helpers";

let fake: MailFake;
let organisationId: string;
let adviser: Actor;
let approver: Actor;
const SIGNATURE = `data:image/png;base64,${drawnSignaturePng(2).toString("base64")}`;
const FROM_SITE_OFFICE = {
  via: "session" as const,
  method: "password",
  address: "10.20.0.7",
  client: "Mozilla/5.0 (X11; Linux x86_64) Chrome/140.0 Safari/537.36",
};

beforeAll(async () => {
  fake = await startMailFake({ smtpPort: 0, httpPort: 0 });
  process.env.SMTP_URL = `smtp://127.0.0.1:${fake.smtpPort}`;
  ({ organisationId } = await demoOrganisation());
  adviser = { ...(await actorFor("adviser", organisationId)), auth: FROM_SITE_OFFICE };
  approver = { ...(await actorFor("approver", organisationId)), auth: { ...FROM_SITE_OFFICE, address: "10.20.0.9" } };
});
afterAll(() => fake.close());

async function failure(promise: Promise<unknown>): Promise<AppError> {
  const err = await promise.then(
    () => null,
    (e: unknown) => e,
  );
  expect(err).toBeInstanceOf(AppError);
  return err as AppError;
}

/** A new revision of the demo's approved assessment, submitted to the approver: its id and the hash the approver reads. */
async function submitted() {
  const list = await listAssessments(adviser);
  // One demo assessment goes round: a revision left awaiting the approver by a refused attempt is
  // approved by the next test; once approved, a new revision is started from it.
  const waiting = list.find((a) => a.status === "submitted" && a.title.includes("Hollin Vale"));
  if (waiting) {
    const { revision } = await getReview(approver, waiting.revisionId);
    return { id: waiting.revisionId, version: revision.version, contentHash: revision.contentHash! };
  }
  const approved = list.find((a) => a.status === "approved")!;
  const { revisionId: id } = await startNewRevision(adviser, approved.revisionId);
  const current = await getRevision(adviser, id);
  await submitRevision(
    adviser,
    id,
    { version: current.revision.version, approverId: approver.id, reviewDate: reviewDateIn(200) },
    { notify: false },
  );
  const { revision } = await getReview(approver, id);
  return { id, version: revision.version, contentHash: revision.contentHash! };
}

const approval = (r: { version: number; contentHash: string }, extra: Record<string, unknown> = {}) => ({
  version: r.version,
  contentHash: r.contentHash,
  name: "Ruth Okonjo-Vale",
  role: "Contracts manager",
  signature: SIGNATURE,
  password: DEMO_PASSWORD,
  ...extra,
});

describe("step-up at countersignature", () => {
  it("an open session is not enough: a wrong or missing password is refused and nothing changes", async () => {
    const r = await submitted();
    const missing = await failure(approveRevision(approver, r.id, approval(r, { password: "" }), { notify: false }));
    expect(missing.issues).toEqual([{ path: "password", message: "Enter your password to confirm it is you" }]);
    const wrong = await failure(
      approveRevision(approver, r.id, approval(r, { password: "left-open-on-site" }), { notify: false }),
    );
    expect(wrong.issues).toEqual([{ path: "password", message: "That password is not right" }]);
    expect((await getReview(approver, r.id)).revision.status).toBe("submitted");
  });

  it("the signature binds to the content read: another hash is refused", async () => {
    const r = await submitted();
    const stale = await failure(
      approveRevision(approver, r.id, approval(r, { contentHash: "0".repeat(64) }), { notify: false }),
    );
    expect(stale.code).toBe("conflict");
    expect((await getReview(approver, r.id)).revision.status).toBe("submitted");
  });

  it("records how the signer was authenticated, from where, and the hash they saw; the pack's signing record matches", async () => {
    const r = await submitted();
    await approveRevision(approver, r.id, approval(r), { notify: false });
    const db = await getDb();
    const events = await db
      .select()
      .from(auditEvents)
      .where(and(eq(auditEvents.entityType, "revision"), eq(auditEvents.entityId, r.id)))
      .orderBy(asc(auditEvents.seq));
    const approved = events.find((e) => e.action === "revision.approved")!;
    expect(approved.contentHash).toBe(r.contentHash);
    expect((approved.details as { auth: object }).auth).toEqual({
      via: "step-up",
      method: "password",
      address: "10.20.0.9",
      client: FROM_SITE_OFFICE.client,
    });
    const submittedEvent = events.find((e) => e.action === "revision.submitted")!;
    expect((submittedEvent.details as { auth: object }).auth).toEqual(FROM_SITE_OFFICE);

    // The signed pack ends with the signing record: each life event with its chain number and hash.
    const pack = await getPackFile(adviser, r.id);
    const dir = mkdtempSync(path.join(tmpdir(), "heftwise-record-"));
    writeFileSync(path.join(dir, "pack.pdf"), pack.data);
    const text = execFileSync("pdftotext", ["-layout", path.join(dir, "pack.pdf"), "-"], { encoding: "utf8" });
    expect(text).toContain("Signing record");
    for (const e of events.filter((e) => e.action !== "revision.pack-issued")) {
      expect(text).toContain(e.hash!.slice(0, 12));
    }
    expect(text).toContain("Approved and");
    expect(text).toMatch(/re-confirmed at signing: password;/);
    expect(text).toContain("10.20.0.9");

    // The assessment's audit page lists the same events, in chain order, with the same numbers.
    const assessmentId = (await getRevision(adviser, r.id)).revision.assessmentId;
    const trail = await listAssessmentAudit(adviser, assessmentId);
    const seqs = trail.events.map((e) => e.seq);
    expect(seqs).toEqual([...seqs].sort((a, b) => a - b));
    for (const e of events) expect(trail.events.find((t) => t.id === e.id)).toMatchObject({ seq: e.seq, hash: e.hash });
  });

  it("an approver with a second factor must give a code too", async () => {
    const { secret } = await startSecondFactor(approver);
    const { recoveryCodes } = await confirmSecondFactor(approver, { code: await generate({ secret }) });
    const r = await submitted();
    const noCode = await failure(approveRevision(approver, r.id, approval(r), { notify: false }));
    expect(noCode.issues).toEqual([{ path: "code", message: "Enter the code from your authenticator app" }]);
    const badCode = await failure(approveRevision(approver, r.id, approval(r, { code: "111111" }), { notify: false }));
    expect(badCode.issues).toEqual([{ path: "code", message: "That code was not recognised" }]);
    await approveRevision(approver, r.id, approval(r, { code: recoveryCodes[3] }), { notify: false });
    const db = await getDb();
    const [approved] = await db
      .select()
      .from(auditEvents)
      .where(and(eq(auditEvents.entityId, r.id), eq(auditEvents.action, "revision.approved")));
    expect((approved.details as { auth: { method: string } }).auth.method).toBe("password+recovery-code");
  });

  it("repeated wrong passwords at signing are throttled like sign-in", async () => {
    const db = await getDb();
    await db.delete(signInAttempts);
    const r = await submitted();
    for (let i = 0; i < 5; i++)
      await failure(approveRevision(approver, r.id, approval(r, { password: `guess-${i}` }), { notify: false }));
    const throttled = await failure(approveRevision(approver, r.id, approval(r), { notify: false }));
    expect(throttled.code).toBe("rate_limited");
  });
});

describe("the tamper-evident audit trail", () => {
  it("is intact after real work, with every event linked to the one before", async () => {
    const report = await checkChain(organisationId);
    expect(report).toMatchObject({ intact: true });
    expect(report.checked).toBeGreaterThan(5);
  });

  it("exports as CSV with the chain's hashes; a formula-like name is neutralised", async () => {
    const db = await getDb();
    const [prankster] = await db
      .insert(users)
      .values({ organisationId, email: "prank@brackenfold.example", name: "=HYPERLINK(1)", role: "foreman" })
      .returning();
    await db.transaction((tx) =>
      recordAudit(tx, {
        organisationId,
        actorId: prankster.id,
        action: "test.note",
        entityType: "note",
        entityId: null,
      }),
    );
    let csv = "";
    for await (const chunk of exportAuditCsv({ ...(await actorFor("admin", organisationId)) })) csv += chunk;
    const lines = csv.trim().split("\r\n");
    expect(lines[0]).toBe(
      "seq,time_utc,actor,actor_email,action,entity_type,entity_id,content_hash,details,prev_hash,hash",
    );
    expect(lines.length - 1).toBe((await checkChain(organisationId)).checked);
    expect(csv).toContain(",'=HYPERLINK(1),prank@brackenfold.example,test.note,");
  });

  it("an edited event breaks its own link; a removed one breaks the next", async () => {
    const db = await getDb();
    const [victim] = await db
      .select()
      .from(auditEvents)
      .where(and(eq(auditEvents.organisationId, organisationId), eq(auditEvents.action, "revision.approved")))
      .limit(1);
    await db
      .update(auditEvents)
      .set({ details: sql`jsonb_set(${auditEvents.details}, '{signerName}', '"Somebody Else"')` })
      .where(eq(auditEvents.id, victim.id));
    expect(await checkChain(organisationId)).toMatchObject({
      intact: false,
      broken: { seq: victim.seq, id: victim.id, reason: "altered" },
    });
    // Put it back, then remove another event instead.
    await db.update(auditEvents).set({ details: victim.details }).where(eq(auditEvents.id, victim.id));
    expect(await checkChain(organisationId)).toMatchObject({ intact: true });
    await db.delete(auditEvents).where(and(eq(auditEvents.organisationId, organisationId), eq(auditEvents.seq, 3)));
    expect(await checkChain(organisationId)).toMatchObject({
      intact: false,
      checked: 2,
      broken: { seq: 3, reason: "missing" },
    });
  });
});
