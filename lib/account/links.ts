/**
 * One-time links for an account: confirming a new address ("verify-email", valid 48 hours) and
 * resetting a password ("reset-password", valid 1 hour). The token travels only in the e-mail;
 * its SHA-256 is stored. Inspecting a link changes nothing; spending it is atomic, so of two
 * racing uses only one succeeds.
 */
import { randomBytes } from "node:crypto";
import { and, eq, gt, isNull } from "drizzle-orm";
import { getDb, type Queryable, type Tx } from "@/db/client";
import { accountLinks } from "@/db/schema";
import { sha256Hex } from "@/lib/hash";

export type LinkPurpose = "verify-email" | "reset-password";

export const LINK_TTL_MS: Record<LinkPurpose, number> = {
  "verify-email": 48 * 3600_000,
  "reset-password": 3600_000,
};

const TOKEN_SHAPE = /^[A-Za-z0-9_-]{20,100}$/;

/** A new link for the user; any unused earlier link of the same purpose stops working. */
export async function issueLink(tx: Tx, userId: string, purpose: LinkPurpose): Promise<string> {
  const token = randomBytes(32).toString("base64url");
  await tx
    .delete(accountLinks)
    .where(and(eq(accountLinks.userId, userId), eq(accountLinks.purpose, purpose), isNull(accountLinks.usedAt)));
  await tx.insert(accountLinks).values({
    userId,
    purpose,
    tokenHash: sha256Hex(token),
    expiresAt: new Date(Date.now() + LINK_TTL_MS[purpose]),
  });
  return token;
}

export type LinkState = { state: "valid"; userId: string } | { state: "expired" | "used" | "unknown" };

export async function inspectLink(token: string, purpose: LinkPurpose, db?: Queryable): Promise<LinkState> {
  if (!TOKEN_SHAPE.test(token)) return { state: "unknown" };
  const q = db ?? (await getDb());
  const [link] = await q
    .select()
    .from(accountLinks)
    .where(and(eq(accountLinks.tokenHash, sha256Hex(token)), eq(accountLinks.purpose, purpose)));
  if (!link) return { state: "unknown" };
  if (link.usedAt) return { state: "used" };
  if (link.expiresAt.getTime() <= Date.now()) return { state: "expired" };
  return { state: "valid", userId: link.userId };
}

/** Spends the link inside the caller's transaction: the user's id, or null when it was not valid. */
export async function spendLink(tx: Tx, token: string, purpose: LinkPurpose): Promise<string | null> {
  if (!TOKEN_SHAPE.test(token)) return null;
  const [link] = await tx
    .update(accountLinks)
    .set({ usedAt: new Date() })
    .where(
      and(
        eq(accountLinks.tokenHash, sha256Hex(token)),
        eq(accountLinks.purpose, purpose),
        isNull(accountLinks.usedAt),
        gt(accountLinks.expiresAt, new Date()),
      ),
    )
    .returning({ userId: accountLinks.userId });
  return link?.userId ?? null;
}

export const LINK_PROBLEMS: Record<LinkPurpose, Record<"expired" | "used" | "unknown", string>> = {
  "verify-email": {
    expired: "This confirmation link has expired. Sign up again with the same address to get a new one.",
    used: "This confirmation link has already been used. Your address is confirmed: sign in.",
    unknown: "This confirmation link is not valid. Check that you opened the whole link from the e-mail.",
  },
  "reset-password": {
    expired: "This reset link has expired: links work for one hour. Ask for a new one.",
    used: "This reset link has already been used. Ask for a new one if you still need to change your password.",
    unknown:
      "This reset link is not valid. Check that you opened the whole link from the e-mail, or ask for a new one.",
  },
};
