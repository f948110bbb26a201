/**
 * Server-side session records behind the JWT: sign-in opens one, sign-out closes it, "sign out
 * everywhere" and deactivation close all of a user's. Every request checks its record, so a copied
 * token dies with its session.
 */
import { and, eq, gt, ne } from "drizzle-orm";
import { getDb, type Queryable } from "@/db/client";
import { userSessions } from "@/db/schema";
import { forgetSessions } from "./session-cache";
import { isUuid } from "@/lib/ids";

export const SESSION_MAX_AGE_S = 12 * 60 * 60;

export async function openSession(
  userId: string,
  signedIn: { method: string; address: string | null; client: string | null } = {
    method: "password",
    address: null,
    client: null,
  },
): Promise<string> {
  const db = await getDb();
  const [row] = await db
    .insert(userSessions)
    .values({ userId, ...signedIn, expiresAt: new Date(Date.now() + SESSION_MAX_AGE_S * 1000) })
    .returning({ id: userSessions.id });
  return row.id;
}

export async function sessionIsOpen(sessionId: string | undefined, userId: string): Promise<boolean> {
  if (!sessionId || !isUuid(sessionId)) return false;
  const db = await getDb();
  const [row] = await db
    .select({ id: userSessions.id })
    .from(userSessions)
    .where(
      and(eq(userSessions.id, sessionId), eq(userSessions.userId, userId), gt(userSessions.expiresAt, new Date())),
    );
  return !!row;
}

export async function closeSession(sessionId: string | undefined): Promise<void> {
  if (!sessionId || !isUuid(sessionId)) return;
  const db = await getDb();
  await db.delete(userSessions).where(eq(userSessions.id, sessionId));
  forgetSessions();
}

/**
 * Every session of a user, on every device. Inside a caller's transaction, the caller runs
 * `forgetSessions()` once it commits (until then, another request could still read the old rows).
 */
export async function closeAllSessions(userId: string, tx?: Queryable): Promise<void> {
  await (tx ?? (await getDb())).delete(userSessions).where(eq(userSessions.userId, userId));
  forgetSessions();
}

/** Every session of a user but one: a password change keeps the session that made it. */
export async function closeOtherSessions(userId: string, keep: string | undefined, tx: Queryable): Promise<void> {
  await tx
    .delete(userSessions)
    .where(and(eq(userSessions.userId, userId), ...(keep && isUuid(keep) ? [ne(userSessions.id, keep)] : [])));
}
