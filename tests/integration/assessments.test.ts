/** Assessments: create from a template, save drafts with optimistic concurrency, submit when complete. */
import { eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { getDb } from "@/db/client";
import { revisions } from "@/db/schema";
import { submitRevision } from "@/assessments/revisions/approval";
import { createAssessment, getRevision, reviewOf, saveRevision } from "@/assessments/revisions/service";
import { contentSchema } from "@/assessments/method-statement/content";
import { reviewContent, reviewOfInvalid } from "@/assessments/method-statement/score-task";
import { listAssessments } from "@/assessments/revisions/queries";
import { RULES_VERSION } from "@/assessments/rules/version";
import { AppError } from "@/lib/errors";
import type { Actor } from "@/lib/permissions";
import { reviewDateProblem, reviewDateRange } from "@/assessments/revisions/review-date";
import { actorFor, demoOrganisation, otherOrganisation, reviewDateIn } from "./helpers";

let adviser: Actor;
let approver: Actor;
let foreman: Actor;
let organisationId: string;

beforeAll(async () => {
  ({ organisationId } = await demoOrganisation());
  adviser = await actorFor("adviser", organisationId);
  approver = await actorFor("approver", organisationId);
  foreman = await actorFor("foreman", organisationId);
});

const code = (p: Promise<unknown>) =>
  p.then(
    () => "ok",
    (e) => (e instanceof AppError ? e.code : String(e)),
  );

describe("the demo scenario", () => {
  it("seeds a crane assessment with one standard and one complex lift, complete and scored", async () => {
    const list = await listAssessments(adviser);
    const crane = list.find((a) => a.title.includes("lorry-loader"))!;
    const { content, revision } = await getRevision(adviser, crane.revisionId);
    const results = revision.results as { results: { lift?: { category: string; band: string; missing: string[] } } }[];
    const lifts = results.map((r) => r.results.lift!).filter(Boolean);
    expect(lifts.map((l) => l.category).sort()).toEqual(["complex", "standard"]);
    expect(lifts.every((l) => l.missing.length === 0 && l.band !== "stop")).toBe(true);
    expect(content.tasks).toHaveLength(2);
  });
});

describe("drafts", () => {
  it("creates from a template with tasks scored, and the job's emergency details", async () => {
    const jobs = await (await import("@/assessments/jobs/queries")).listJobs(adviser);
    const { revisionId } = await createAssessment(adviser, {
      jobId: jobs[0].id,
      title: "Trough route test",
      templateId: "trough-route",
    });
    const { content, revision } = await getRevision(adviser, revisionId);
    expect(content.tasks.map((t) => t.operation)).toEqual(["push", "team-lift", "carry"]);
    expect(content.tasks.every((t) => t.componentId)).toBe(true);
    expect(content.emergency.nearestHospital).toBe(jobs[0].nearestHospital);
    expect(revision.worstBand).not.toBeNull();
    expect((revision.results as { rulesVersion: string }[])[0].rulesVersion).toBe(RULES_VERSION);
  });

  it("the review of a draft as read is what the wizard works out from the same draft after a change", async () => {
    const jobs = await (await import("@/assessments/jobs/queries")).listJobs(adviser);
    const { revisionId } = await createAssessment(adviser, {
      jobId: jobs[0].id,
      title: "Saved results test",
      templateId: "trough-route",
    });
    const data = await getRevision(adviser, revisionId);
    // The wizard shows the first until the adviser changes something, then parses and reviews the form.
    const inBrowser = reviewContent(contentSchema.parse(data.content), data.register);
    expect(reviewOf(data)).toEqual(inBrowser);
    expect(inBrowser.scores.map((s) => s.band)).toEqual(data.content.tasks.map(() => expect.any(String)));
  });

  it("a draft whose fields fail the schema is not judged: no band, and each step to correct is named", async () => {
    const { revisionId } = (await listAssessments(adviser)).find((a) => a.title.includes("lorry-loader"))!;
    const { content, register } = await getRevision(adviser, revisionId);
    // A negative count on a crane lift, and a hazard without its description, as half-typed in the wizard.
    const typed = {
      ...content,
      tasks: content.tasks.map((t, i) => (i === 0 ? { ...t, quantity: -3 } : t)),
      hazards: [{ ...content.hazards[0], hazard: "" }, ...content.hazards.slice(1)],
    };
    const parsed = contentSchema.safeParse(typed);
    expect(parsed.success).toBe(false);
    const review = reviewOfInvalid(parsed.error!.issues.map((i) => i.path));
    expect(review.worstBand).toBeNull();
    expect(review.canSubmit).toBe(false);
    expect(review.missing.map((m) => m.step).sort()).toEqual(["hazards", "loads"]);
    // The same values reviewed as if valid would have been judged: this is what must never show.
    expect(reviewContent(typed as typeof content, register).worstBand).not.toBeNull();
  });

  it("a save against a stale version answers 409 and writes nothing", async () => {
    const jobs = await (await import("@/assessments/jobs/queries")).listJobs(adviser);
    const { revisionId } = await createAssessment(adviser, { jobId: jobs[0].id, title: "Concurrency test" });
    const first = await getRevision(adviser, revisionId);
    const edited = { ...first.content, scope: { ...first.content.scope, summary: "First editor" } };
    const saved = await saveRevision(adviser, revisionId, { version: first.revision.version, content: edited });
    expect(saved.version).toBe(first.revision.version + 1);
    const stale = { ...first.content, scope: { ...first.content.scope, summary: "Second editor" } };
    expect(await code(saveRevision(adviser, revisionId, { version: first.revision.version, content: stale }))).toBe(
      "conflict",
    );
    expect((await getRevision(adviser, revisionId)).content.scope.summary).toBe("First editor");
  });

  it("invalid content answers 422 with the field path", async () => {
    const { revisionId } = (await listAssessments(adviser))[0];
    const current = await getRevision(adviser, revisionId);
    const bad = {
      ...current.content,
      hazards: [
        {
          id: "h",
          hazard: "",
          whoIsAtRisk: "",
          likelihoodBefore: 9,
          severityBefore: 1,
          controls: [],
          likelihoodAfter: 1,
          severityAfter: 1,
        },
      ],
    };
    const err = await saveRevision(adviser, revisionId, { version: current.revision.version, content: bad }).catch(
      (e: AppError) => e,
    );
    expect((err as AppError).code).toBe("validation");
    expect((err as AppError).issues!.map((i) => i.path)).toEqual(
      expect.arrayContaining(["content.hazards.0.hazard", "content.hazards.0.likelihoodBefore"]),
    );
  });

  it("approvers and foremen cannot create or edit; another organisation gets 404", async () => {
    const { revisionId } = (await listAssessments(adviser))[0];
    const current = await getRevision(adviser, revisionId);
    expect(
      await code(saveRevision(approver, revisionId, { version: current.revision.version, content: current.content })),
    ).toBe("forbidden");
    expect(
      await code(saveRevision(foreman, revisionId, { version: current.revision.version, content: current.content })),
    ).toBe("forbidden");
    const other = await otherOrganisation();
    expect(await code(getRevision(other.admin, revisionId))).toBe("not_found");
    expect(await code(getRevision(adviser, "not-a-uuid"))).toBe("not_found");
  });
});

describe("submission", () => {
  it("is refused while anything is missing, naming each item", async () => {
    const list = await listAssessments(adviser);
    const draft = list.find((a) => a.title === "Equipment base by hand at Carrowby")!;
    const current = await getRevision(adviser, draft.revisionId);
    const err = await submitRevision(adviser, draft.revisionId, {
      version: current.revision.version,
      approverId: approver.id,
      reviewDate: reviewDateIn(180),
    }).catch((e: AppError) => e);
    expect((err as AppError).code).toBe("validation");
    expect((err as AppError).issues!.some((i) => /names? the people|Name the people/i.test(i.message))).toBe(true);
  });

  it("needs a review date that exists, lies after today and within three years (Heftwise policy)", async () => {
    const crane = (await listAssessments(adviser)).find((a) => a.title.includes("lorry-loader"))!;
    const current = await getRevision(adviser, crane.revisionId);
    const problem = async (reviewDate: string) => {
      const err = await submitRevision(adviser, crane.revisionId, {
        version: current.revision.version,
        approverId: approver.id,
        reviewDate,
      }).catch((e: AppError) => e);
      return (err as AppError).issues?.filter((i) => i.path === "reviewDate").map((i) => i.message);
    };
    expect(await problem(reviewDateIn(0))).toEqual(["The review date must be after today"]);
    expect(await problem(reviewDateIn(-30))).toEqual(["The review date must be after today"]);
    expect(await problem(reviewDateIn(4 * 366))).toEqual(["Choose a review date within 3 years"]);
    expect(await problem("2030-02-30")).toEqual(["Choose a date that exists"]);
    expect(await problem("next spring")).toEqual(["Choose a review date"]);
    expect((await getRevision(adviser, crane.revisionId)).revision.status).toBe("draft");
  });

  it("review dates: the first accepted is tomorrow, the last three years on, from a leap day the limit rolls on to 1 March", () => {
    expect(reviewDateRange(new Date("2027-03-10T23:30:00Z"))).toEqual({ earliest: "2027-03-11", latest: "2030-03-10" });
    expect(reviewDateRange(new Date("2028-02-29T08:00:00Z"))).toEqual({ earliest: "2028-03-01", latest: "2031-03-01" });
    const now = new Date("2027-03-10T12:00:00Z");
    expect(reviewDateProblem("2027-03-11", now)).toBeNull();
    expect(reviewDateProblem("2030-03-10", now)).toBeNull();
    expect(reviewDateProblem("2030-03-11", now)).toBe("Choose a review date within 3 years");
    expect(reviewDateProblem("2027-03-10", now)).toBe("The review date must be after today");
  });

  it("is refused while a planned lift is incomplete (no appointed person)", async () => {
    const list = await listAssessments(adviser);
    const crane = list.find((a) => a.title.includes("lorry-loader"))!;
    const current = await getRevision(adviser, crane.revisionId);
    const content = structuredClone(current.content);
    content.tasks[0].lift!.people = {
      ...content.tasks[0].lift!.people,
      appointedPerson: { name: "", competenceRef: "" },
    };
    const saved = await saveRevision(adviser, crane.revisionId, { version: current.revision.version, content });
    const err = await submitRevision(adviser, crane.revisionId, {
      version: saved.version,
      approverId: approver.id,
      reviewDate: reviewDateIn(180),
    }).catch((e: AppError) => e);
    expect((err as AppError).issues!.some((i) => i.message.includes("appointed person"))).toBe(true);
    // put it back
    await saveRevision(adviser, crane.revisionId, { version: saved.version, content: current.content });
  });

  it("a complete draft is submitted to an approver, audited, and then locked against saves", async () => {
    const list = await listAssessments(adviser);
    const crane = list.find((a) => a.title.includes("lorry-loader"))!;
    const current = await getRevision(adviser, crane.revisionId);
    expect(
      await code(
        submitRevision(adviser, crane.revisionId, {
          version: current.revision.version,
          approverId: foreman.id,
          reviewDate: reviewDateIn(180),
        }),
      ),
    ).toBe("validation");
    await submitRevision(adviser, crane.revisionId, {
      version: current.revision.version,
      approverId: approver.id,
      reviewDate: reviewDateIn(180),
    });
    const db = await getDb();
    const [row] = await db.select().from(revisions).where(eq(revisions.id, crane.revisionId));
    expect(row.status).toBe("submitted");
    expect(row.contentHash).toMatch(/^[0-9a-f]{64}$/);
    expect(
      await code(saveRevision(adviser, crane.revisionId, { version: row.version, content: current.content })),
    ).toBe("conflict");
  });
});
