/** On a PostgreSQL server: an idle connection the server ends does not take the process down. */
import { describe, expect, it } from "vitest";
import { sql } from "drizzle-orm";
import { getDb } from "@/db/client";

// Runs in the "postgres" project only (vitest.config.ts): PGlite has no connections to end.
describe("the database connection", () => {
  it("survives the server ending its idle connections, and the next query opens a new one", async () => {
    const db = await getDb();
    await db.execute(sql`select 1`);
    const [{ pid }] = (await db.execute(sql`select pg_backend_pid() as pid`)).rows as { pid: number }[];
    // Another session ends ours, as a restart or an administrator would.
    const { Client } = await import("pg");
    const admin = new Client({ connectionString: process.env.DATABASE_URL });
    await admin.connect();
    await admin.query("select pg_terminate_backend($1)", [pid]);
    await admin.end();
    await new Promise((r) => setTimeout(r, 200));
    expect(((await db.execute(sql`select 2 as two`)).rows as { two: number }[])[0].two).toBe(2);
  });
});
