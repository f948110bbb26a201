/**
 * A person's own account: sign-up of a new organisation (confirmed by an e-mailed link), the
 * profile, changing and resetting the password, and the second factor. Functions that send e-mail
 * return the sending as `deliver`, for the caller to run after answering (`after()` in a server
 * action): how long a reply takes must not tell whether an address has an account.
 */
import { and, count, desc, eq, gt, isNull } from "drizzle-orm";
import { getDb } from "@/db/client";
import { accountLinks, organisations, recoveryCodes, users, userSessions } from "@/db/schema";
import { recordAudit } from "@/lib/audit";
import { hashPassword } from "@/lib/auth/passwords";
import {
  replaceRecoveryCodes,
  enrolmentCode,
  matchTotp,
  newTotpSecret,
  openSecret,
  sealSecret,
} from "@/lib/auth/second-factor";
import { closeAllSessions, closeOtherSessions } from "@/lib/auth/sessions";
import { forgetSessions } from "@/lib/auth/session-cache";
import { clearAttempts, throttleKeys } from "@/lib/auth/throttle";
import { confirmIdentity } from "@/lib/auth/step-up";
import { appUrl } from "@/lib/config";
import { AppError, parseOrThrow } from "@/lib/errors";
import { renderMail } from "@/lib/mail/layout";
import { sendMail } from "@/lib/mail/send";
import { authorize, type Actor } from "@/lib/permissions";
import { createOrganisation } from "@/lib/organisations/service";
import { inspectLink, issueLink, LINK_PROBLEMS, LINK_TTL_MS, spendLink, type LinkPurpose } from "./links";
import {
  changePasswordSchema,
  confirmWithCodeSchema,
  forgotPasswordSchema,
  profileSchema,
  resetPasswordSchema,
  signUpSchema,
  totpCodeSchema,
} from "./schemas";

type Deliver = () => Promise<unknown>;
const nothing: Deliver = async () => undefined;
const hours = (purpose: LinkPurpose) => LINK_TTL_MS[purpose] / 3600_000;

const originOf = (actor: Actor) => ({ address: actor.auth?.address ?? null, client: actor.auth?.client ?? null });

/** One e-mail of each kind a minute per account at most: repeated clicks do not flood an inbox. */
const RESEND_AFTER_MS = 60_000;

async function recentLink(userId: string, purpose: LinkPurpose): Promise<boolean> {
  const db = await getDb();
  const [recent] = await db
    .select({ id: accountLinks.id })
    .from(accountLinks)
    .where(
      and(
        eq(accountLinks.userId, userId),
        eq(accountLinks.purpose, purpose),
        isNull(accountLinks.usedAt),
        gt(accountLinks.createdAt, new Date(Date.now() - RESEND_AFTER_MS)),
      ),
    )
    .limit(1);
  return !!recent;
}

// ---- Sign-up -----------------------------------------------------------------------------------

/**
 * A new organisation and its first administrator, who must confirm the address before signing in.
 * An address that already has a confirmed account gets a notice instead, and the answer is the same.
 * An unconfirmed sign-up of the same address (someone else's, perhaps) is replaced: it never held data.
 */
export async function signUp(input: unknown): Promise<{ deliver: Deliver }> {
  const data = parseOrThrow(signUpSchema, input);
  const passwordHash = await hashPassword(data.password);
  const db = await getDb();
  const existing = await db.query.users.findFirst({ where: eq(users.email, data.email) });
  if (existing?.emailVerifiedAt || (existing && existing.passwordHash === null))
    return { deliver: () => sendAlreadyRegistered(data.email) };
  // Signing up again with an unconfirmed address sends a new link, at most one a minute: repeated
  // sign-ups cannot flood someone's inbox.
  if (existing && (await recentLink(existing.id, "verify-email"))) return { deliver: nothing };
  const token = await db.transaction(async (tx) => {
    if (existing) {
      const [{ n }] = await tx
        .select({ n: count() })
        .from(users)
        .where(eq(users.organisationId, existing.organisationId));
      if (n === 1) await tx.delete(organisations).where(eq(organisations.id, existing.organisationId));
      else await tx.delete(users).where(eq(users.id, existing.id));
    }
    const { admin } = await createOrganisation(tx, {
      organisation: data.organisation,
      name: data.name,
      email: data.email,
      passwordHash,
      verified: false,
    });
    return issueLink(tx, admin.id, "verify-email");
  });
  return { deliver: () => sendConfirmation(data.email, data.name, token) };
}

function sendConfirmation(email: string, name: string, token: string) {
  return sendMail({
    organisationId: null,
    kind: "verify-email",
    to: email,
    subject: "Confirm your address to start with Heftwise",
    ...renderMail({
      heading: "Confirm your e-mail address",
      paragraphs: [
        `Hello ${name},`,
        "Your organisation's Heftwise account is ready. Confirm that this address is yours to start using it.",
        `The link works once and expires in ${hours("verify-email")} hours.`,
      ],
      action: { label: "Confirm my address", url: appUrl(`/sign-up/confirm/${token}`) },
      footnote: "If you did not sign up for Heftwise, ignore this e-mail: nothing happens until the link is used.",
    }),
  });
}

function sendAlreadyRegistered(email: string) {
  return sendMail({
    organisationId: null,
    kind: "verify-email",
    to: email,
    subject: "Your Heftwise account",
    ...renderMail({
      heading: "This address already has a Heftwise account",
      paragraphs: [
        "Someone tried to set up a new organisation on Heftwise with this e-mail address. It already has an account, so nothing was changed.",
        "If you have forgotten your password, you can reset it from the sign-in page.",
      ],
      action: { label: "Go to sign-in", url: appUrl("/sign-in") },
      footnote: "If this was not you, you can ignore this e-mail.",
    }),
  });
}

export async function inspectAccountLink(token: string, purpose: LinkPurpose) {
  const state = await inspectLink(token, purpose);
  return state.state === "valid" ? state : { state: state.state, message: LINK_PROBLEMS[purpose][state.state] };
}

/** Spends a confirmation link: the address is proven and the account can sign in. */
export async function confirmEmail(token: string): Promise<void> {
  const db = await getDb();
  await db.transaction(async (tx) => {
    const userId = await spendLink(tx, token, "verify-email");
    if (!userId) {
      const state = await inspectLink(token, "verify-email", tx);
      throw new AppError("conflict", LINK_PROBLEMS["verify-email"][state.state === "valid" ? "used" : state.state]);
    }
    const [user] = await tx
      .update(users)
      .set({ emailVerifiedAt: new Date(), updatedAt: new Date() })
      .where(eq(users.id, userId))
      .returning();
    await recordAudit(tx, {
      organisationId: user.organisationId,
      actorId: user.id,
      action: "user.email-confirmed",
      entityType: "user",
      entityId: user.id,
    });
  });
}

// ---- Password reset ----------------------------------------------------------------------------

/** Always the same answer; an e-mail goes only to an active account that has a password. */
export async function requestPasswordReset(input: unknown): Promise<{ deliver: Deliver }> {
  const { email } = parseOrThrow(forgotPasswordSchema, input);
  const db = await getDb();
  const user = await db.query.users.findFirst({ where: eq(users.email, email) });
  if (!user || !user.active || !user.passwordHash) return { deliver: nothing };
  if (await recentLink(user.id, "reset-password")) return { deliver: nothing };
  const token = await db.transaction((tx) => issueLink(tx, user.id, "reset-password"));
  return {
    deliver: () =>
      sendMail({
        organisationId: user.organisationId,
        kind: "reset-password",
        to: user.email,
        subject: "Reset your Heftwise password",
        ...renderMail({
          heading: "Reset your password",
          paragraphs: [
            `Hello ${user.name},`,
            "Someone (we hope you) asked to reset the password of your Heftwise account.",
            `The link works once and expires in ${hours("reset-password")} hour. Setting a new password signs you out everywhere.`,
          ],
          action: { label: "Choose a new password", url: appUrl(`/reset-password/${token}`) },
          footnote: "If you did not ask for this, ignore this e-mail: your password stays as it is.",
        }),
      }),
  };
}

/** Sets a new password from a reset link; every session ends and the throttle forgets the account. */
export async function resetPassword(token: string, input: unknown): Promise<void> {
  const { password } = parseOrThrow(resetPasswordSchema, input);
  const passwordHash = await hashPassword(password);
  const db = await getDb();
  const user = await db.transaction(async (tx) => {
    const userId = await spendLink(tx, token, "reset-password");
    if (!userId) {
      const state = await inspectLink(token, "reset-password", tx);
      throw new AppError("conflict", LINK_PROBLEMS["reset-password"][state.state === "valid" ? "used" : state.state]);
    }
    const [updated] = await tx
      .update(users)
      // The link reached the address: it is proven, as an invitation would prove it.
      .set({ passwordHash, emailVerifiedAt: new Date(), updatedAt: new Date() })
      .where(eq(users.id, userId))
      .returning();
    await closeAllSessions(userId, tx);
    await recordAudit(tx, {
      organisationId: updated.organisationId,
      actorId: updated.id,
      action: "user.password-reset",
      entityType: "user",
      entityId: updated.id,
    });
    return updated;
  });
  forgetSessions();
  const keys = throttleKeys(user.email, null);
  await clearAttempts([keys.account]);
}

// ---- Profile and password ----------------------------------------------------------------------

export async function getAccount(actor: Actor | null) {
  authorize(actor, "profile:read");
  const db = await getDb();
  const [row] = await db
    .select({
      name: users.name,
      email: users.email,
      role: users.role,
      totpEnabledAt: users.totpEnabledAt,
      required: organisations.secondFactorRoles,
    })
    .from(users)
    .innerJoin(organisations, eq(organisations.id, users.organisationId))
    .where(eq(users.id, actor.id));
  const [{ left }] = await db
    .select({ left: count() })
    .from(recoveryCodes)
    .where(and(eq(recoveryCodes.userId, actor.id), isNull(recoveryCodes.usedAt)));
  const sessions = await db
    .select({
      id: userSessions.id,
      createdAt: userSessions.createdAt,
      method: userSessions.method,
      address: userSessions.address,
      client: userSessions.client,
    })
    .from(userSessions)
    .where(and(eq(userSessions.userId, actor.id), gt(userSessions.expiresAt, new Date())))
    .orderBy(desc(userSessions.createdAt));
  return {
    name: row.name,
    email: row.email,
    role: row.role,
    secondFactor: row.totpEnabledAt,
    secondFactorRequired: row.required.includes(row.role),
    recoveryCodesLeft: left,
    sessions,
  };
}

export async function updateProfile(actor: Actor | null, input: unknown): Promise<void> {
  authorize(actor, "profile:read");
  const { name } = parseOrThrow(profileSchema, input);
  const db = await getDb();
  await db.transaction(async (tx) => {
    await tx.update(users).set({ name, updatedAt: new Date() }).where(eq(users.id, actor.id));
    await recordAudit(tx, {
      organisationId: actor.organisationId,
      actorId: actor.id,
      action: "user.profile-changed",
      entityType: "user",
      entityId: actor.id,
      details: { from: actor.name, to: name },
    });
  });
  forgetSessions();
}

/**
 * Changes the password after checking the current one (throttled like sign-in). Every other
 * session ends; the one that made the change stays signed in. The owner is told by e-mail.
 */
export async function changePassword(
  actor: Actor | null,
  currentSessionId: string | undefined,
  input: unknown,
): Promise<{ deliver: Deliver }> {
  authorize(actor, "profile:read");
  if (actor.auth?.via === "token") throw new AppError("forbidden", "An API token cannot change a password");
  const data = parseOrThrow(changePasswordSchema, input);
  await confirmIdentity(actor, { password: data.current, code: undefined, passwordOnly: true }, originOf(actor)).catch(
    (err: unknown) => {
      if (err instanceof AppError && err.issues?.[0]?.path === "password")
        throw new AppError("validation", "Some fields need attention", [
          { path: "current", message: "Your current password is not right" },
        ]);
      throw err;
    },
  );
  const passwordHash = await hashPassword(data.password);
  const db = await getDb();
  await db.transaction(async (tx) => {
    await tx.update(users).set({ passwordHash, updatedAt: new Date() }).where(eq(users.id, actor.id));
    await closeOtherSessions(actor.id, currentSessionId, tx);
    await recordAudit(tx, {
      organisationId: actor.organisationId,
      actorId: actor.id,
      action: "user.password-changed",
      entityType: "user",
      entityId: actor.id,
      auth: actor.auth,
    });
  });
  forgetSessions();
  return {
    deliver: () =>
      sendMail({
        organisationId: actor.organisationId,
        kind: "password-changed",
        to: actor.email,
        subject: "Your Heftwise password was changed",
        ...renderMail({
          heading: "Your password was changed",
          paragraphs: [
            `Hello ${actor.name},`,
            "The password of your Heftwise account was just changed, and every other session was signed out.",
            "If this was not you, reset your password from the sign-in page now and tell your administrator.",
          ],
          action: { label: "Reset my password", url: appUrl("/forgot-password") },
        }),
      }),
  };
}

// ---- Second factor -----------------------------------------------------------------------------

/** Starts enrolment: a new secret, kept until a first code proves the app has it. */
export async function startSecondFactor(actor: Actor | null) {
  authorize(actor, "profile:read");
  const db = await getDb();
  const [user] = await db.select({ at: users.totpEnabledAt }).from(users).where(eq(users.id, actor.id));
  if (user.at) throw new AppError("conflict", "A second factor is already set up. Turn it off first to change phones.");
  const secret = newTotpSecret();
  await db
    .update(users)
    .set({ totpSecret: sealSecret(secret), totpLastStep: null })
    .where(eq(users.id, actor.id));
  return { secret, ...(await enrolmentCode(secret, actor.email)) };
}

/** Finishes enrolment with a first code; returns the recovery codes, shown once. */
export async function confirmSecondFactor(actor: Actor | null, input: unknown): Promise<{ recoveryCodes: string[] }> {
  authorize(actor, "profile:read");
  const { code } = parseOrThrow(totpCodeSchema, input);
  const db = await getDb();
  const [user] = await db.select().from(users).where(eq(users.id, actor.id));
  if (user.totpEnabledAt) throw new AppError("conflict", "A second factor is already set up.");
  if (!user.totpSecret) throw new AppError("conflict", "Start the set-up again: scan a new code.");
  const step = await matchTotp(openSecret(user.totpSecret), code, null);
  if (step === null)
    throw new AppError("validation", "Some fields need attention", [
      { path: "code", message: "That code does not match. Check the phone's time, and enter the newest code." },
    ]);
  const codes = await db.transaction(async (tx) => {
    await tx.update(users).set({ totpEnabledAt: new Date(), totpLastStep: step }).where(eq(users.id, actor.id));
    await recordAudit(tx, {
      organisationId: actor.organisationId,
      actorId: actor.id,
      action: "user.second-factor-enabled",
      entityType: "user",
      entityId: actor.id,
      auth: actor.auth,
    });
    return replaceRecoveryCodes(tx, actor.id);
  });
  forgetSessions();
  return { recoveryCodes: codes };
}

/** Turns the second factor off (password and a code again); refused where the organisation requires one. */
export async function disableSecondFactor(actor: Actor | null, input: unknown): Promise<void> {
  authorize(actor, "profile:read");
  const data = parseOrThrow(confirmWithCodeSchema, input);
  const account = await getAccount(actor);
  if (account.secondFactorRequired)
    throw new AppError(
      "conflict",
      "Your organisation requires a second factor for your role: it cannot be turned off.",
    );
  await confirmIdentity(actor, { password: data.password, code: data.code }, originOf(actor));
  const db = await getDb();
  await db.transaction(async (tx) => {
    await tx
      .update(users)
      .set({ totpSecret: null, totpEnabledAt: null, totpLastStep: null })
      .where(eq(users.id, actor.id));
    await tx.delete(recoveryCodes).where(eq(recoveryCodes.userId, actor.id));
    await recordAudit(tx, {
      organisationId: actor.organisationId,
      actorId: actor.id,
      action: "user.second-factor-disabled",
      entityType: "user",
      entityId: actor.id,
      auth: actor.auth,
    });
  });
  forgetSessions();
}

/** Ten new recovery codes (the old ones stop working), after the password and a code again. */
export async function renewRecoveryCodes(actor: Actor | null, input: unknown): Promise<{ recoveryCodes: string[] }> {
  authorize(actor, "profile:read");
  const data = parseOrThrow(confirmWithCodeSchema, input);
  if (!(await getAccount(actor)).secondFactor) throw new AppError("conflict", "Set up a second factor first.");
  await confirmIdentity(actor, { password: data.password, code: data.code }, originOf(actor));
  const db = await getDb();
  const codes = await db.transaction(async (tx) => {
    await recordAudit(tx, {
      organisationId: actor.organisationId,
      actorId: actor.id,
      action: "user.recovery-codes-renewed",
      entityType: "user",
      entityId: actor.id,
      auth: actor.auth,
    });
    return replaceRecoveryCodes(tx, actor.id);
  });
  return { recoveryCodes: codes };
}
