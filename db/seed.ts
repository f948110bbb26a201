/**
 * Seeds the invented demo scenario. Idempotent: an organisation that already exists is left as it
 * is, so the demo can be started again without duplicating or overwriting anything.
 */
import { eq } from "drizzle-orm";
import { hashPassword } from "@/lib/auth/passwords";
import type { Db } from "./client";
import { DEMO_COMPONENTS, DEMO_JOBS, DEMO_ORGANISATION, DEMO_PASSWORD, DEMO_USERS } from "./demo-scenario";
import { components, jobs, organisations, users } from "./schema";

export async function seedDemo(db: Db): Promise<{ created: boolean; organisationId: string }> {
  const existing = await db.query.organisations.findFirst({ where: eq(organisations.name, DEMO_ORGANISATION) });
  if (existing) return { created: false, organisationId: existing.id };
  const passwordHash = await hashPassword(DEMO_PASSWORD);
  return db.transaction(async (tx) => {
    const [org] = await tx.insert(organisations).values({ name: DEMO_ORGANISATION }).returning();
    const people = await tx
      .insert(users)
      .values(DEMO_USERS.map((u) => ({ ...u, organisationId: org.id, passwordHash })))
      .returning();
    const adviser = people.find((p) => p.role === "adviser")!;
    await tx.insert(jobs).values(DEMO_JOBS.map((j) => ({ ...j, organisationId: org.id, createdBy: adviser.id })));
    await tx.insert(components).values(DEMO_COMPONENTS.map((c) => ({ ...c, organisationId: org.id })));
    return { created: true, organisationId: org.id };
  });
}
