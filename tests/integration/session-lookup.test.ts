/**
 * The session read on every request: the cookie decrypted with next-auth's own format, the session
 * record checked (remembered for a while on the embedded database), and every change that ends or
 * alters access seen at once — sign-out, sign-out everywhere, deactivation, a role change.
 */
import { encode } from "next-auth/jwt";
import { beforeAll, describe, expect, it, vi } from "vitest";
import { config } from "@/lib/config";
import { databaseConfig } from "@/db/config";
import { closeAllSessions, closeSession, openSession } from "@/lib/auth/sessions";
import { forgetSessions, recallSession, rememberSession, sessionGeneration } from "@/lib/auth/session-cache";
import { changeRole, setActive } from "@/lib/users/service";
import type { Actor } from "@/lib/permissions";
import { actorFor, demoOrganisation } from "./helpers";

const jar = vi.hoisted(() => ({ cookies: new Map<string, string>() }));
vi.mock("next/headers", () => ({
  cookies: async () => ({
    get: (name: string) => (jar.cookies.has(name) ? { name, value: jar.cookies.get(name)! } : undefined),
    getAll: () => [...jar.cookies].map(([name, value]) => ({ name, value })),
  }),
  headers: async () => new Headers({ "x-forwarded-for": "10.30.0.4", "user-agent": "Test client" }),
}));
vi.mock("next/server", async (original) => ({ ...(await original<object>()), connection: async () => undefined }));
const { getActor, readSessionClaims, sessionCookieName } = await import("@/lib/auth/session");

let admin: Actor;
let adviser: Actor;
const cookieName = () => sessionCookieName(config().NEXTAUTH_URL);

async function signedIn(user: Actor, secret = config().secret) {
  const sessionId = await openSession(user.id);
  const token = await encode({
    token: { userId: user.id, sessionId, role: user.role, organisationId: user.organisationId, name: user.name },
    secret,
  });
  jar.cookies = new Map([[cookieName(), token]]);
  return { sessionId, token };
}

beforeAll(async () => {
  const { organisationId } = await demoOrganisation();
  admin = await actorFor("admin", organisationId);
  adviser = await actorFor("adviser", organisationId);
});

describe("reading the session cookie", () => {
  it("a token made by next-auth's format names its user and session; forged, foreign or missing names nobody", async () => {
    const { sessionId, token } = await signedIn(adviser);
    expect(await readSessionClaims(await (await import("next/headers")).cookies())).toEqual({
      userId: adviser.id,
      sessionId,
    });
    jar.cookies = new Map([[cookieName(), `${token.slice(0, -4)}AAAA`]]);
    expect(await getActor()).toBeNull();
    jar.cookies = new Map([
      [
        cookieName(),
        await encode({
          token: { userId: adviser.id, sessionId, role: adviser.role, organisationId: adviser.organisationId },
          secret: "another-secret-of-at-least-thirty-two-chars",
        }),
      ],
    ]);
    expect(await getActor()).toBeNull();
    jar.cookies = new Map();
    expect(await getActor()).toBeNull();
  });

  it("a token split into numbered chunks is put back together", async () => {
    const { token } = await signedIn(adviser);
    const half = Math.ceil(token.length / 2);
    jar.cookies = new Map([
      [`${cookieName()}.1`, token.slice(half)],
      [`${cookieName()}.0`, token.slice(0, half)],
    ]);
    expect((await getActor())?.id).toBe(adviser.id);
    // How the session was opened, and where this request comes from, for the audit trail.
    expect((await getActor())?.auth).toEqual({
      via: "session",
      method: "password",
      address: "10.30.0.4",
      client: "Test client",
    });
  });
});

describe("every change to access is seen at once", () => {
  it("signing out ends the session even after it was remembered", async () => {
    const { sessionId } = await signedIn(adviser);
    expect((await getActor())?.id).toBe(adviser.id);
    expect((await getActor())?.id).toBe(adviser.id);
    await closeSession(sessionId);
    expect(await getActor()).toBeNull();
  });

  it("signing out everywhere, and deactivation, end a remembered session", async () => {
    await signedIn(adviser);
    expect(await getActor()).not.toBeNull();
    await closeAllSessions(adviser.id);
    expect(await getActor()).toBeNull();

    await signedIn(adviser);
    expect(await getActor()).not.toBeNull();
    await setActive(admin, { userId: adviser.id, active: false });
    expect(await getActor()).toBeNull();
    await setActive(admin, { userId: adviser.id, active: true });
    expect(await getActor()).toBeNull();
  });

  it("a session closed by another process (another instance on the same server) ends a moment later", async () => {
    const { sessionId } = await signedIn(adviser);
    expect((await getActor())?.id).toBe(adviser.id);
    expect((await getActor())?.id).toBe(adviser.id);
    const { DATABASE_URL } = databaseConfig();
    if (!DATABASE_URL) {
      // The embedded database has no other process (its lock): every close passes through forgetSessions.
      await closeSession(sessionId);
      expect(await getActor()).toBeNull();
      return;
    }
    const { Client } = await import("pg");
    const other = new Client({ connectionString: DATABASE_URL });
    await other.connect();
    await other.query("delete from user_sessions where id = $1", [sessionId]);
    await other.end();
    let actor = await getActor();
    for (let i = 0; i < 50 && actor; i++) {
      await new Promise((r) => setTimeout(r, 20));
      actor = await getActor();
    }
    expect(actor).toBeNull();
  });

  it("a role change takes effect on the next request", async () => {
    await signedIn(adviser);
    expect((await getActor())?.role).toBe("adviser");
    await changeRole(admin, { userId: adviser.id, role: "approver" });
    expect((await getActor())?.role).toBe("approver");
    await changeRole(admin, { userId: adviser.id, role: "adviser" });
    expect((await getActor())?.role).toBe("adviser");
  });
});

describe("the session memory", () => {
  const actor: Actor = { id: "u1", organisationId: "o1", role: "adviser", name: "N", email: "n@x.example" };

  it("keeps an answer until its time, its session's expiry, or a change", () => {
    forgetSessions();
    const now = 1_000_000;
    rememberSession("s1", actor, new Date(now + 10_000), sessionGeneration(), null, now);
    expect(recallSession("s1", "u1", null, now + 5_000)).toEqual(actor);
    expect(recallSession("s1", "someone-else", null, now + 5_000)).toBeUndefined();
    rememberSession("s1", actor, new Date(now + 10_000), sessionGeneration(), null, now);
    expect(recallSession("s1", "u1", null, now + 10_000)).toBeUndefined();
    rememberSession("s2", actor, new Date(now + 10_000_000), sessionGeneration(), null, now);
    expect(recallSession("s2", "u1", null, now + 59_000)).toEqual(actor);
    expect(recallSession("s2", "u1", null, now + 61_000)).toBeUndefined();
    rememberSession("s3", actor, new Date(now + 10_000_000), sessionGeneration(), null, now);
    forgetSessions();
    expect(recallSession("s3", "u1", null, now)).toBeUndefined();
  });

  it("never keeps an answer read before a change that came after it began", () => {
    const before = sessionGeneration();
    forgetSessions();
    rememberSession("s4", actor, new Date(Date.now() + 60_000), before, null);
    expect(recallSession("s4", "u1", null)).toBeUndefined();
  });

  it("on a PostgreSQL server, an answer holds only at the data version it was read at", () => {
    forgetSessions();
    const now = 1_000_000;
    rememberSession("s5", actor, new Date(now + 10_000_000), sessionGeneration(), 7, now);
    expect(recallSession("s5", "u1", 7, now + 1_000)).toEqual(actor);
    // A write heard from any process since: asked again.
    expect(recallSession("s5", "u1", 8, now + 1_000)).toBeUndefined();
    expect(recallSession("s5", "u1", 7, now + 1_000)).toBeUndefined();
  });
});
