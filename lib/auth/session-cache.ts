/**
 * Remembers, for a short while, that a session is open and whose it is, so that a signed-in request
 * costs no database round trip.
 * - On the embedded database one process owns the data (the lock in db/client.ts), so every change
 *   that can end or alter a session happens in this process, and `forgetSessions()` runs after each
 *   one — revocation stays immediate.
 * - On a PostgreSQL server (`DATABASE_URL`) other instances change sessions too: a remembered session
 *   holds only while the data version stays the same, that is while no write at all, of any process,
 *   has been heard since (db/client.ts; another instance's sign-out is heard a moment after it
 *   commits). While the listener is down nothing is remembered and every request asks the database.
 *
 * Kept on globalThis: Next.js may load this module once per route bundle, and a sign-out handled by
 * one route must be seen by all.
 */
import type { Actor } from "@/lib/permissions";

/** How long a confirmed session is trusted without asking again: Heftwise policy, a backstop only. */
export const SESSION_CACHE_TTL_MS = 60_000;
const MAX_ENTRIES = 10_000;

interface Entry {
  userId: string;
  actor: Actor;
  until: number;
  /** On a server: the data version it was read at, and holds for. */
  dataVersion: number | null;
}

interface State {
  generation: number;
  entries: Map<string, Entry>;
}

const state = ((globalThis as unknown as { __heftwiseSessionCache?: State }).__heftwiseSessionCache ??= {
  generation: 0,
  entries: new Map(),
});

/** The generation to pass back to `rememberSession`: a change in between means the answer may be stale. */
export const sessionGeneration = () => state.generation;

export function recallSession(
  sessionId: string,
  userId: string,
  dataVersion: number | null,
  now = Date.now(),
): Actor | undefined {
  const entry = state.entries.get(sessionId);
  if (!entry) return undefined;
  if (entry.until <= now || entry.userId !== userId || entry.dataVersion !== dataVersion) {
    state.entries.delete(sessionId);
    return undefined;
  }
  return entry.actor;
}

/** Keeps an open session's answer, unless a session or user changed since the check began. */
export function rememberSession(
  sessionId: string,
  actor: Actor,
  sessionExpiresAt: Date,
  checkedAtGeneration: number,
  dataVersion: number | null,
  now = Date.now(),
) {
  if (checkedAtGeneration !== state.generation) return;
  if (state.entries.size >= MAX_ENTRIES) state.entries.delete(state.entries.keys().next().value!);
  state.entries.set(sessionId, {
    userId: actor.id,
    actor,
    until: Math.min(now + SESSION_CACHE_TTL_MS, sessionExpiresAt.getTime()),
    dataVersion,
  });
}

/** After any change to a session or to a user's access (sign-out, deactivation, role, password). */
export function forgetSessions() {
  state.generation++;
  state.entries.clear();
}
