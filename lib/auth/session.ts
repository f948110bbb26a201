/**
 * Who is calling. The session token only names the user and the session: role, organisation and
 * whether the account and the session are still open are read from the database, so a deactivated
 * user's session stops working at once and a role change takes effect at once.
 *
 * The token is read straight from its cookie and decrypted (next-auth's own `decode`), not through
 * `getServerSession`, which runs next-auth's whole handler and re-issues the cookie on every call:
 * that was most of the cost of a signed-in request (DEVELOPERS.md, "What a request costs").
 */
import { and, eq, gt } from "drizzle-orm";
import { decode } from "next-auth/jwt";
import { cookies } from "next/headers";
import { redirect } from "next/navigation";
import { connection } from "next/server";
import { cache } from "react";
import { dataVersion, getDb, writesAreHeard, writesAreLocal } from "@/db/client";
import { organisations, users, userSessions } from "@/db/schema";
import { isUuid } from "@/lib/ids";
import type { Actor } from "@/lib/permissions";
import { config } from "@/lib/config";
import { requestOrigin } from "./request-context";
import { recallSession, rememberSession, sessionGeneration } from "./session-cache";

/** next-auth's cookie name: the __Secure- prefix when the site is served over https. */
export const sessionCookieName = (origin: string) =>
  `${origin.startsWith("https://") ? "__Secure-" : ""}next-auth.session-token`;

type CookieJar = { get(name: string): { value: string } | undefined; getAll(): { name: string; value: string }[] };

/** The token, whole or in the numbered chunks next-auth splits a large one into. */
function sessionToken(jar: CookieJar, name: string): string | undefined {
  const whole = jar.get(name)?.value;
  if (whole) return whole;
  const chunks = jar
    .getAll()
    .filter((c) => c.name.startsWith(`${name}.`) && /^\d+$/.test(c.name.slice(name.length + 1)))
    .sort((a, b) => Number(a.name.slice(name.length + 1)) - Number(b.name.slice(name.length + 1)));
  return chunks.length ? chunks.map((c) => c.value).join("") : undefined;
}

/** The claims of a session cookie, or null when it is missing, forged, expired or unreadable. */
export async function readSessionClaims(jar: CookieJar): Promise<{ userId: string; sessionId: string } | null> {
  const { secret, NEXTAUTH_URL } = config();
  const token = sessionToken(jar, sessionCookieName(NEXTAUTH_URL));
  if (!token) return null;
  const claims = await decode({ token, secret }).catch(() => null);
  if (!claims || !isUuid(claims.userId) || !isUuid(claims.sessionId)) return null;
  return { userId: claims.userId, sessionId: claims.sessionId };
}

async function lookUp(userId: string, sessionId: string): Promise<Actor | null> {
  // On a server a remembered session holds only while no write has been heard (session-cache.ts).
  const version = writesAreLocal() ? null : dataVersion();
  const remembering = writesAreHeard();
  if (remembering) {
    const known = recallSession(sessionId, userId, version);
    if (known) return known;
  }
  const generation = sessionGeneration();
  const db = await getDb();
  // One query: the user, only while the token's session record is open — signed out (here or
  // everywhere) or expired means gone.
  const [row] = await db
    .select({
      id: users.id,
      organisationId: users.organisationId,
      role: users.role,
      name: users.name,
      email: users.email,
      active: users.active,
      passwordHash: users.passwordHash,
      expiresAt: userSessions.expiresAt,
      method: userSessions.method,
      totpEnabledAt: users.totpEnabledAt,
      secondFactorRoles: organisations.secondFactorRoles,
    })
    .from(users)
    .innerJoin(
      userSessions,
      and(eq(userSessions.userId, users.id), eq(userSessions.id, sessionId), gt(userSessions.expiresAt, new Date())),
    )
    .innerJoin(organisations, eq(organisations.id, users.organisationId))
    .where(eq(users.id, userId));
  if (!row || !row.active || !row.passwordHash) return null;
  const actor: Actor = {
    id: row.id,
    organisationId: row.organisationId,
    role: row.role,
    name: row.name,
    email: row.email,
    auth: { via: "session", method: row.method, address: null, client: null },
    ...(row.secondFactorRoles.includes(row.role) && !row.totpEnabledAt ? { mustEnrolSecondFactor: true } : {}),
  };
  // On a server, a write heard meanwhile (or the listener lost, which moves the version too) means
  // the answer may be stale.
  if (remembering && (version === null || version === dataVersion()))
    rememberSession(sessionId, actor, row.expiresAt, generation, version);
  return actor;
}

export const getActor = cache(async (): Promise<Actor | null> => {
  // Who is calling is known only at request time: never prerender a page that asks.
  await connection();
  const claims = await readSessionClaims(await cookies());
  const actor = claims ? await lookUp(claims.userId, claims.sessionId) : null;
  return actor && { ...actor, auth: { ...actor.auth!, ...(await requestOrigin()) } };
});

/** For pages: the actor, or a redirect to the sign-in page. */
export async function requireActor(): Promise<Actor> {
  const actor = await getActor();
  if (!actor) redirect("/sign-in");
  return actor;
}
