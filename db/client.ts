/**
 * One database handle per process. PGlite (embedded PostgreSQL) by default, in a file data
 * directory; `DATABASE_URL` switches the same code to a PostgreSQL server through `pg`.
 * Drivers are loaded with dynamic import() so the unused one never loads.
 *
 * PGlite does not lock its data directory, and two processes opening it corrupt it: a lock file
 * beside the directory refuses a second process with a clear message.
 */
import { existsSync, mkdirSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import path from "node:path";
import type { PgliteDatabase } from "drizzle-orm/pglite";
import { config } from "@/lib/config";
import * as schema from "./schema";

export type Db = PgliteDatabase<typeof schema>;

interface Handle {
  db: Db;
  close: () => Promise<void>;
}

const globalForDb = globalThis as unknown as { __heftwiseDb?: Promise<Handle> };

export const MIGRATIONS_FOLDER = path.join(process.cwd(), "db", "migrations");

export class DatabaseLockedError extends Error {}

function processAlive(pid: number): boolean {
  try {
    process.kill(pid, 0);
    return true;
  } catch (err) {
    return (err as NodeJS.ErrnoException).code === "EPERM";
  }
}

function acquireLock(dataDir: string): () => void {
  const lockFile = `${dataDir}.lock`;
  if (existsSync(lockFile)) {
    const pid = Number(readFileSync(lockFile, "utf8").trim());
    if (pid && pid !== process.pid && processAlive(pid))
      throw new DatabaseLockedError(
        `The database folder ${dataDir} is in use by another Heftwise process (pid ${pid}). ` +
          `Stop that process first, or set HEFTWISE_DATA_DIR to another folder. ` +
          `Two processes on one PGlite folder would corrupt it.`,
      );
  }
  mkdirSync(path.dirname(lockFile), { recursive: true });
  writeFileSync(lockFile, String(process.pid));
  return () => {
    try {
      if (readFileSync(lockFile, "utf8").trim() === String(process.pid)) rmSync(lockFile);
    } catch {
      // already gone
    }
  };
}

async function open(): Promise<Handle> {
  const { DATABASE_URL, pgliteDir } = config();
  if (DATABASE_URL) {
    const [{ Pool }, { drizzle }, { migrate }] = await Promise.all([
      import("pg"),
      import("drizzle-orm/node-postgres"),
      import("drizzle-orm/node-postgres/migrator"),
    ]);
    const pool = new Pool({ connectionString: DATABASE_URL, max: 10 });
    const db = drizzle(pool, { schema });
    await migrate(db, { migrationsFolder: MIGRATIONS_FOLDER });
    // Both drivers expose the same query builder; the PGlite type stands for both.
    return { db: db as unknown as Db, close: () => pool.end() };
  }
  const [{ PGlite }, { drizzle }, { migrate }] = await Promise.all([
    import("@electric-sql/pglite"),
    import("drizzle-orm/pglite"),
    import("drizzle-orm/pglite/migrator"),
  ]);
  const inMemory = pgliteDir === "memory://";
  const release = inMemory ? () => {} : acquireLock(path.resolve(pgliteDir));
  try {
    if (!inMemory) mkdirSync(path.resolve(pgliteDir), { recursive: true });
    const client = inMemory ? new PGlite() : new PGlite(path.resolve(pgliteDir));
    const db = drizzle(client, { schema });
    await migrate(db, { migrationsFolder: MIGRATIONS_FOLDER });
    return {
      db,
      close: async () => {
        await client.close();
        release();
      },
    };
  } catch (err) {
    release();
    throw err;
  }
}

/** The process's database, opened and migrated on first use. */
export function getDb(): Promise<Db> {
  globalForDb.__heftwiseDb ??= open().catch((err) => {
    globalForDb.__heftwiseDb = undefined;
    throw err;
  });
  return globalForDb.__heftwiseDb.then((h) => h.db);
}

/** Closes the database if it was opened (on shutdown, and between test files). */
export async function closeDb(): Promise<void> {
  const handle = globalForDb.__heftwiseDb;
  globalForDb.__heftwiseDb = undefined;
  if (handle) await (await handle).close();
}
