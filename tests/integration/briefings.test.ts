/** Briefings on the server: approved revisions of assigned jobs only, sign-on once per key, sign-off, site changes. */
import { execFileSync, spawnSync } from "node:child_process";
import { mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { beforeAll, describe, expect, it } from "vitest";
import {
  approveRevision,
  getPackFile,
  getReview,
  startNewRevision,
  submitRevision,
  verifyPack,
} from "@/assessments/revisions/approval";
import { getRevision } from "@/assessments/revisions/service";
import { DEMO_PASSWORD } from "@/assessments/demo/scenario";
import {
  briefingSheetPdf,
  completeBriefing,
  createSiteChangeNote,
  decideSiteChanges,
  recordAttendee,
  setJobForemen,
  startBriefing,
} from "@/assessments/briefing/service";
import {
  getBriefingRecord,
  getBriefingScript,
  listForemanJobs,
  listForemen,
  listOpenSiteChanges,
} from "@/assessments/briefing/queries";
import { listAssessments } from "@/assessments/revisions/queries";
import { eq } from "drizzle-orm";
import { getDb } from "@/db/client";
import { issuedPacks, outboundEmails } from "@/db/schema";
import { AppError } from "@/lib/errors";
import type { Actor } from "@/lib/permissions";
import { drawnSignaturePng } from "@/lib/png";
import { actorFor, demoOrganisation, otherOrganisation, reviewDateIn } from "./helpers";

let foreman: Actor;
let adviser: Actor;
let approvedId: string;
const signature = `data:image/png;base64,${drawnSignaturePng(7).toString("base64")}`;
/** The text of a PDF, by poppler's pdftotext. */
async function pdfText(data: Uint8Array): Promise<string> {
  const file = path.join(mkdtempSync(path.join(tmpdir(), "heftwise-brief-")), "pack.pdf");
  writeFileSync(file, data);
  return execFileSync("pdftotext", [file, "-"], { encoding: "utf8" });
}

const code = (p: Promise<unknown>) =>
  p.then(
    () => "ok",
    (e) => (e instanceof AppError ? e.code : String(e)),
  );
const attendee = (key: string, name = "Kieran Lusk") => ({
  key,
  name,
  employer: "Brackenfold Lineside",
  cardNumber: "PTS 77120",
  signature,
  signedAt: new Date().toISOString(),
});

beforeAll(async () => {
  process.env.SMTP_URL = "smtp://127.0.0.1:9";
  const { organisationId } = await demoOrganisation();
  foreman = await actorFor("foreman", organisationId);
  adviser = await actorFor("adviser", organisationId);
  approvedId = (await listAssessments(adviser)).find((a) => a.status === "approved")!.revisionId;
});

describe("what a foreman sees", () => {
  it("assigned jobs with their approved revisions only, never drafts", async () => {
    const jobs = await listForemanJobs(foreman);
    const revisions = jobs.flatMap((j) => j.revisions.map((r) => r.revisionId));
    expect(revisions).toEqual([approvedId]);
    const drafts = (await listAssessments(adviser)).filter((a) => a.status === "draft");
    for (const d of drafts) expect(await code(getBriefingScript(foreman, d.revisionId))).toBe("not_found");
    expect(await code(listForemanJobs(adviser))).toBe("forbidden");
  });

  it("the script reads each load in plain words, with the band and the caution-worthy lines", async () => {
    const { script } = await getBriefingScript(foreman, approvedId);
    expect(script.loads.length).toBeGreaterThan(0);
    const carry = script.loads.find((l) => l.lines.some((x) => x.startsWith("Carry it against your body")))!;
    expect(carry.lines.join(" ")).toMatch(/rest at least every 10 m/);
    expect(script.emergency.nearestHospital).toContain("Hollin Vale General Hospital");
  });

  it("unassigning the foreman hides the job; another organisation gets 404", async () => {
    const jobId = (await listForemanJobs(foreman)).find((j) => j.revisions.length)!.job.id;
    expect(await code(getPackFile(foreman, approvedId))).toBe("ok");
    await setJobForemen(adviser, jobId, { foremanIds: [] });
    expect(await code(getBriefingScript(foreman, approvedId))).toBe("not_found");
    // One rule for both: no assignment, no pack either.
    expect(await code(getPackFile(foreman, approvedId))).toBe("forbidden");
    await setJobForemen(adviser, jobId, { foremanIds: [foreman.id] });
    const other = await otherOrganisation();
    expect(await code(setJobForemen(other.admin, jobId, { foremanIds: [] }))).toBe("not_found");
    expect(await code(listForemen(other.admin, jobId))).toBe("not_found");
  });

  it("a file that merely contains a draft's id learns nothing about it at /verify", async () => {
    const draft = (await listAssessments(adviser)).find((a) => a.status === "draft")!;
    expect(await verifyPack(Buffer.from(`%PDF-1.4 heftwise-revision:${draft.revisionId}`))).toEqual({
      result: "unknown",
    });
  });
});

describe("a briefing", () => {
  it("records each sign-on once, however often the phone sends it, then closes at the foreman's signature", async () => {
    expect(await code(startBriefing(foreman, { revisionId: approvedId, place: "" }))).toBe("validation");
    const { briefingId } = await startBriefing(foreman, { revisionId: approvedId, place: "Gorsey Lane gate" });
    expect(await code(completeBriefing(foreman, briefingId, { signature }))).toBe("validation");
    const first = await recordAttendee(foreman, briefingId, attendee("key-aaaaaaaaaaaaaaaa"));
    const again = await recordAttendee(foreman, briefingId, attendee("key-aaaaaaaaaaaaaaaa"));
    expect(again).toEqual({ id: first.id, duplicate: true });
    await recordAttendee(foreman, briefingId, attendee("key-bbbbbbbbbbbbbbbb", "Aled Menhenick"));
    expect(
      await code(recordAttendee(foreman, briefingId, { ...attendee("key-cccccccccccccccc"), cardNumber: "" })),
    ).toBe("validation");
    expect(
      await code(
        recordAttendee(foreman, briefingId, {
          ...attendee("key-dddddddddddddddd"),
          signature: "data:image/png;base64,AAAA",
        }),
      ),
    ).toBe("validation");
    await completeBriefing(foreman, briefingId, { signature });
    expect(await code(recordAttendee(foreman, briefingId, attendee("key-eeeeeeeeeeeeeeee")))).toBe("conflict");
    expect(await recordAttendee(foreman, briefingId, attendee("key-aaaaaaaaaaaaaaaa"))).toEqual({
      id: first.id,
      duplicate: true,
    });
    const record = await getBriefingRecord(foreman, briefingId);
    expect(record.attendees.map((a) => a.name).sort()).toEqual(["Aled Menhenick", "Kieran Lusk"]);
    expect(record.briefing.completedAt).not.toBeNull();
    const sheet = await briefingSheetPdf(foreman, approvedId, briefingId);
    expect(Buffer.from(sheet.data).subarray(0, 5).toString()).toBe("%PDF-");
    // The briefing record joins the signed pack, re-issued and verifiable.
    const pack = await getPackFile(adviser, approvedId);
    expect(Buffer.from(pack.data).toString("latin1")).toContain("/adbe.pkcs7.detached");
    expect(await verifyPack(pack.data)).toMatchObject({ result: "authentic", status: "approved" });
    if (spawnSync("which", ["pdftotext"]).status === 0) {
      const file = path.join(mkdtempSync(path.join(tmpdir(), "heftwise-brief-")), "pack.pdf");
      writeFileSync(file, pack.data);
      const text = execFileSync("pdftotext", [file, "-"], { encoding: "utf8" });
      expect(text).toContain("Briefing record");
      // The signing record ends with the briefing, recorded before the pack was re-issued.
      expect(text).toContain("Briefed and");
      expect(text).toContain("Aled Menhenick (Brackenfold Lineside), card PTS 77120");
    }
  });

  it("two sign-offs at once re-issue the pack once; a sign-on racing them is either in the re-issued pack or refused", async () => {
    const db = await getDb();
    const { briefingId } = await startBriefing(foreman, { revisionId: approvedId, place: "Gorsey Lane gate" });
    await recordAttendee(foreman, briefingId, attendee("key-race-aaaaaaaaaaaa", "Bethan Quayle"));
    const packsBefore = (await db.select().from(issuedPacks).where(eq(issuedPacks.revisionId, approvedId))).length;
    const [a, b, late] = await Promise.allSettled([
      completeBriefing(foreman, briefingId, { signature }),
      completeBriefing(foreman, briefingId, { signature }),
      recordAttendee(foreman, briefingId, attendee("key-race-bbbbbbbbbbbb", "Late Arrival")),
    ]);
    expect([a.status, b.status].sort()).toEqual(["fulfilled", "rejected"]);
    expect(((a.status === "rejected" ? a : b) as PromiseRejectedResult).reason).toMatchObject({ code: "conflict" });
    expect((await db.select().from(issuedPacks).where(eq(issuedPacks.revisionId, approvedId))).length).toBe(
      packsBefore + 1,
    );
    const pack = await getPackFile(adviser, approvedId);
    const inPack =
      Buffer.from(pack.data).toString("latin1").includes("Late Arrival") ||
      (await pdfText(pack.data)).includes("Late Arrival");
    if (late.status === "fulfilled") expect(inPack).toBe(true);
    else expect((late as PromiseRejectedResult).reason).toMatchObject({ code: "conflict" });
  });

  it("a site change note marks the revision and shows on the next briefing, even when the e-mail fails", async () => {
    const { mail } = await createSiteChangeNote(foreman, {
      revisionId: approvedId,
      text: "Access point moved: carry now 60 m.",
    });
    expect(mail.status).toBe("failed");
    const { revision, siteChanges } = await getBriefingScript(foreman, approvedId);
    expect(revision.needsReview).toBe(true);
    expect(siteChanges[0].text).toBe("Access point moved: carry now 60 m.");
    expect(await code(createSiteChangeNote(foreman, { revisionId: approvedId, text: "short" }))).toBe("validation");
    expect(
      await code(createSiteChangeNote(adviser, { revisionId: approvedId, text: "Access point moved again." })),
    ).toBe("forbidden");
  });

  it("the revision needs review until the adviser decides: no change (with the reason), or a new revision", async () => {
    // The note from the test before is still open.
    expect((await listOpenSiteChanges(adviser, approvedId)).length).toBeGreaterThan(0);
    expect(await code(decideSiteChanges(adviser, approvedId, { note: "ok" }))).toBe("validation");
    expect(await code(decideSiteChanges(foreman, approvedId, { note: "Carry checked: still within limits." }))).toBe(
      "forbidden",
    );
    await decideSiteChanges(adviser, approvedId, {
      note: "Carry re-measured at 55 m; the trolley task already covers it.",
    });
    expect(await listOpenSiteChanges(adviser, approvedId)).toEqual([]);
    const script = await getBriefingScript(foreman, approvedId);
    expect(script.revision.needsReview).toBe(false);
    expect(script.siteChanges).toEqual([]);
    expect(await code(decideSiteChanges(adviser, approvedId, { note: "Nothing open any more, so refused." }))).toBe(
      "conflict",
    );

    // A new note; this time the adviser answers with a new revision.
    await createSiteChangeNote(foreman, { revisionId: approvedId, text: "Cable route now crosses a drain." });
    expect((await getBriefingScript(foreman, approvedId)).revision.needsReview).toBe(true);
    await startNewRevision(adviser, approvedId);
    expect(await listOpenSiteChanges(adviser, approvedId)).toEqual([]);
    expect((await getBriefingScript(foreman, approvedId)).revision.needsReview).toBe(false);
  });
});

describe("a briefing taken on a phone without signal", () => {
  const hoursAgo = (h: number) => new Date(Date.now() - h * 3_600_000).toISOString();
  const phoneKey = (n: number) => `phone-${String(n).padStart(12, "0")}-${Date.now().toString(36)}`;

  it("is recorded once at the time it happened, however often the phone sends its start and sign-off", async () => {
    const key = phoneKey(1);
    const start = { revisionId: approvedId, place: "Gorsey Lane gate", key, startedAt: hoursAgo(3) };
    const first = await startBriefing(foreman, start);
    expect(first).toMatchObject({ duplicate: false, superseded: null });
    expect(await startBriefing(foreman, start)).toEqual({ ...first, duplicate: true });
    await recordAttendee(foreman, first.briefingId, { ...attendee(phoneKey(2)), signedAt: hoursAgo(2.9) });
    const signOff = { signature, key: phoneKey(3), signedAt: hoursAgo(2.8) };
    expect(await completeBriefing(foreman, first.briefingId, signOff)).toEqual({ duplicate: false });
    expect(await completeBriefing(foreman, first.briefingId, signOff)).toEqual({ duplicate: true });
    // Another sign-off of a closed briefing is still refused.
    expect(await code(completeBriefing(foreman, first.briefingId, { ...signOff, key: phoneKey(4) }))).toBe("conflict");
    const { briefing } = await getBriefingRecord(foreman, first.briefingId);
    expect(briefing.startedAt.toISOString()).toBe(start.startedAt);
    expect(briefing.completedAt!.toISOString()).toBe(signOff.signedAt);
    expect(briefing.receivedAt.getTime()).toBeGreaterThan(briefing.startedAt.getTime());
    // The re-issued pack says it was taken without signal and when it arrived.
    const pack = await getPackFile(adviser, approvedId);
    expect((await pdfText(pack.data)).replace(/\s+/g, " ")).toContain(
      "Taken on the foreman's phone without signal; received",
    );
  });

  it("refuses a phone clock far ahead or a record older than 30 days, naming the field", async () => {
    const ahead = new Date(Date.now() + 60 * 60_000).toISOString();
    const err = await startBriefing(foreman, {
      revisionId: approvedId,
      place: "Gorsey Lane gate",
      key: phoneKey(5),
      startedAt: ahead,
    }).catch((e) => e);
    expect(err).toBeInstanceOf(AppError);
    expect(err.issues).toEqual([
      expect.objectContaining({ path: "startedAt", message: expect.stringMatching(/clock/) }),
    ]);
    expect(
      await code(
        startBriefing(foreman, {
          revisionId: approvedId,
          place: "Gorsey Lane gate",
          key: phoneKey(6),
          startedAt: hoursAgo(24 * 31),
        }),
      ),
    ).toBe("validation");
    expect(await code(startBriefing(foreman, { revisionId: approvedId, place: "Gate", key: "short" }))).toBe(
      "validation",
    );
  });

  it("against a revision superseded meanwhile: recorded as such and reported to the adviser, never silently accepted", async () => {
    // The draft revision 2 started in the test before is approved: revision 1 is superseded.
    const approver = await actorFor("approver", foreman.organisationId);
    const next = (await listAssessments(adviser)).find((a) => a.status === "draft" && a.number === 2)!;
    const draft = await getRevision(adviser, next.revisionId);
    await submitRevision(
      adviser,
      next.revisionId,
      { version: draft.revision.version, approverId: approver.id, reviewDate: reviewDateIn(200) },
      { notify: false },
    );
    const { revision } = await getReview(approver, next.revisionId);
    await approveRevision(
      approver,
      next.revisionId,
      {
        version: revision.version,
        name: "Ruth Okonjo-Vale",
        role: "Contracts manager",
        contentHash: revision.contentHash!,
        password: DEMO_PASSWORD,
        signature,
      },
      { notify: false },
    );

    // Without the phone's key (a plain API call), the old revision cannot be briefed.
    expect(await code(startBriefing(foreman, { revisionId: approvedId, place: "Gorsey Lane gate" }))).toBe("not_found");
    // The phone that briefed from its copy while offline is recorded, flagged, and the adviser told.
    const start = { revisionId: approvedId, place: "Gorsey Lane gate", key: phoneKey(7), startedAt: hoursAgo(1) };
    const started = await startBriefing(foreman, start);
    expect(started.superseded).toEqual({ revisionNumber: 1, currentRevisionNumber: 2 });
    expect(await startBriefing(foreman, start)).toEqual({ ...started, duplicate: true });
    const { briefing } = await getBriefingRecord(adviser, started.briefingId);
    expect(briefing.againstSuperseded).toBe(true);
    // Its sign-off re-issues the old revision's pack, which carries the flag.
    await recordAttendee(foreman, started.briefingId, attendee(phoneKey(8), "Bethan Quayle"));
    await completeBriefing(foreman, started.briefingId, { signature, key: phoneKey(9), signedAt: hoursAgo(0.5) });
    const oldPack = await getPackFile(adviser, approvedId);
    expect((await pdfText(oldPack.data)).replace(/\s+/g, " ")).toContain(
      "Briefed from this revision after it had been superseded",
    );
    const db = await getDb();
    const mails = await db.select().from(outboundEmails).where(eq(outboundEmails.kind, "briefing-superseded"));
    expect(mails).toEqual([
      expect.objectContaining({ toAddress: adviser.email, subject: expect.stringContaining("superseded revision") }),
    ]);
  });
});
