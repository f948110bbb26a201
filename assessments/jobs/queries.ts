import { asc, count, eq } from "drizzle-orm";
import { getDb } from "@/db/client";
import { jobs } from "@/db/schema";
import { parseOrThrow } from "@/lib/errors";
import { page, pageQuerySchema } from "@/lib/pagination";
import { authorize, type Actor } from "@/lib/permissions";

export async function listJobs(actor: Actor | null) {
  authorize(actor, "jobs:read");
  const db = await getDb();
  return db.select().from(jobs).where(eq(jobs.organisationId, actor.organisationId)).orderBy(asc(jobs.name));
}

export async function listJobsPage(actor: Actor | null, query: unknown) {
  authorize(actor, "jobs:read");
  const q = parseOrThrow(pageQuerySchema, query, "Invalid query");
  const db = await getDb();
  const [{ total }] = await db.select({ total: count() }).from(jobs).where(eq(jobs.organisationId, actor.organisationId));
  const items = await db.select().from(jobs).where(eq(jobs.organisationId, actor.organisationId)).orderBy(asc(jobs.name), asc(jobs.id)).limit(q.limit).offset(q.cursor);
  return page(items, q.cursor, q.limit, Number(total));
}
