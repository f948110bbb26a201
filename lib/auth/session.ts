/**
 * Who is calling. The session token only names the user: role, organisation and whether the
 * account is still active are read from the database on every request, so a deactivated user's
 * session stops working at once and a role change takes effect at once.
 */
import { and, eq, gt } from "drizzle-orm";
import { getServerSession } from "next-auth";
import { redirect } from "next/navigation";
import { connection } from "next/server";
import { cache } from "react";
import { getDb } from "@/db/client";
import { users, userSessions } from "@/db/schema";
import type { Actor } from "@/lib/permissions";
import { authOptions } from "./options";

export const getActor = cache(async (): Promise<Actor | null> => {
  // Who is calling is known only at request time: never prerender a page that asks.
  await connection();
  const session = await getServerSession(authOptions);
  const id = session?.user?.id;
  const sessionId = session?.sessionId;
  if (!id || !sessionId || !/^[0-9a-f-]{36}$/i.test(sessionId)) return null;
  const db = await getDb();
  // One query: the user, only while the token's session record is open — signed out (here or
  // everywhere) or expired means gone.
  const [user] = await db
    .select({ id: users.id, organisationId: users.organisationId, role: users.role, name: users.name, email: users.email, active: users.active, passwordHash: users.passwordHash })
    .from(users)
    .innerJoin(userSessions, and(eq(userSessions.userId, users.id), eq(userSessions.id, sessionId), gt(userSessions.expiresAt, new Date())))
    .where(eq(users.id, id));
  if (!user || !user.active || !user.passwordHash) return null;
  return { id: user.id, organisationId: user.organisationId, role: user.role, name: user.name, email: user.email };
});

/** For pages: the actor, or a redirect to the sign-in page. */
export async function requireActor(): Promise<Actor> {
  const actor = await getActor();
  if (!actor) redirect("/sign-in");
  return actor;
}
