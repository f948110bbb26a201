import { getDb, closeDb } from "@/db/client";
import { users } from "@/db/schema";
import { eq, sql } from "drizzle-orm";
const db = await getDb();
const [u] = await db.select().from(users).where(eq(users.email, "adviser@brackenfold.example"));
const org = u.organisationId;
const p = await db.execute(sql.raw(`explain analyze select r.id, a.title, j.name, u.name from revisions r join assessments a on a.id = r.assessment_id join jobs j on j.id = a.job_id left join users u on u.id = r.author_id where r.organisation_id = '${org}' and a.organisation_id = '${org}' and r.is_latest order by a.title asc, a.id asc limit 21`));
console.log(p.rows.map((r: any) => r["QUERY PLAN"]).join("\n"));
await closeDb();
