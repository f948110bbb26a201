import { eq } from "drizzle-orm";
import { getDb } from "@/db/client";
import { organisations, users, type Role } from "@/db/schema";
import { seedDemo } from "@/assessments/demo/seed";
import { DEMO_LINESIDE } from "@/assessments/demo/scenario";
import type { Content } from "@/assessments/method-statement/content";
import type { Actor } from "@/lib/permissions";

/** The demo organisation, seeded into this test file's database. */
export async function demoOrganisation() {
  return seedDemo(await getDb());
}

export async function actorFor(role: Role, organisationId: string): Promise<Actor> {
  const db = await getDb();
  const user = (await db.select().from(users).where(eq(users.organisationId, organisationId))).find(
    (u) => u.role === role,
  );
  if (!user) throw new Error(`no ${role} in organisation`);
  return { id: user.id, organisationId, role: user.role, name: user.name, email: user.email };
}

/** A second, unrelated organisation with one admin, for "other organisation → 404" checks. */
export async function otherOrganisation(): Promise<{ organisationId: string; adminId: string; admin: Actor }> {
  const db = await getDb();
  const [org] = await db
    .insert(organisations)
    .values({ name: `Other Org ${Math.random()}` })
    .returning();
  const [admin] = await db
    .insert(users)
    .values({
      organisationId: org.id,
      email: `admin-${org.id}@other.example`,
      name: "Other Admin",
      role: "admin",
      passwordHash: "x",
    })
    .returning();
  return {
    organisationId: org.id,
    adminId: admin.id,
    admin: { id: admin.id, organisationId: org.id, role: "admin", name: admin.name, email: admin.email },
  };
}

/** A review date the given number of days from today (YYYY-MM-DD): review dates must lie ahead. */
export const reviewDateIn = (days: number) => new Date(Date.now() + days * 86_400_000).toISOString().slice(0, 10);

/**
 * Completes a draft's lineside sections as an adviser would before submitting (invented names and
 * references, as in the demo): the arrangement and its owner, each permit's reference, the checks
 * before digging, and the excavation where there is one.
 */
export function completeLineside(content: Content): Content {
  const next = structuredClone(content);
  Object.assign(next.lineside, DEMO_LINESIDE);
  next.permits = next.permits.map((p, i) => ({
    ...p,
    reference: p.reference || `PTD-TEST-${i + 1}`,
    issuedBy: p.issuedBy || "Site permit office",
  }));
  Object.assign(next.buriedServices, {
    recordsObtained: true,
    scanned: true,
    scannedBy: "Kieran Lusk",
    scanDate: reviewDateIn(-3),
    rule: next.buriedServices.rule || "Hand tools only near a located service.",
  });
  if (next.excavation.present)
    Object.assign(next.excavation, {
      inspection: next.excavation.inspection || "Supervisor, before each shift and after rain.",
      accessEgress: next.excavation.accessEgress || "Ladder, tied off.",
    });
  return next;
}
