import "server-only";
import { and, asc, count, eq, getTableColumns } from "drizzle-orm";
import { getDb } from "@/db/client";
import { jobs } from "@/db/schema";
import { parseOrThrow } from "@/lib/errors";
import { afterCursor, keysetColumns, keysetPage, orderOf, pageQuerySchema, type Keyset } from "@/lib/pagination";
import { authorize, type Actor } from "@/lib/permissions";
import { cachedRead, readKey } from "@/lib/read-cache";

export async function listJobs(actor: Actor | null) {
  authorize(actor, "jobs:read");
  return cachedRead(readKey("jobs", actor.organisationId), async () => {
    const db = await getDb();
    return db.select().from(jobs).where(eq(jobs.organisationId, actor.organisationId)).orderBy(asc(jobs.name));
  });
}

const JOB_ORDER: Keyset = { name: "name", column: jobs.name, id: jobs.id, descending: false, type: "text" };

export async function listJobsPage(actor: Actor | null, query: unknown) {
  authorize(actor, "jobs:read");
  const q = parseOrThrow(pageQuerySchema, query, "Invalid query");
  return cachedRead(readKey("jobs-page", actor.organisationId, q), async () => {
    const db = await getDb();
    const mine = eq(jobs.organisationId, actor.organisationId);
    const [rows, [{ total }]] = await Promise.all([
      db
        .select({ ...getTableColumns(jobs), ...keysetColumns(JOB_ORDER) })
        .from(jobs)
        .where(and(mine, afterCursor(JOB_ORDER, q.cursor)))
        .orderBy(...orderOf(JOB_ORDER))
        .limit(q.limit + 1),
      db.select({ total: count() }).from(jobs).where(mine),
    ]);
    return keysetPage(rows, JOB_ORDER, q.limit, Number(total));
  });
}

/** How many jobs the organisation has, for the overview. */
export async function countJobs(actor: Actor | null): Promise<number> {
  authorize(actor, "jobs:read");
  return cachedRead(readKey("job-count", actor.organisationId), async () => {
    const db = await getDb();
    const [{ total }] = await db
      .select({ total: count() })
      .from(jobs)
      .where(eq(jobs.organisationId, actor.organisationId));
    return Number(total);
  });
}
