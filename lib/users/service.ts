/**
 * The organisation's people: listing, invitations by e-mail (a one-time link to set a password,
 * expiring), role changes and deactivation. Every function takes the acting user and checks the
 * permission table first.
 */
import { randomBytes } from "node:crypto";
import { and, asc, eq, gt, isNull } from "drizzle-orm";
import { getDb, type Tx } from "@/db/client";
import { invites, users, type Role } from "@/db/schema";
import { recordAudit } from "@/lib/audit";
import { sha256Hex } from "@/lib/hash";
import { setPasswordSchema } from "@/lib/auth/schemas";
import { hashPassword } from "@/lib/auth/passwords";
import { appUrl, config } from "@/lib/config";
import { AppError, isUniqueViolation, parseOrThrow } from "@/lib/errors";
import { renderMail } from "@/lib/mail/layout";
import { sendMail, type SendOutcome } from "@/lib/mail/send";
import { authorize, type Actor } from "@/lib/permissions";
import { changeRoleSchema, inviteSchema, resendInviteSchema, ROLE_LABELS, setActiveSchema } from "./schemas";
import { closeAllSessions } from "@/lib/auth/sessions";
import { forgetSessions } from "@/lib/auth/session-cache";

export interface UserRow {
  id: string;
  name: string;
  email: string;
  role: Role;
  active: boolean;
  /** Invited, password not set yet. */
  pending: boolean;
  createdAt: Date;
}

export async function listUsers(actor: Actor | null): Promise<UserRow[]> {
  authorize(actor, "users:manage");
  const db = await getDb();
  const rows = await db
    .select()
    .from(users)
    .where(eq(users.organisationId, actor.organisationId))
    .orderBy(asc(users.name));
  return rows.map((u) => ({
    id: u.id,
    name: u.name,
    email: u.email,
    role: u.role,
    active: u.active,
    pending: !u.passwordHash,
    createdAt: u.createdAt,
  }));
}

async function organisationUser(actor: Actor, userId: string) {
  const db = await getDb();
  const user = await db.query.users.findFirst({ where: eq(users.id, userId) });
  // Another organisation's user is "not found", never "forbidden".
  if (!user || user.organisationId !== actor.organisationId) throw AppError.notFound("User");
  return user;
}

/** Records a new invitation link for the user inside the caller's transaction; returns the token to e-mail. */
async function recordInvite(tx: Tx, actor: Actor, user: { id: string; email: string; role: Role }): Promise<string> {
  const token = randomBytes(32).toString("base64url");
  const expiresAt = new Date(Date.now() + config().INVITE_TTL_HOURS * 3600_000);
  // A new link replaces any earlier one that was not used.
  await tx.delete(invites).where(and(eq(invites.userId, user.id), isNull(invites.usedAt)));
  await tx.insert(invites).values({
    organisationId: actor.organisationId,
    userId: user.id,
    tokenHash: sha256Hex(token),
    expiresAt,
    createdBy: actor.id,
  });
  await recordAudit(tx, {
    organisationId: actor.organisationId,
    actorId: actor.id,
    action: "user.invited",
    entityType: "user",
    entityId: user.id,
    details: { email: user.email, role: user.role },
  });
  return token;
}

/** To the owner of an address that already has an account elsewhere: who tried, and what to do. */
function sendElsewhereNotice(actor: Actor, email: string): Promise<SendOutcome> {
  const body = renderMail({
    heading: "Someone tried to add your address to Heftwise",
    paragraphs: [
      `${actor.name} tried to give this e-mail address an account in their organisation on Heftwise.`,
      "Your address already has a Heftwise account with another organisation, and one address can belong to one organisation only, so nothing was changed.",
      "If you should work in both, give them another address to invite.",
    ],
    footnote: "If you did not expect this, you can ignore this e-mail.",
  });
  return sendMail({
    organisationId: actor.organisationId,
    kind: "invite",
    to: email,
    subject: "Your Heftwise account",
    ...body,
  });
}

/** The invitation e-mail, sent after the transaction that recorded it has committed. */
function sendInvite(
  actor: Actor,
  user: { name: string; email: string; role: Role },
  token: string,
): Promise<SendOutcome> {
  const url = appUrl(`/invite/${token}`);
  const body = renderMail({
    heading: `${actor.name} has invited you to Heftwise`,
    paragraphs: [
      `Hello ${user.name},`,
      `You have been given an account as ${ROLE_LABELS[user.role].toLowerCase()}. Set a password to start using it.`,
      `The link works once and expires in ${config().INVITE_TTL_HOURS} hours.`,
    ],
    action: { label: "Set your password", url },
    footnote: "If you did not expect this invitation, ignore this e-mail: nothing happens until the link is used.",
  });
  return sendMail({
    organisationId: actor.organisationId,
    kind: "invite",
    to: user.email,
    subject: "Your Heftwise account",
    ...body,
  });
}

const alreadyHere = () =>
  new AppError("validation", "Some fields need attention", [
    { path: "email", message: "This person is already in your organisation" },
  ]);

/**
 * Invites a person. An address already in the admin's own organisation is named on its field (the
 * admin sees their people anyway). An address with an account in another organisation must not be
 * revealed: nothing is created, its owner is told by e-mail, and the admin sees what any invitation
 * shows — so `userId` is null only then, and only the server knows it.
 */
export async function inviteUser(
  actor: Actor | null,
  input: unknown,
): Promise<{ userId: string | null; mail: SendOutcome }> {
  authorize(actor, "users:manage");
  const data = parseOrThrow(inviteSchema, input);
  const db = await getDb();
  const existing = await db.query.users.findFirst({ where: eq(users.email, data.email) });
  if (existing?.organisationId === actor.organisationId) throw alreadyHere();
  if (existing) return { userId: null, mail: await sendElsewhereNotice(actor, data.email) };
  // The person and their invitation are written together, or not at all; a parallel invitation of
  // the same address that got there first answers like the check above.
  const { user, token } = await db
    .transaction(async (tx) => {
      const [created] = await tx
        .insert(users)
        .values({ organisationId: actor.organisationId, email: data.email, name: data.name, role: data.role })
        .returning();
      return { user: created, token: await recordInvite(tx, actor, created) };
    })
    .catch((err) => {
      if (isUniqueViolation(err))
        throw new AppError("conflict", "Some fields need attention", [
          { path: "email", message: "This person is already in your organisation" },
        ]);
      throw err;
    });
  const mail = await sendInvite(actor, user, token);
  return { userId: user.id, mail };
}

/**
 * The first administrator of an organisation made from the command line: the same one-time link as
 * an invitation, in the name of the operator. The e-mail is sent after the caller's commit.
 */
export async function inviteFirstAdministrator(
  tx: Tx,
  admin: { id: string; organisationId: string; name: string; email: string; role: Role },
): Promise<() => Promise<SendOutcome>> {
  const operator: Actor = { ...admin, name: "The Heftwise operator" };
  const token = await recordInvite(tx, operator, admin);
  return () => sendInvite(operator, admin, token);
}

export async function resendInvite(actor: Actor | null, input: unknown): Promise<SendOutcome> {
  authorize(actor, "users:manage");
  const { userId } = parseOrThrow(resendInviteSchema, input);
  const user = await organisationUser(actor, userId);
  if (user.passwordHash) throw new AppError("conflict", "This person has already set a password");
  if (!user.active) throw new AppError("conflict", "Reactivate this person before inviting them again");
  const db = await getDb();
  const token = await db.transaction((tx) => recordInvite(tx, actor, user));
  return sendInvite(actor, user, token);
}

export async function changeRole(actor: Actor | null, input: unknown): Promise<void> {
  authorize(actor, "users:manage");
  const { userId, role } = parseOrThrow(changeRoleSchema, input);
  const user = await organisationUser(actor, userId);
  if (user.id === actor.id)
    throw new AppError("conflict", "You cannot change your own role; ask another administrator");
  if (user.role === role) return;
  const db = await getDb();
  await db.transaction(async (tx) => {
    await tx.update(users).set({ role, updatedAt: new Date() }).where(eq(users.id, user.id));
    await recordAudit(tx, {
      organisationId: actor.organisationId,
      actorId: actor.id,
      action: "user.role-changed",
      entityType: "user",
      entityId: user.id,
      details: { from: user.role, to: role },
    });
  });
  forgetSessions();
}

export async function setActive(actor: Actor | null, input: unknown): Promise<void> {
  authorize(actor, "users:manage");
  const { userId, active } = parseOrThrow(setActiveSchema, input);
  const user = await organisationUser(actor, userId);
  if (user.id === actor.id) throw new AppError("conflict", "You cannot deactivate your own account");
  if (user.active === active) return;
  const db = await getDb();
  await db.transaction(async (tx) => {
    await tx.update(users).set({ active, updatedAt: new Date() }).where(eq(users.id, user.id));
    // Deactivation ends every session; reactivation then has nothing old to revive.
    if (!active) await closeAllSessions(user.id, tx);
    await recordAudit(tx, {
      organisationId: actor.organisationId,
      actorId: actor.id,
      action: active ? "user.reactivated" : "user.deactivated",
      entityType: "user",
      entityId: user.id,
    });
  });
  forgetSessions();
}

export type InviteState = { state: "valid"; name: string; email: string } | { state: "expired" | "used" | "unknown" };

/** What an invite link is worth, without changing anything. */
export async function inspectInvite(token: string): Promise<InviteState> {
  if (!/^[A-Za-z0-9_-]{20,100}$/.test(token)) return { state: "unknown" };
  const db = await getDb();
  const invite = await db.query.invites.findFirst({ where: eq(invites.tokenHash, sha256Hex(token)) });
  if (!invite) return { state: "unknown" };
  if (invite.usedAt) return { state: "used" };
  if (invite.expiresAt.getTime() <= Date.now()) return { state: "expired" };
  const user = await db.query.users.findFirst({ where: eq(users.id, invite.userId) });
  if (!user || !user.active) return { state: "unknown" };
  return { state: "valid", name: user.name, email: user.email };
}

/** Sets the password from a valid invite link; the link is then spent. All or nothing. */
export async function acceptInvite(token: string, input: unknown): Promise<{ email: string }> {
  const { password } = parseOrThrow(setPasswordSchema, input);
  const state = await inspectInvite(token);
  if (state.state !== "valid") throw new AppError("conflict", inviteStateMessage(state.state));
  const passwordHash = await hashPassword(password);
  const db = await getDb();
  const accepted = await db.transaction(async (tx) => {
    // Claim the invite first: of two racing submissions only one updates a row.
    const [invite] = await tx
      .update(invites)
      .set({ usedAt: new Date() })
      .where(and(eq(invites.tokenHash, sha256Hex(token)), isNull(invites.usedAt), gt(invites.expiresAt, new Date())))
      .returning();
    if (!invite) throw new AppError("conflict", inviteStateMessage("used"));
    const [user] = await tx
      .update(users)
      // The link reached this address: that proves it.
      .set({ passwordHash, emailVerifiedAt: new Date(), updatedAt: new Date() })
      .where(eq(users.id, invite.userId))
      .returning();
    await recordAudit(tx, {
      organisationId: invite.organisationId,
      actorId: user.id,
      action: "user.password-set",
      entityType: "user",
      entityId: user.id,
    });
    return { email: user.email };
  });
  forgetSessions();
  return accepted;
}

export function inviteStateMessage(state: "expired" | "used" | "unknown"): string {
  switch (state) {
    case "expired":
      return "This invitation link has expired. Ask your administrator to send a new one.";
    case "used":
      return "This invitation link has already been used. Sign in with the password you set, or ask your administrator for a new link.";
    case "unknown":
      return "This invitation link is not valid. Check that you opened the whole link from the e-mail, or ask your administrator for a new one.";
  }
}
