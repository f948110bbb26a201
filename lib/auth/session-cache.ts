/**
 * Remembers, for a short while, that a session is open and whose it is, so that a signed-in request
 * costs no database round trip. Used only on the embedded database: one process owns it (the lock in
 * db/client.ts), so every change that can end or alter a session happens in this process, and
 * `forgetSessions()` runs after each one — revocation stays immediate. With a PostgreSQL server
 * (`DATABASE_URL`), other instances can change sessions, and every request asks the database.
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

export function recallSession(sessionId: string, userId: string, now = Date.now()): Actor | undefined {
  const entry = state.entries.get(sessionId);
  if (!entry) return undefined;
  if (entry.until <= now || entry.userId !== userId) {
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
  now = Date.now(),
) {
  if (checkedAtGeneration !== state.generation) return;
  if (state.entries.size >= MAX_ENTRIES) state.entries.delete(state.entries.keys().next().value!);
  state.entries.set(sessionId, {
    userId: actor.id,
    actor,
    until: Math.min(now + SESSION_CACHE_TTL_MS, sessionExpiresAt.getTime()),
  });
}

/** After any change to a session or to a user's access (sign-out, deactivation, role, password). */
export function forgetSessions() {
  state.generation++;
  state.entries.clear();
}
