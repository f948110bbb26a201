/**
 * `limit`/`cursor` pagination for list endpoints. The cursor is opaque to clients (it encodes the
 * offset of the next page); the answer carries `nextCursor` (null on the last page) and `total`.
 */
import { z } from "zod";

export const pageQuerySchema = z.object({
  limit: z.coerce.number().int().min(1, "limit must be at least 1").max(100, "limit must be at most 100").default(25),
  cursor: z
    .string()
    .optional()
    .transform((c, ctx) => {
      if (!c) return 0;
      const decoded = /^[A-Za-z0-9_-]+$/.test(c) ? Buffer.from(c, "base64url").toString("utf8") : "";
      const offset = /^\d{1,9}$/.test(decoded) ? Number(decoded) : -1;
      if (offset < 0) {
        ctx.addIssue({ code: "custom", message: "cursor is not one this API gave out" });
        return z.NEVER;
      }
      return offset;
    }),
});

export const encodeCursor = (offset: number) => Buffer.from(String(offset), "utf8").toString("base64url");

export interface Page<T> {
  items: T[];
  nextCursor: string | null;
  total: number;
}

export function page<T>(items: T[], offset: number, limit: number, total: number): Page<T> {
  return { items, nextCursor: offset + items.length < total ? encodeCursor(offset + limit) : null, total };
}
