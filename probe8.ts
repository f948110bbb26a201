import { getDb, closeDb } from "@/db/client";
import { listAssessmentsPage } from "@/assessments/revisions/service";
import { countRevisionsByStatus } from "@/assessments/revisions/queries";
import { countComponents } from "@/assessments/load-register/queries";
import { countJobs } from "@/assessments/jobs/queries";
import { users } from "@/db/schema";
import { eq } from "drizzle-orm";
const db = await getDb();
const [u] = await db.select().from(users).where(eq(users.email, "adviser@brackenfold.example"));
const actor = { id: u.id, organisationId: u.organisationId, role: u.role, name: u.name, email: u.email };
async function time(label: string, f: () => Promise<unknown>) { for (let i=0;i<30;i++) await f(); const t = performance.now(); for (let i = 0; i < 100; i++) await f(); console.log(label.padEnd(20), ((performance.now() - t) / 100).toFixed(2), "ms"); }
await time("list", () => listAssessmentsPage(actor, { limit: 20 }));
await time("list title", () => listAssessmentsPage(actor, { limit: 20, sort: "title" }));
await time("search", () => listAssessmentsPage(actor, { limit: 20, q: "cabinet", status: "approved" }));
await time("status counts", () => countRevisionsByStatus(actor));
await time("components count", () => countComponents(actor));
await time("jobs count", () => countJobs(actor));
await closeDb();
