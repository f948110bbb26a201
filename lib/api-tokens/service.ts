/**
 * API tokens for integrations. An administrator creates one for a scope — a role whose permissions
 * are all among the creator's own — and sees it once; Heftwise keeps its SHA-256. A request with
 * `Authorization: Bearer hw_…` acts for the creator with the scope's permissions, intersected with
 * the creator's at that moment (a creator who leaves or loses a role takes the token's power with
 * them). Tokens expire, can be revoked, record when they were last used, and are rate-limited.
 */
import { randomBytes } from "node:crypto";
import { and, desc, eq } from "drizzle-orm";
import { getDb } from "@/db/client";
import { apiTokens, ROLES, users, type Role } from "@/db/schema";
import { recordAudit } from "@/lib/audit";
import { sha256Hex } from "@/lib/hash";
import { AppError, parseOrThrow } from "@/lib/errors";
import { authorize, PERMISSIONS, type Actor } from "@/lib/permissions";
import { ROLE_LABELS } from "@/lib/users/schemas";
import { createTokenSchema, revokeTokenSchema } from "./schemas";

export const TOKEN_PREFIX = "hw_";
/** Requests a token may make a minute (Heftwise policy), per app process. */
export const TOKEN_REQUESTS_PER_MINUTE = 300;
/** `last used` is written at most this often, so that reading with a token is not a write each time. */
const LAST_USED_EVERY_MS = 60_000;

/** The scopes an actor may give a token: roles whose every permission the actor has (pure). */
export function grantableScopes(role: Role): Role[] {
  return ROLES.filter((scope) => PERMISSIONS[scope].every((p) => PERMISSIONS[role].includes(p)));
}

export async function createApiToken(actor: Actor | null, input: unknown): Promise<{ token: string; id: string }> {
  authorize(actor, "api-tokens:manage");
  if (actor.auth?.via === "token") throw new AppError("forbidden", "A token cannot create tokens");
  const data = parseOrThrow(createTokenSchema, input);
  if (!grantableScopes(actor.role).includes(data.scope))
    throw new AppError("validation", "Some fields need attention", [
      { path: "scope", message: `A token cannot do more than you: ${ROLE_LABELS[data.scope]} is not within your role` },
    ]);
  const token = `${TOKEN_PREFIX}${randomBytes(32).toString("base64url")}`;
  const db = await getDb();
  const id = await db.transaction(async (tx) => {
    const [row] = await tx
      .insert(apiTokens)
      .values({
        organisationId: actor.organisationId,
        createdBy: actor.id,
        name: data.name,
        prefix: token.slice(0, 10),
        tokenHash: sha256Hex(token),
        scope: data.scope,
        expiresAt: new Date(Date.now() + data.days * 86_400_000),
      })
      .returning({ id: apiTokens.id });
    await recordAudit(tx, {
      organisationId: actor.organisationId,
      actorId: actor.id,
      action: "api-token.created",
      entityType: "api-token",
      entityId: row.id,
      details: { name: data.name, scope: data.scope, days: data.days },
      auth: actor.auth,
    });
    return row.id;
  });
  return { token, id };
}

export async function listApiTokens(actor: Actor | null) {
  authorize(actor, "api-tokens:manage");
  const db = await getDb();
  const rows = await db
    .select({
      id: apiTokens.id,
      name: apiTokens.name,
      prefix: apiTokens.prefix,
      scope: apiTokens.scope,
      createdAt: apiTokens.createdAt,
      expiresAt: apiTokens.expiresAt,
      lastUsedAt: apiTokens.lastUsedAt,
      revokedAt: apiTokens.revokedAt,
      createdBy: users.name,
    })
    .from(apiTokens)
    .innerJoin(users, eq(users.id, apiTokens.createdBy))
    .where(eq(apiTokens.organisationId, actor.organisationId))
    .orderBy(desc(apiTokens.createdAt));
  const now = Date.now();
  return rows.map((r) => ({
    ...r,
    state: r.revokedAt
      ? ("revoked" as const)
      : r.expiresAt.getTime() <= now
        ? ("expired" as const)
        : ("active" as const),
  }));
}

export async function revokeApiToken(actor: Actor | null, input: unknown): Promise<void> {
  authorize(actor, "api-tokens:manage");
  const { tokenId } = parseOrThrow(revokeTokenSchema, input);
  const db = await getDb();
  await db.transaction(async (tx) => {
    const [row] = await tx
      .update(apiTokens)
      .set({ revokedAt: new Date() })
      .where(and(eq(apiTokens.id, tokenId), eq(apiTokens.organisationId, actor.organisationId)))
      .returning({ name: apiTokens.name, revokedAt: apiTokens.revokedAt });
    if (!row) throw AppError.notFound("Token");
    await recordAudit(tx, {
      organisationId: actor.organisationId,
      actorId: actor.id,
      action: "api-token.revoked",
      entityType: "api-token",
      entityId: tokenId,
      details: { name: row.name },
      auth: actor.auth,
    });
  });
}

/** Requests counted per token in fixed one-minute windows. */
const windows = new Map<string, { start: number; count: number }>();

function spend(tokenId: string, now: number): number {
  const w = windows.get(tokenId);
  if (!w || now - w.start >= 60_000) {
    windows.set(tokenId, { start: now, count: 1 });
    return 0;
  }
  w.count++;
  return w.count > TOKEN_REQUESTS_PER_MINUTE ? Math.ceil((w.start + 60_000 - now) / 1000) : 0;
}

const unusable = () =>
  new AppError("unauthenticated", "This API token is not valid: it may be mistyped, expired or revoked");

/**
 * The actor a bearer token stands for, or a 401 (unknown, expired, revoked, creator gone) or 429
 * (too many requests this minute). `origin` is recorded in the audit trail of what it does.
 */
export async function actorForToken(
  token: string,
  origin: { address: string | null; client: string | null },
): Promise<Actor> {
  if (!token.startsWith(TOKEN_PREFIX) || token.length > 200) throw unusable();
  const db = await getDb();
  const [row] = await db
    .select({ token: apiTokens, user: users })
    .from(apiTokens)
    .innerJoin(users, eq(users.id, apiTokens.createdBy))
    .where(eq(apiTokens.tokenHash, sha256Hex(token)));
  const now = Date.now();
  if (!row || row.token.revokedAt || row.token.expiresAt.getTime() <= now || !row.user.active) throw unusable();
  if (row.user.organisationId !== row.token.organisationId) throw unusable();
  const wait = spend(row.token.id, now);
  if (wait > 0)
    throw new AppError(
      "rate_limited",
      `This token made more than ${TOKEN_REQUESTS_PER_MINUTE} requests this minute. Wait ${wait} s.`,
    );
  if (!row.token.lastUsedAt || now - row.token.lastUsedAt.getTime() > LAST_USED_EVERY_MS)
    await db
      .update(apiTokens)
      .set({ lastUsedAt: new Date(now) })
      .where(eq(apiTokens.id, row.token.id));
  const creator = PERMISSIONS[row.user.role];
  return {
    id: row.user.id,
    organisationId: row.user.organisationId,
    role: row.token.scope,
    name: row.user.name,
    email: row.user.email,
    permissions: PERMISSIONS[row.token.scope].filter((p) => creator.includes(p)),
    auth: { via: "token", method: `api-token ${row.token.prefix}…`, ...origin },
  };
}
