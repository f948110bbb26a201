/**
 * Two processes on one PGlite folder would corrupt it: the second is refused with a clear message.
 * The lock is a socket the holder listens on, so it goes when the holder dies — even by kill -9 —
 * and a pid reused after a restart cannot keep it.
 */
import { spawn, type ChildProcess } from "node:child_process";
import { existsSync, mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { afterAll, describe, expect, it, vi } from "vitest";

const dataDir = mkdtempSync(path.join(tmpdir(), "heftwise-lock-"));
const lockFile = `${dataDir}/pglite.lock`;
const children: ChildProcess[] = [];
afterAll(() => {
  for (const c of children) c.kill("SIGKILL");
  process.env.HEFTWISE_DATA_DIR = "memory://";
});

/** Another process holding the lock, as a running Heftwise would. */
async function holder(): Promise<ChildProcess> {
  const child = spawn(process.execPath, [
    "-e",
    "require('net').createServer((s) => s.destroy()).listen(process.argv[1]); setInterval(() => {}, 1000)",
    lockFile,
  ]);
  children.push(child);
  for (let i = 0; i < 100 && !existsSync(lockFile); i++) await new Promise((r) => setTimeout(r, 20));
  return child;
}

async function client() {
  vi.resetModules();
  process.env.HEFTWISE_DATA_DIR = dataDir;
  return import("@/db/client");
}

describe("the data folder lock", () => {
  it("refuses to open a folder another live process holds", async () => {
    const other = await holder();
    const { getDb, closeDb } = await client();
    await expect(getDb()).rejects.toThrow(/in use by another Heftwise process/);
    await closeDb();
    other.kill("SIGKILL");
    await new Promise((r) => other.once("exit", r));
  });

  it("a holder killed with kill -9 leaves the folder to the next process, which opens, migrates and releases it", async () => {
    expect(existsSync(lockFile)).toBe(true); // left behind by the killed holder
    const { getDb, closeDb } = await client();
    const db = await getDb();
    const { organisations } = await import("@/db/schema");
    expect(await db.select().from(organisations)).toEqual([]);
    await closeDb();
    expect(existsSync(lockFile)).toBe(false);
  });

  it("a pid file naming a live process (a pid reused after a restart) does not keep the folder locked", async () => {
    writeFileSync(lockFile, String(process.ppid));
    const { getDb, closeDb } = await client();
    await expect(getDb()).resolves.toBeDefined();
    await closeDb();
  });

  it("a data folder path too long for a socket gets a lock in the temp folder", async () => {
    const { lockPath } = await client();
    const long = path.join(dataDir, "x".repeat(120));
    expect(lockPath(long).startsWith(tmpdir())).toBe(true);
    expect(lockPath(long)).toBe(lockPath(long));
    expect(lockPath(`${dataDir}/pglite`)).toBe(lockFile);
  });
});
