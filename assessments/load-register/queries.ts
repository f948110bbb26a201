import { asc, eq } from "drizzle-orm";
import { getDb } from "@/db/client";
import { components } from "@/db/schema";
import { authorize, type Actor } from "@/lib/permissions";

export async function listComponents(actor: Actor | null) {
  authorize(actor, "components:read");
  const db = await getDb();
  return db.select().from(components).where(eq(components.organisationId, actor.organisationId)).orderBy(asc(components.name));
}
