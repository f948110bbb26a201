import { getDb, closeDb } from "@/db/client";
import { users } from "@/db/schema";
import { eq } from "drizzle-orm";
const db = await getDb();
const [u] = await db.select().from(users).where(eq(users.email, "adviser@brackenfold.example"));
const org = u.organisationId;
const client = (db as any).$client;
async function time(label: string, q: string, p: unknown[] = []) { for (let i=0;i<30;i++) await client.query(q, p); const t = performance.now(); for (let i = 0; i < 200; i++) await client.query(q, p); console.log(label.padEnd(30), ((performance.now() - t) / 200).toFixed(2), "ms"); }
await time("pk lookup", `select id from users where id = $1`, [u.id]);
await time("session join", `select u.id from users u join user_sessions s on s.user_id = u.id and s.id = $1 and s.expires_at > now() where u.id = $2`, ["00000000-0000-4000-8000-000000000000", u.id]);
await time("21 ids", `select r.id from revisions r where r.organisation_id = $1 and r.is_latest order by r.updated_at desc, r.id desc limit 21`, [org]);
await time("21 rows 1 table", `select r.id, r.number, r.status, r.worst_band, r.review_date, r.updated_at, r.author_id, r.assessment_id from revisions r where r.organisation_id = $1 and r.is_latest order by r.updated_at desc, r.id desc limit 21`, [org]);
await time("join 2", `select r.id, a.title from revisions r join assessments a on a.id = r.assessment_id where r.organisation_id = $1 and r.is_latest order by r.updated_at desc, r.id desc limit 21`, [org]);
await time("join 4", `select r.id, a.title, j.name, u.name from revisions r join assessments a on a.id = r.assessment_id join jobs j on j.id = a.job_id left join users u on u.id = r.author_id where r.organisation_id = $1 and r.is_latest order by r.updated_at desc, r.id desc limit 21`, [org]);
await time("count latest", `select count(*) from revisions r where r.organisation_id = $1 and r.is_latest`, [org]);
await time("count status", `select status, count(*) from revisions r where r.organisation_id = $1 group by status`, [org]);
await closeDb();
