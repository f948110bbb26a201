/**
 * Each test file gets its own database: in-memory PGlite by default, or, in the "postgres" project,
 * a fresh database on the server named by HEFTWISE_TEST_SERVER. Real migrations either way.
 */
import { randomBytes } from "node:crypto";
import { afterAll, beforeAll } from "vitest";

const server = process.env.HEFTWISE_TEST_SERVER;
let dropDatabase: (() => Promise<void>) | undefined;

beforeAll(async () => {
  if (!server) return;
  const { Client } = await import("pg");
  const name = `heftwise_test_${randomBytes(6).toString("hex")}`;
  const admin = new Client({ connectionString: server });
  await admin.connect();
  await admin.query(`CREATE DATABASE ${name}`);
  await admin.end();
  const url = new URL(server);
  url.pathname = `/${name}`;
  process.env.DATABASE_URL = url.toString();
  dropDatabase = async () => {
    const again = new Client({ connectionString: server });
    await again.connect();
    await again.query(`DROP DATABASE IF EXISTS ${name} WITH (FORCE)`);
    await again.end();
  };
});

afterAll(async () => {
  const { closeDb } = await import("@/db/client");
  await closeDb();
  await dropDatabase?.();
});
