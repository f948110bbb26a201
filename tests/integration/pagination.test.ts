/**
 * Keyset pagination: walking a list page by page gives every row once, in the list's order, for
 * every sort and filter; a cursor belongs to its sort; a forged cursor is refused with a field
 * message; the list shows each assessment's latest revision only, also after a new revision starts.
 */
import { beforeAll, describe, expect, it } from "vitest";
import { getDb } from "@/db/client";
import { components } from "@/db/schema";
import { listJobs } from "@/assessments/jobs/queries";
import { listComponentsPage } from "@/assessments/load-register/queries";
import { createAssessment, getRevision } from "@/assessments/revisions/service";
import { listAssessmentsPage } from "@/assessments/revisions/queries";
import { startNewRevision } from "@/assessments/revisions/approval";
import { AppError } from "@/lib/errors";
import type { Actor } from "@/lib/permissions";
import { actorFor, demoOrganisation, otherOrganisation } from "./helpers";

let adviser: Actor;
let organisationId: string;
let firstJobId: string;

interface Listed {
  items: Record<string, unknown>[];
  nextCursor: string | null;
  total: number;
}

/** Every page of a list, following nextCursor; fails on a page that repeats or a cursor that loops. */
async function walk(
  list: (query: Record<string, unknown>) => Promise<Listed>,
  query: Record<string, unknown>,
  limit: number,
) {
  const rows: Record<string, unknown>[] = [];
  let cursor: string | undefined;
  const totals = new Set<number>();
  for (let pages = 0; pages < 200; pages++) {
    const page = await list({ ...query, limit, ...(cursor ? { cursor } : {}) });
    expect(page.items.length).toBeLessThanOrEqual(limit);
    rows.push(...page.items);
    totals.add(page.total);
    if (!page.nextCursor) return { rows, totals };
    cursor = page.nextCursor;
  }
  throw new Error("the cursor never ended");
}

const refusal = async (promise: Promise<unknown>) => {
  const err = await promise.then(
    () => null,
    (e: unknown) => e,
  );
  expect(err).toBeInstanceOf(AppError);
  return err as AppError;
};

beforeAll(async () => {
  ({ organisationId } = await demoOrganisation());
  adviser = await actorFor("adviser", organisationId);
  const jobs = await listJobs(adviser);
  firstJobId = jobs[0].id;
  // Thirty assessments over two jobs; titles repeat, so ties must be broken the same way on every page.
  for (let i = 0; i < 30; i++) {
    await createAssessment(adviser, {
      jobId: jobs[i % 2].id,
      title: `Paged assessment ${String(i % 7).padStart(2, "0")}`,
    });
  }
  // Components with equal masses: the mass sort's ties too.
  const db = await getDb();
  await db.insert(components).values(
    Array.from({ length: 25 }, (_, i) => ({
      organisationId,
      name: `Paged component ${i}`,
      massKg: 10 + (i % 3),
      grip: "fair" as const,
      massSource: "weighed" as const,
    })),
  );
});

describe("keyset pagination", () => {
  const assessmentSorts = ["-updatedAt", "updatedAt", "title", "-title"] as const;

  for (const sort of assessmentSorts) {
    it(`the assessments list sorted by ${sort} gives each row once, in order, page after page`, async () => {
      const reference = await listAssessmentsPage(adviser, { sort, limit: 100 });
      expect(reference.nextCursor).toBeNull();
      expect(reference.total).toBe(reference.items.length);
      for (const limit of [1, 4, 7]) {
        const { rows, totals } = await walk((q) => listAssessmentsPage(adviser, q), { sort }, limit);
        expect(rows.map((r) => r.revisionId)).toEqual(reference.items.map((r) => r.revisionId));
        expect([...totals]).toEqual([reference.total]);
      }
      // The order is the one asked for (ids break ties in the same direction).
      const key = (r: (typeof reference.items)[number]) =>
        sort.endsWith("title") ? r.title : r.updatedAt.toISOString();
      for (let i = 1; i < reference.items.length; i++) {
        const [a, b] = [key(reference.items[i - 1]), key(reference.items[i])];
        if (sort.endsWith("updatedAt")) expect(sort.startsWith("-") ? a >= b : a <= b).toBe(true);
      }
    });
  }

  it("filters walk the same way and count only what they match", async () => {
    const reference = await listAssessmentsPage(adviser, { jobId: firstJobId, q: "Paged", limit: 100 });
    expect(reference.items.every((r) => r.jobId === firstJobId && r.title.startsWith("Paged"))).toBe(true);
    expect(reference.total).toBe(15);
    const { rows } = await walk((q) => listAssessmentsPage(adviser, q), { jobId: firstJobId, q: "Paged" }, 4);
    expect(rows.map((r) => r.revisionId)).toEqual(reference.items.map((r) => r.revisionId));
  });

  it("the register sorted by mass, with ties, gives each component once in order", async () => {
    for (const sort of ["massKg", "-massKg", "name", "-name"]) {
      const reference = await listComponentsPage(adviser, { sort, limit: 100 });
      const { rows } = await walk((q) => listComponentsPage(adviser, q), { sort }, 3);
      expect(rows.map((r) => r.id)).toEqual(reference.items.map((r) => r.id));
      expect(new Set(rows.map((r) => r.id)).size).toBe(rows.length);
      if (sort.endsWith("massKg")) {
        const masses = reference.items.map((r) => r.massKg);
        expect(masses).toEqual([...masses].sort((a, b) => (sort.startsWith("-") ? b - a : a - b)));
      }
    }
  });

  it("a cursor from another sort, a forged cursor and a cursor that is not ours are refused on the cursor field", async () => {
    const byTitle = await listAssessmentsPage(adviser, { sort: "title", limit: 2 });
    const wrongSort = await refusal(listAssessmentsPage(adviser, { sort: "-updatedAt", cursor: byTitle.nextCursor }));
    expect(wrongSort.status).toBe(422);
    expect(wrongSort.issues?.[0].path).toBe("cursor");
    const forged = Buffer.from(JSON.stringify(["title", "x", "not-a-uuid"])).toString("base64url");
    expect((await refusal(listAssessmentsPage(adviser, { sort: "title", cursor: forged }))).issues?.[0].path).toBe(
      "cursor",
    );
    expect((await refusal(listAssessmentsPage(adviser, { cursor: "bm90IGpzb24" }))).status).toBe(422);
    // A timestamp cursor whose value is not a timestamp: refused as input, never a server error.
    const badValue = Buffer.from(
      JSON.stringify(["-updatedAt", "yesterday-ish", "00000000-0000-4000-8000-000000000000"]),
    ).toString("base64url");
    expect((await refusal(listAssessmentsPage(adviser, { cursor: badValue }))).status).toBe(422);
  });

  it("another organisation sees none of these rows and counts none", async () => {
    const { admin } = await otherOrganisation();
    const theirs = await listAssessmentsPage(admin, {});
    expect(theirs.items).toEqual([]);
    expect(theirs.total).toBe(0);
  });
});

describe("the latest revision of each assessment", () => {
  it("lists an assessment once, at its newest revision, after a new revision starts", async () => {
    // The demo's approved assessment: its next revision starts as a draft.
    const approved = (await listAssessmentsPage(adviser, { status: "approved", limit: 100 })).items[0];
    const next = await startNewRevision(adviser, approved.revisionId);
    const title = approved.title;

    const listed = (await listAssessmentsPage(adviser, { q: title, limit: 100 })).items.filter(
      (r) => r.assessmentId === approved.assessmentId,
    );
    expect(listed).toHaveLength(1);
    expect(listed[0]).toMatchObject({ revisionId: next.revisionId, number: 2, status: "draft" });
    // The approved revision stays approved, and is not listed beside its successor.
    expect((await getRevision(adviser, approved.revisionId)).revision).toMatchObject({
      status: "approved",
      isLatest: false,
    });
    expect(
      (await listAssessmentsPage(adviser, { q: title, status: "approved", limit: 100 })).items.filter(
        (r) => r.assessmentId === approved.assessmentId,
      ),
    ).toEqual([]);
  });
});
