import "server-only";
import { asc, count, eq, sql, and, getTableColumns, ilike, type SQL } from "drizzle-orm";
import { getDb } from "@/db/client";
import { components } from "@/db/schema";
import { authorize, type Actor } from "@/lib/permissions";
import { cachedRead, readKey } from "@/lib/read-cache";
import { z } from "zod";
import { parseOrThrow } from "@/lib/errors";
import { escapeLike } from "@/lib/sql";
import { afterCursor, keysetColumns, keysetPage, orderOf, pageQuerySchema, type Keyset } from "@/lib/pagination";

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

export const componentListQuerySchema = pageQuerySchema.extend({
  q: z.string().trim().max(100).optional(),
  massSource: z.enum(["weighed", "datasheet", "estimated"]).optional(),
  grip: z.enum(["good", "fair", "poor"]).optional(),
  sort: z.enum(["name", "-name", "massKg", "-massKg"]).default("name"),
});

const COMPONENT_ORDERS = {
  name: { column: components.name, id: components.id, type: "text" },
  massKg: { column: components.massKg, id: components.id, type: "float8" },
} as const;

/** The register filtered, sorted and paged by keyset; the total counted in SQL. */
export async function listComponentsPage(actor: Actor | null, query: unknown) {
  authorize(actor, "components:read");
  const q = parseOrThrow(componentListQuerySchema, query, "Invalid query");
  return cachedRead(readKey("components", actor.organisationId, q), async () => {
    const descending = q.sort.startsWith("-");
    const keyset: Keyset = {
      name: q.sort,
      descending,
      ...COMPONENT_ORDERS[q.sort.replace("-", "") as "name" | "massKg"],
    };
    const db = await getDb();
    const where: SQL[] = [eq(components.organisationId, actor.organisationId)];
    if (q.q) where.push(ilike(components.name, `%${escapeLike(q.q)}%`));
    if (q.massSource) where.push(eq(components.massSource, q.massSource));
    if (q.grip) where.push(eq(components.grip, q.grip));
    const [rows, [{ total }]] = await Promise.all([
      db
        .select({ ...getTableColumns(components), ...keysetColumns(keyset) })
        .from(components)
        .where(and(...where, afterCursor(keyset, q.cursor)))
        .orderBy(...orderOf(keyset))
        .limit(q.limit + 1),
      db
        .select({ total: count() })
        .from(components)
        .where(and(...where)),
    ]);
    return keysetPage(rows, keyset, q.limit, Number(total));
  });
}
