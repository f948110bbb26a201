/**
 * Lists and counts kept between writes (lib/read-cache.ts) never outlive a write: each change made
 * through the application, or straight to a table, is in the very next answer.
 */
import { sql } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { dataVersion, getDb } from "@/db/client";
import { components } from "@/db/schema";
import { countJobs, listJobs } from "@/assessments/jobs/queries";
import { createJob } from "@/assessments/jobs/service";
import { countComponents } from "@/assessments/load-register/queries";
import { listComponentsPage } from "@/assessments/load-register/queries";
import { countRevisionsByStatus } from "@/assessments/revisions/queries";
import { createAssessment, getRevision, reviewOf, saveRevision } from "@/assessments/revisions/service";
import { reviewContent } from "@/assessments/method-statement/score-task";
import { listAssessmentsPage } from "@/assessments/revisions/queries";
import { cachedRead } from "@/lib/read-cache";
import type { Actor } from "@/lib/permissions";
import { actorFor, demoOrganisation } from "./helpers";

let adviser: Actor;

beforeAll(async () => {
  const { organisationId } = await demoOrganisation();
  adviser = await actorFor("adviser", organisationId);
});

describe("kept answers", () => {
  it("a new assessment is in the next list and the next count", async () => {
    const before = await listAssessmentsPage(adviser, {});
    const drafts = (await countRevisionsByStatus(adviser)).draft ?? 0;
    // Kept: the same object, on the embedded database and on a server alike (its listener is connected).
    const again = await listAssessmentsPage(adviser, {});
    expect(again).toBe(before);
    const jobs = await listJobs(adviser);
    const created = await createAssessment(adviser, { jobId: jobs[0].id, title: "Kept answers are dropped on write" });
    const after = await listAssessmentsPage(adviser, {});
    expect(after.total).toBe(before.total + 1);
    expect(after.items[0].revisionId).toBe(created.revisionId);
    expect((await countRevisionsByStatus(adviser)).draft).toBe(drafts + 1);
  });

  it("a row written straight to a table, and a raw statement, are seen at once", async () => {
    const count = (await countComponents(adviser)).total;
    const db = await getDb();
    await db.insert(components).values({
      organisationId: adviser.organisationId,
      name: "Written straight in",
      massKg: 3,
      grip: "good",
      massSource: "weighed",
    });
    expect((await countComponents(adviser)).total).toBe(count + 1);
    expect((await listComponentsPage(adviser, { q: "Written straight" })).total).toBe(1);
    await db.execute(sql`delete from components where name = 'Written straight in'`);
    expect((await countComponents(adviser)).total).toBe(count);
  });

  it("a write that finishes while a list is being read keeps that answer from being kept", async () => {
    const jobsBefore = await countJobs(adviser);
    let release!: () => void;
    const gate = new Promise<void>((resolve) => (release = resolve));
    const slow = cachedRead("a slow read", async () => {
      const value = await countJobs(adviser);
      await gate;
      return value;
    });
    await createJob(adviser, {
      name: "Written during a read",
      client: "Invented Client Ltd",
      location: "Nowhere",
      siteContactPhone: "07700 900111",
    });
    release();
    expect(await slow).toBe(jobsBefore);
    const version = dataVersion();
    // Asked again, the read runs afresh.
    expect(await cachedRead("a slow read", () => countJobs(adviser))).toBe(jobsBefore + 1);
    expect(dataVersion()).toBe(version);
  });

  it("a kept answer is frozen: a caller cannot change what the next caller reads", async () => {
    const jobs = await listJobs(adviser);
    expect(Object.isFrozen(jobs)).toBe(true);
    expect(Object.isFrozen(jobs[0])).toBe(true);
    const kept = jobs[0] as { name: string };
    expect(() => {
      kept.name = "Changed";
    }).toThrow(TypeError);
    expect((await listJobs(adviser))[0].name).not.toBe("Changed");
  });

  it("a saved draft is in the next read of its revision", async () => {
    const jobs = await listJobs(adviser);
    const created = await createAssessment(adviser, { jobId: jobs[0].id, title: "Kept revision read" });
    const first = await getRevision(adviser, created.revisionId);
    const again = await getRevision(adviser, created.revisionId);
    expect(again).toBe(first);
    // Its review is worked out once for the kept revision, and is the engine's own.
    expect(reviewOf(again)).toBe(reviewOf(first));
    expect(reviewOf(first)).toEqual(reviewContent(first.content, first.register));
    expect(reviewOf(first).missing.some((m) => m.step === "scope")).toBe(true);
    const content = { ...first.content, scope: { ...first.content.scope, summary: "Changed after the first read" } };
    const saved = await saveRevision(adviser, created.revisionId, { version: first.revision.version, content });
    const after = await getRevision(adviser, created.revisionId);
    expect(after.revision.version).toBe(saved.version);
    expect(after.content.scope.summary).toBe("Changed after the first read");
    expect(reviewOf(after).missing.some((m) => m.step === "scope")).toBe(false);
  });
});
