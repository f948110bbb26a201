/**
 * Kept answers (lib/read-cache.ts) hear of every write, whoever makes it: each table tells the
 * listeners when it changes (migration 0014), and on a PostgreSQL server a write made by another
 * process — another Heftwise instance, a script, an administrator at psql — is in the next answer.
 */
import { sql } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { getDb, writesAreHeard, writesAreLocal } from "@/db/client";
import { databaseConfig } from "@/db/config";
import { countJobs, listJobs } from "@/assessments/jobs/queries";
import type { Actor } from "@/lib/permissions";
import { actorFor, demoOrganisation } from "./helpers";

let adviser: Actor;

beforeAll(async () => {
  const { organisationId } = await demoOrganisation();
  adviser = await actorFor("adviser", organisationId);
});

/** A write that does not pass through this process's pool: another connection on a server. */
async function writeElsewhere(statement: string) {
  const { DATABASE_URL } = databaseConfig();
  if (!DATABASE_URL) {
    // The embedded database has one user, this process (its lock): its driver, straight.
    const db = await getDb();
    await (db as unknown as { $client: { query: (text: string) => Promise<unknown> } }).$client.query(statement);
    return;
  }
  const { Client } = await import("pg");
  const other = new Client({ connectionString: DATABASE_URL });
  await other.connect();
  try {
    await other.query(statement);
  } finally {
    await other.end();
  }
}

describe("kept answers hear of every write", () => {
  it("every table of Heftwise's sends the data-changed notice on every kind of write", async () => {
    const db = await getDb();
    const rows = await db.execute<{ table: string; triggers: string[] }>(sql`
      select c.relname as table,
             coalesce(array_agg(t.tgname::text) filter (where t.tgname is not null), '{}') as triggers
      from pg_class c
      join pg_namespace n on n.oid = c.relnamespace and n.nspname = current_schema()
      left join pg_trigger t on t.tgrelid = c.oid and not t.tgisinternal
      where c.relkind in ('r', 'p')
      group by c.relname`);
    const tables = ("rows" in rows ? rows.rows : rows) as { table: string; triggers: string[] }[];
    expect(tables.map((t) => t.table)).toContain("revisions");
    expect(tables.filter((t) => !t.triggers.includes("heftwise_data_changed")).map((t) => t.table)).toEqual([]);
  });

  it("reads are kept only while every write is heard: a lost listener keeps nothing until it is back", async () => {
    expect(writesAreHeard()).toBe(true);
    if (writesAreLocal()) return; // The embedded database hears every write: they are all its own.
    const db = await getDb();
    // The server ends the listener's connection, as a restart or an administrator would.
    await db.execute(sql`select pg_terminate_backend(pid) from pg_stat_activity
                         where datname = current_database() and query ilike 'LISTEN heftwise_data_changed%'`);
    const until = async (heard: boolean) => {
      for (let i = 0; i < 100 && writesAreHeard() !== heard; i++) await new Promise((r) => setTimeout(r, 50));
      return writesAreHeard();
    };
    expect(await until(false)).toBe(false);
    // Nothing kept meanwhile: each read is the server's own answer.
    expect(await listJobs(adviser)).not.toBe(await listJobs(adviser));
    expect(await until(true)).toBe(true);
    const kept = await listJobs(adviser);
    expect(await listJobs(adviser)).toBe(kept);
  });

  it("a job written by another connection is in the next count", async () => {
    const before = await countJobs(adviser);
    await writeElsewhere(
      `insert into jobs (organisation_id, name, client, location, site_contact_phone)
       values ('${adviser.organisationId}', 'Written elsewhere', 'Invented Client Ltd', 'Nowhere', '07700 900222')`,
    );
    // A server delivers the notice after the commit, a moment later: ask until it has arrived.
    let after = await countJobs(adviser);
    for (let i = 0; i < 50 && after === before; i++) {
      await new Promise((r) => setTimeout(r, 20));
      after = await countJobs(adviser);
    }
    expect(after).toBe(before + 1);
  });
});
