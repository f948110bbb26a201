/**
 * One database handle per process. PGlite (embedded PostgreSQL) by default, in a file data
 * directory; `DATABASE_URL` switches the same code to a PostgreSQL server through `pg`.
 * Drivers are loaded with dynamic import() so the unused one never loads.
 *
 * PGlite does not lock its data directory, and two processes opening it corrupt it: a lock beside
 * the directory refuses a second process with a clear message. The lock is a Unix socket the holder
 * listens on, so the operating system releases it when the holder dies, however it dies (a reused
 * pid cannot keep it, as it could a pid file).
 */
import { createHash } from "node:crypto";
import { existsSync, mkdirSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { createConnection, createServer, type Server } from "node:net";
import path from "node:path";
import type { PgliteDatabase } from "drizzle-orm/pglite";
import { databaseConfig } from "./config";
import * as schema from "./schema";

export type Db = PgliteDatabase<typeof schema>;
/** A transaction's handle, as `db.transaction(async (tx) => …)` passes it. */
export type Tx = Parameters<Parameters<Db["transaction"]>[0]>[0];
/** Whatever runs a query: the database itself, or a transaction the caller opened. */
export type Queryable = Db | Tx;

interface Handle {
  db: Db;
  close: () => Promise<void>;
}

const globalForDb = globalThis as unknown as { __heftwiseDb?: Promise<Handle> };

export const MIGRATIONS_FOLDER = path.join(process.cwd(), "db", "migrations");

export class DatabaseLockedError extends Error {}

const lockedMessage = (dataDir: string) =>
  `The database folder ${dataDir} is in use by another Heftwise process. ` +
  `Stop that process first, or set HEFTWISE_DATA_DIR to another folder. ` +
  `Two processes on one PGlite folder would corrupt it.`;

/** Whether a live process answers on the socket: a file left by a dead holder refuses the connection. */
function heldByLiveProcess(socketPath: string): Promise<boolean> {
  return new Promise((resolve) => {
    const probe = createConnection(socketPath);
    probe.once("connect", () => {
      probe.destroy();
      resolve(true);
    });
    probe.once("error", () => resolve(false));
  });
}

function listen(server: Server, socketPath: string): Promise<void> {
  return new Promise((resolve, reject) => {
    server.once("error", reject);
    server.listen(socketPath, () => {
      server.off("error", reject);
      resolve();
    });
  });
}

/** Beside the folder; a path too long for a socket (about 100 bytes) gets a hashed name in the temp folder. */
export function lockPath(dataDir: string): string {
  const beside = `${dataDir}.lock`;
  return Buffer.byteLength(beside) < 100
    ? beside
    : path.join(tmpdir(), `heftwise-${createHash("sha256").update(dataDir).digest("hex").slice(0, 16)}.lock`);
}

async function acquireLock(dataDir: string): Promise<() => void> {
  const socketPath = lockPath(dataDir);
  mkdirSync(path.dirname(socketPath), { recursive: true });
  // The holder accepts and drops connections; the socket never keeps the process alive on its own.
  const server = createServer((socket) => socket.destroy());
  server.unref();
  try {
    await listen(server, socketPath);
  } catch (err) {
    if ((err as NodeJS.ErrnoException).code !== "EADDRINUSE") throw err;
    if (await heldByLiveProcess(socketPath)) throw new DatabaseLockedError(lockedMessage(dataDir));
    // Left by a holder that died: take it over.
    rmSync(socketPath, { force: true });
    await listen(server, socketPath).catch((again) => {
      throw (again as NodeJS.ErrnoException).code === "EADDRINUSE"
        ? new DatabaseLockedError(lockedMessage(dataDir))
        : again;
    });
  }
  return () => {
    server.close();
    if (existsSync(socketPath)) rmSync(socketPath, { force: true });
  };
}

async function open(): Promise<Handle> {
  const { DATABASE_URL, pgliteDir } = databaseConfig();
  if (DATABASE_URL) {
    const [{ Client, Pool }, { drizzle }, { migrate }] = await Promise.all([
      import("pg"),
      import("drizzle-orm/node-postgres"),
      import("drizzle-orm/node-postgres/migrator"),
    ]);
    const pool = new Pool({ connectionString: DATABASE_URL, max: 10 });
    countWrites(pool, "query", writesUnlessRead);
    // The server processes behind this pool's connections: their notices are of writes already counted.
    const own = new Set<number>();
    pool.on("connect", (client) => own.add((client as unknown as { processID: number }).processID));
    pool.on("remove", (client) => own.delete((client as unknown as { processID: number }).processID));
    // An idle connection the server ends (a restart, a failover, an administrator) must not take the
    // process down: the pool drops it and opens another on the next query.
    pool.on("error", (err) =>
      console.error(
        `Database connection lost (${(err as { code?: string }).code ?? "no code"}): ${err.message}; it will be reopened.`,
      ),
    );
    const db = drizzle(pool, { schema });
    countWrites(db, "transaction", writesAlways);
    await migrate(db, { migrationsFolder: MIGRATIONS_FOLDER });
    const stopListening = await listenForWrites(
      () => new Client({ connectionString: DATABASE_URL }),
      (processId) => own.has(processId),
    );
    // Both drivers expose the same query builder; the PGlite type stands for both.
    return {
      db: db as unknown as Db,
      close: async () => {
        await stopListening();
        await pool.end();
      },
    };
  }
  const [{ PGlite }, { pg_trgm }, { drizzle }, { migrate }] = await Promise.all([
    import("@electric-sql/pglite"),
    // Trigram indexes for searching titles and names (migration 0009).
    import("@electric-sql/pglite/contrib/pg_trgm"),
    import("drizzle-orm/pglite"),
    import("drizzle-orm/pglite/migrator"),
  ]);
  const inMemory = pgliteDir === "memory://";
  const release = inMemory ? () => {} : await acquireLock(path.resolve(pgliteDir));
  try {
    if (!inMemory) mkdirSync(path.resolve(pgliteDir), { recursive: true });
    const extensions = { pg_trgm };
    const client = inMemory ? new PGlite({ extensions }) : new PGlite(path.resolve(pgliteDir), { extensions });
    countWrites(client, "query", writesUnlessRead);
    countWrites(client, "exec", writesUnlessRead);
    countWrites(client, "transaction", writesAlways);
    writes.local = true;
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

const writes = ((
  globalThis as unknown as { __heftwiseWrites?: { version: number; local: boolean; listening: boolean } }
).__heftwiseWrites ??= { version: 0, local: false, listening: false });

/**
 * The data version: it moves on each time a write statement or a transaction of this process
 * completes (successfully or not), and, on a PostgreSQL server, each time the server says another
 * process committed a write. A result read while it stayed the same is still true. See
 * lib/read-cache.ts.
 */
export const dataVersion = () => writes.version;

/** Whether every write passes through this process (the embedded database is open). */
export const writesAreLocal = () => writes.local;

/**
 * Whether this process hears of every write: the embedded database's are all its own; on a
 * PostgreSQL server, while its listener is connected. Only then may reads be kept between writes.
 */
export const writesAreHeard = () => writes.local || writes.listening;

const isRead = (statement: unknown) => {
  const text = typeof statement === "string" ? statement : (statement as { text?: unknown } | null)?.text;
  return typeof text === "string" && /^\s*(select|show|explain)\b/i.test(text);
};

/**
 * Moves the version each time a call of `target[method]` that writes completes (successfully or
 * not). For the embedded database's driver, and for a server's pool and drizzle's transactions
 * (which run on a client of their own).
 */
function countWrites<T extends object>(target: T, method: keyof T & string, isWrite: (statement: unknown) => boolean) {
  const original = (target[method] as (...args: unknown[]) => unknown).bind(target);
  (target as Record<string, unknown>)[method] = (...args: unknown[]) => {
    const result = original(...args);
    if (!(result instanceof Promise) || !isWrite(args[0])) return result;
    return result.finally(() => writes.version++);
  };
}

const writesAlways = () => true;
const writesUnlessRead = (statement: unknown) => !isRead(statement);

interface Listener {
  on(event: "notification", listener: (notice: { processId: number }) => void): unknown;
  on(event: "error" | "end", listener: () => void): unknown;
  connect(): Promise<unknown>;
  query(text: string): Promise<unknown>;
  end(): Promise<void>;
}

/**
 * On a PostgreSQL server: listens for the notices every write sends once it commits (migration
 * 0014), so that other processes' writes move the version too (this process's own moved it when
 * they completed, and their notices are passed over). While the listener is down, nothing
 * is kept (every read goes to the server); it reconnects every second, and forgets everything kept
 * before, since notices may have been missed meanwhile.
 */
async function listenForWrites(
  newClient: () => Listener,
  isOwn: (processId: number) => boolean,
): Promise<() => Promise<void>> {
  let current: Listener | null = null;
  let stopped = false;
  let retry: ReturnType<typeof setTimeout> | undefined;
  const lost = (client: Listener) => {
    if (client !== current) return;
    current = null;
    writes.listening = false;
    writes.version++;
    client.end().catch(() => {});
    if (!stopped) retry = setTimeout(() => void connect(), 1000);
  };
  const connect = async () => {
    const client = newClient();
    current = client;
    client.on("notification", (notice) => {
      if (!isOwn(notice.processId)) writes.version++;
    });
    client.on("error", () => lost(client));
    client.on("end", () => lost(client));
    try {
      await client.connect();
      await client.query("LISTEN heftwise_data_changed");
      if (client !== current) return;
      writes.version++;
      writes.listening = true;
    } catch {
      lost(client);
    }
  };
  await connect();
  return async () => {
    stopped = true;
    clearTimeout(retry);
    const client = current;
    current = null;
    writes.listening = false;
    await client?.end().catch(() => {});
  };
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
  writes.local = false;
  writes.version++;
  if (handle) await (await handle).close();
}
