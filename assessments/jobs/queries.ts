import { asc, eq } from "drizzle-orm";
import { getDb } from "@/db/client";
import { jobs } from "@/db/schema";
import { authorize, type Actor } from "@/lib/permissions";

export async function listJobs(actor: Actor | null) {
  authorize(actor, "jobs:read");
  const db = await getDb();
  return db.select().from(jobs).where(eq(jobs.organisationId, actor.organisationId)).orderBy(asc(jobs.name));
}
