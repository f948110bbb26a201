import "server-only";
import { asc, count, eq, sql } from "drizzle-orm";
import { getDb } from "@/db/client";
import { components } from "@/db/schema";
import { authorize, type Actor } from "@/lib/permissions";
import { cachedRead, readKey } from "@/lib/read-cache";

export async function listComponents(actor: Actor | null) {
  authorize(actor, "components:read");
  const db = await getDb();
  return db
    .select()
    .from(components)
    .where(eq(components.organisationId, actor.organisationId))
    .orderBy(asc(components.name));
}

/** How many components the register holds, and how many of them have an estimated mass (overview). */
export async function countComponents(actor: Actor | null): Promise<{ total: number; estimated: number }> {
  authorize(actor, "components:read");
  return cachedRead(readKey("component-count", actor.organisationId), async () => {
    const db = await getDb();
    const [row] = await db
      .select({ total: count(), estimated: count(sql`case when ${components.massSource} = 'estimated' then 1 end`) })
      .from(components)
      .where(eq(components.organisationId, actor.organisationId));
    return { total: Number(row.total), estimated: Number(row.estimated) };
  });
}
