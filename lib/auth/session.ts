/**
 * Who is calling. The session token only names the user: role, organisation and whether the
 * account is still active are read from the database on every request, so a deactivated user's
 * session stops working at once and a role change takes effect at once.
 */
import { eq } from "drizzle-orm";
import { getServerSession } from "next-auth";
import { redirect } from "next/navigation";
import { connection } from "next/server";
import { cache } from "react";
import { getDb } from "@/db/client";
import { users } from "@/db/schema";
import type { Actor } from "@/lib/permissions";
import { authOptions } from "./options";
import { sessionIsOpen } from "./sessions";

export const getActor = cache(async (): Promise<Actor | null> => {
  // Who is calling is known only at request time: never prerender a page that asks.
  await connection();
  const session = await getServerSession(authOptions);
  const id = session?.user?.id;
  if (!id) return null;
  const db = await getDb();
  const user = await db.query.users.findFirst({ where: eq(users.id, id) });
  if (!user || !user.active || !user.passwordHash) return null;
  // The token is only as good as its session record: signed out (here or everywhere) means gone.
  if (!(await sessionIsOpen(session.sessionId, user.id))) return null;
  return { id: user.id, organisationId: user.organisationId, role: user.role, name: user.name, email: user.email };
});

/** For pages: the actor, or a redirect to the sign-in page. */
export async function requireActor(): Promise<Actor> {
  const actor = await getActor();
  if (!actor) redirect("/sign-in");
  return actor;
}
