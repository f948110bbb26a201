/**
 * Keyset pagination for list endpoints. A page is read by walking an index from where the last page
 * ended, so page 400 costs what page 1 costs (an offset would read and discard every row before it).
 *
 * The cursor is opaque to clients: it names the sort it belongs to and the last row's sort value and
 * id, as the database printed them (a timestamp keeps its microseconds). The answer carries
 * `nextCursor` (null on the last page) and `total`, counted in SQL.
 */
import { asc, desc, sql, type AnyColumn, type SQL } from "drizzle-orm";
import { z } from "zod";
import { AppError } from "./errors";

const cursorShape = z.tuple([z.string().max(40), z.string().max(1000), z.uuid()]);
export type Cursor = z.infer<typeof cursorShape>;

const NOT_OURS = "cursor is not one this API gave out";

export const pageQuerySchema = z.object({
  limit: z.coerce.number().int().min(1, "limit must be at least 1").max(100, "limit must be at most 100").default(25),
  cursor: z
    .string()
    .max(2000, NOT_OURS)
    .optional()
    .transform((c, ctx): Cursor | undefined => {
      if (!c) return undefined;
      try {
        if (!/^[A-Za-z0-9_-]+$/.test(c)) throw new Error();
        return cursorShape.parse(JSON.parse(Buffer.from(c, "base64url").toString("utf8")));
      } catch {
        ctx.addIssue({ code: "custom", message: NOT_OURS });
        return z.NEVER;
      }
    }),
});

export const encodeCursor = (cursor: Cursor) => Buffer.from(JSON.stringify(cursor), "utf8").toString("base64url");

export interface Page<T> {
  items: T[];
  nextCursor: string | null;
  total: number;
}

/**
 * One order of a list: a column (ties broken by the row's id, in the same direction) and the SQL
 * type its printed value is read back as.
 */
export interface Keyset {
  /** The sort's name as the API takes it ("-updatedAt"): a cursor is good for its own sort only. */
  name: string;
  column: AnyColumn;
  id: AnyColumn;
  descending: boolean;
  type: "timestamptz" | "text" | "float8";
}

/** The row's sort value (as text) and id, selected beside the row to make the next cursor from. */
export const keysetColumns = (keyset: Keyset) => ({
  sortKey: sql<string>`(${keyset.column})::text`,
  sortId: sql<string>`${keyset.id}`,
});

/** ORDER BY for the keyset: both columns one way, so one index serves it (forwards or backwards). */
export const orderOf = (keyset: Keyset) =>
  keyset.descending ? [desc(keyset.column), desc(keyset.id)] : [asc(keyset.column), asc(keyset.id)];

/** Whether a cursor's value reads back as its sort's type (a forged one is refused before the query). */
const VALUE_READS: Record<Keyset["type"], (value: string) => boolean> = {
  timestamptz: (v) =>
    /^\d{4}-\d{2}-\d{2} \d{2}:\d{2}:\d{2}(\.\d{1,6})?([+-]\d{2}(:\d{2})?)?$/.test(v) &&
    !Number.isNaN(Date.parse(v.replace(" ", "T").replace(/([+-]\d{2})$/, "$1:00"))),
  text: () => true,
  float8: (v) => v.trim() !== "" && Number.isFinite(Number(v)),
};

/** The condition "after the cursor" in the keyset's order, or a field error for another sort's cursor. */
export function afterCursor(keyset: Keyset, cursor: Cursor | undefined): SQL | undefined {
  if (!cursor) return undefined;
  const [name, value, id] = cursor;
  if (name !== keyset.name)
    throw new AppError("validation", "Invalid query", [{ path: "cursor", message: `${NOT_OURS} for this sort` }]);
  if (!VALUE_READS[keyset.type](value))
    throw new AppError("validation", "Invalid query", [{ path: "cursor", message: NOT_OURS }]);
  // A row comparison: the index on (column, id) starts the walk right there.
  return sql`(${keyset.column}, ${keyset.id}) ${sql.raw(keyset.descending ? "<" : ">")} (${value}::${sql.raw(keyset.type)}, ${id}::uuid)`;
}

/**
 * Builds the page from up to `limit + 1` rows read in the keyset's order (the extra row says whether
 * another page follows) and drops the sort key from the items.
 */
export function keysetPage<T extends { sortKey: string; sortId: string }>(
  rows: T[],
  keyset: Keyset,
  limit: number,
  total: number,
): Page<Omit<T, "sortKey" | "sortId">> {
  const items = rows.slice(0, limit);
  const last = items[items.length - 1];
  const nextCursor = rows.length > limit && last ? encodeCursor([keyset.name, last.sortKey, last.sortId]) : null;
  const strip = (row: T): Omit<T, "sortKey" | "sortId"> => {
    const item: Partial<T> = { ...row };
    delete item.sortKey;
    delete item.sortId;
    return item as Omit<T, "sortKey" | "sortId">;
  };
  return { items: items.map(strip), nextCursor, total };
}
