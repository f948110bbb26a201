/**
 * The sign-in throttle. Failures are counted per key, in the database (several app instances on one
 * PostgreSQL server behave as one), and forgotten after a quiet window:
 * - per account and address ("pair"): after 5 failures within 15 minutes each further attempt from
 *   that address waits, doubling from 30 s to 15 min — so guessing is slow, while the account's
 *   owner signing in from another address is never locked out by someone else's failures;
 * - per address: after 20 failures (many accounts tried from one place) the address waits too;
 * - per account: failures from anywhere only slow the check down, by up to 2 s, never refuse it.
 * Addresses come from lib/client-address.ts, which believes forwarded headers only from
 * configured proxies.
 */
import { inArray, sql } from "drizzle-orm";
import { getDb } from "@/db/client";
import { signInAttempts } from "@/db/schema";

export const WINDOW_MS = 15 * 60_000;
export const FREE_PAIR_FAILURES = 5;
export const FREE_ADDRESS_FAILURES = 20;
export const BASE_WAIT_MS = 30_000;
export const MAX_WAIT_MS = 15 * 60_000;
export const SLOWDOWN_STEP_MS = 250;
export const MAX_SLOWDOWN_MS = 2_000;

export interface Attempts {
  failures: number;
  lastFailure: number;
}

/** Milliseconds still to wait after `failures`, the last at `lastFailure` (pure). */
export function waitAfter(entry: Attempts | undefined, free: number, now: number): number {
  if (!entry || now - entry.lastFailure > WINDOW_MS || entry.failures < free) return 0;
  const backoff = Math.min(MAX_WAIT_MS, BASE_WAIT_MS * 2 ** (entry.failures - free));
  return Math.max(0, entry.lastFailure + backoff - now);
}

/** How much to slow an account's check after failures from anywhere (pure). */
export function slowdownAfter(entry: Attempts | undefined, now: number): number {
  if (!entry || now - entry.lastFailure > WINDOW_MS || entry.failures <= FREE_PAIR_FAILURES) return 0;
  return Math.min(MAX_SLOWDOWN_MS, SLOWDOWN_STEP_MS * (entry.failures - FREE_PAIR_FAILURES));
}

export const throttleKeys = (email: string, address: string | null) => ({
  pair: `pair:${email}|${address ?? "unknown"}`,
  address: address ? `address:${address}` : null,
  account: `account:${email}`,
});

export async function readAttempts(keys: string[]): Promise<Map<string, Attempts>> {
  const db = await getDb();
  const rows = keys.length ? await db.select().from(signInAttempts).where(inArray(signInAttempts.key, keys)) : [];
  return new Map(rows.map((r) => [r.key, { failures: r.failures, lastFailure: r.lastFailure.getTime() }]));
}

/** One more failure for each key; a count older than the window starts again. */
export async function recordFailure(keys: string[]): Promise<void> {
  const db = await getDb();
  for (const key of keys)
    await db
      .insert(signInAttempts)
      .values({ key, failures: 1, lastFailure: new Date() })
      .onConflictDoUpdate({
        target: signInAttempts.key,
        set: {
          failures: sql`case when ${signInAttempts.lastFailure} < now() - ${`${WINDOW_MS / 1000} seconds`}::interval then 1 else ${signInAttempts.failures} + 1 end`,
          lastFailure: sql`now()`,
        },
      });
}

export async function clearAttempts(keys: string[]): Promise<void> {
  const db = await getDb();
  await db.delete(signInAttempts).where(inArray(signInAttempts.key, keys));
}

/**
 * One attempt's throttle, for sign-in and for step-up alike: whether it must wait first (and the
 * message saying how long), how much to slow it, and what to record when it fails or succeeds.
 */
export async function throttleAttempt(email: string, address: string | null) {
  const keys = throttleKeys(email, address);
  const all = [keys.pair, keys.account, ...(keys.address ? [keys.address] : [])];
  const attempts = await readAttempts(all);
  const now = Date.now();
  const wait = Math.max(
    waitAfter(attempts.get(keys.pair), FREE_PAIR_FAILURES, now),
    keys.address ? waitAfter(attempts.get(keys.address), FREE_ADDRESS_FAILURES, now) : 0,
  );
  const minutes = Math.ceil(wait / 60_000);
  return {
    refusal: wait > 0 ? `Too many attempts. Wait ${minutes} minute${minutes === 1 ? "" : "s"} and try again.` : null,
    slowdown: slowdownAfter(attempts.get(keys.account), now),
    failed: () => recordFailure(all),
    succeeded: () => clearAttempts([keys.pair, keys.account]),
  };
}
