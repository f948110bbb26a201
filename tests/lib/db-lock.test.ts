/** Two processes on one PGlite folder would corrupt it: the second is refused with a clear message. */
import { spawn } from "node:child_process";
import { existsSync, mkdtempSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import path from "node:path";
import { afterAll, describe, expect, it, vi } from "vitest";

const dataDir = mkdtempSync(path.join(tmpdir(), "heftwise-lock-"));
const other = spawn("sleep", ["30"]);
afterAll(() => other.kill());

describe("the data folder lock", () => {
  it("refuses to open a folder another live process holds", async () => {
    vi.resetModules();
    process.env.HEFTWISE_DATA_DIR = dataDir;
    const { getDb, closeDb } = await import("@/db/client");
    writeFileSync(`${dataDir}/pglite.lock`, String(other.pid));
    await expect(getDb()).rejects.toThrow(/in use by another Heftwise process \(pid \d+\)/);
    await closeDb();
  });

  it("takes over a stale lock, opens and migrates, and releases the lock on close", async () => {
    vi.resetModules();
    process.env.HEFTWISE_DATA_DIR = dataDir;
    writeFileSync(`${dataDir}/pglite.lock`, "999999");
    const { getDb, closeDb } = await import("@/db/client");
    const db = await getDb();
    const { organisations } = await import("@/db/schema");
    expect(await db.select().from(organisations)).toEqual([]);
    expect(existsSync(`${dataDir}/pglite.lock`)).toBe(true);
    await closeDb();
    expect(existsSync(`${dataDir}/pglite.lock`)).toBe(false);
    process.env.HEFTWISE_DATA_DIR = "memory://";
  });
});
