/**
 * API tokens: created by an administrator for a scope within their own role, shown once and stored
 * hashed, sent as a bearer token to the same route handlers a browser uses, with the same
 * permission checks; revoked or expired tokens get 401, too little scope 403 naming the permission,
 * too many requests 429; a token never signs and a creator who leaves takes its power away.
 */
import { eq } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import { getDb } from "@/db/client";
import { apiTokens, users } from "@/db/schema";
import {
  actorForToken,
  createApiToken,
  grantableScopes,
  listApiTokens,
  revokeApiToken,
  TOKEN_REQUESTS_PER_MINUTE,
} from "@/lib/api-tokens/service";
import { AppError } from "@/lib/errors";
import type { Actor } from "@/lib/permissions";
import { actorFor, demoOrganisation, otherOrganisation } from "./helpers";

const assessmentsRoute = await import("@/app/api/v1/assessments/route");
const auditCheckRoute = await import("@/app/api/v1/audit/check/route");
const meRoute = await import("@/app/api/v1/me/route");
const jobsRoute = await import("@/app/api/v1/jobs/route");

let admin: Actor;
let adviser: Actor;
let organisationId: string;

beforeAll(async () => {
  ({ organisationId } = await demoOrganisation());
  admin = await actorFor("admin", organisationId);
  adviser = await actorFor("adviser", organisationId);
});

type Handler = (request: Request, context: { params: Promise<Record<string, string>> }) => Promise<Response>;

async function call(handler: unknown, token: string | null, init: RequestInit = {}) {
  const headers = new Headers(init.headers);
  if (token !== null) headers.set("authorization", `Bearer ${token}`);
  const res = await (handler as Handler)(new Request("http://localhost/api/v1/x", { ...init, headers }), {
    params: Promise.resolve({}),
  });
  return { status: res.status, json: await res.json() };
}

async function failure(promise: Promise<unknown>): Promise<AppError> {
  const err = await promise.then(
    () => null,
    (e: unknown) => e,
  );
  expect(err).toBeInstanceOf(AppError);
  return err as AppError;
}

describe("API tokens", () => {
  it("lists assessments with a bearer token; the token is stored only as a hash", async () => {
    const { token, id } = await createApiToken(admin, { name: "Document control sync", scope: "adviser", days: 30 });
    expect(token).toMatch(/^hw_[A-Za-z0-9_-]{40,}$/);
    const db = await getDb();
    const [row] = await db.select().from(apiTokens).where(eq(apiTokens.id, id));
    expect(JSON.stringify(row)).not.toContain(token);
    expect(row.tokenHash).toMatch(/^[0-9a-f]{64}$/);

    const list = await call(assessmentsRoute.GET, token);
    expect(list.status).toBe(200);
    expect(list.json.items.length).toBeGreaterThan(0);
    const me = await call(meRoute.GET, token);
    expect(me.json).toMatchObject({ email: admin.email });
    // Writes work too, with the same validation: bad input is 422 on its fields.
    const bad = await call(jobsRoute.POST, token, {
      method: "POST",
      headers: { "content-type": "application/json", origin: "https://elsewhere.example" },
      body: JSON.stringify({ name: "" }),
    });
    expect(bad.status).toBe(422);
    expect((await listApiTokens(admin)).find((t) => t.id === id)!.lastUsedAt).not.toBeNull();
  });

  it("too little scope is 403 and names the permission", async () => {
    const { token } = await createApiToken(admin, { name: "Reader", scope: "adviser", days: 7 });
    const refused = await call(auditCheckRoute.GET, token);
    expect(refused.status).toBe(403);
    expect(refused.json.error.message).toContain('"audit:read"');
  });

  it("never more than the creator: an administrator cannot give a token an approver's permissions", async () => {
    expect(grantableScopes("admin").sort()).toEqual(["admin", "adviser"]);
    const err = await failure(createApiToken(admin, { name: "Signer", scope: "approver", days: 7 }));
    expect(err.issues![0].path).toBe("scope");
    expect((await failure(createApiToken(adviser, { name: "x1", scope: "adviser", days: 7 }))).code).toBe("forbidden");
    expect((await failure(createApiToken(admin, { name: "", scope: "pilot", days: 2 }))).issues!.length).toBe(3);
  });

  it("revoked, expired, forged or malformed tokens get 401; another organisation cannot revoke", async () => {
    const { token, id } = await createApiToken(admin, { name: "Short-lived", scope: "adviser", days: 7 });
    const other = (await otherOrganisation()).admin;
    expect((await failure(revokeApiToken(other, { tokenId: id }))).code).toBe("not_found");
    expect((await call(assessmentsRoute.GET, token)).status).toBe(200);
    await revokeApiToken(admin, { tokenId: id });
    expect((await call(assessmentsRoute.GET, token)).status).toBe(401);

    const second = await createApiToken(admin, { name: "Expiring", scope: "adviser", days: 7 });
    const db = await getDb();
    await db
      .update(apiTokens)
      .set({ expiresAt: new Date(Date.now() - 1) })
      .where(eq(apiTokens.id, second.id));
    expect((await call(assessmentsRoute.GET, second.token)).status).toBe(401);
    expect((await call(assessmentsRoute.GET, "hw_forged")).status).toBe(401);
    const malformed = await (assessmentsRoute.GET as Handler)(
      new Request("http://localhost/api/v1/x", { headers: { authorization: "Bearer two words" } }),
      { params: Promise.resolve({}) },
    );
    expect(malformed.status).toBe(401);
  });

  it("a token dies with its creator's account", async () => {
    const db = await getDb();
    const [second] = await db
      .insert(users)
      .values({ organisationId, email: "leaver@brackenfold.example", name: "Lee Vere", role: "admin" })
      .returning();
    const leaver: Actor = { id: second.id, organisationId, role: "admin", name: second.name, email: second.email };
    const { token } = await createApiToken(leaver, { name: "Leaver's", scope: "admin", days: 30 });
    expect((await call(auditCheckRoute.GET, token)).status).toBe(200);
    await db.update(users).set({ role: "adviser" }).where(eq(users.id, second.id));
    expect((await call(auditCheckRoute.GET, token)).status).toBe(403);
    await db.update(users).set({ active: false }).where(eq(users.id, second.id));
    expect((await call(assessmentsRoute.GET, token)).status).toBe(401);
  });

  it(`is rate-limited to ${TOKEN_REQUESTS_PER_MINUTE} requests a minute`, async () => {
    const { token } = await createApiToken(admin, { name: "Busy", scope: "adviser", days: 7 });
    const origin = { address: null, client: null };
    for (let i = 0; i < TOKEN_REQUESTS_PER_MINUTE; i++) await actorForToken(token, origin);
    const limited = await failure(actorForToken(token, origin));
    expect(limited.code).toBe("rate_limited");
    expect(limited.status).toBe(429);
  });
});
