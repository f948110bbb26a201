/**
 * Step-up: proving, at the moment of signing, that the person at the keyboard is the account's
 * owner — the password again, and a second-factor code when they have one — so that a session left
 * open on a site-office PC cannot approve. Failures count toward the same throttle as sign-in.
 */
import { eq } from "drizzle-orm";
import { getDb } from "@/db/client";
import { users } from "@/db/schema";
import type { AuthRecord } from "@/lib/audit";
import { AppError } from "@/lib/errors";
import type { Actor } from "@/lib/permissions";
import { verifyPassword } from "./passwords";
import type { RequestOrigin } from "./request-context";
import { spendSecondFactor } from "./second-factor";
import { throttleAttempt } from "./throttle";

export interface StepUpInput {
  password: string;
  code?: string;
  /** Changing one's own password asks for the current one only. */
  passwordOnly?: boolean;
}

const fieldError = (path: string, message: string) =>
  new AppError("validation", "Confirm it is you", [{ path, message }]);

/** Whether the user must give a second-factor code to step up (the form asks only then). */
export async function hasSecondFactor(userId: string): Promise<boolean> {
  const db = await getDb();
  const [user] = await db.select({ at: users.totpEnabledAt }).from(users).where(eq(users.id, userId));
  return !!user?.at;
}

/** Checks the password (and code) of the acting user; returns how they proved it, for the audit trail. */
export async function confirmIdentity(actor: Actor, input: StepUpInput, origin: RequestOrigin): Promise<AuthRecord> {
  if (actor.auth?.via === "token") throw new AppError("forbidden", "Signing needs a person: an API token cannot sign");
  const throttle = await throttleAttempt(actor.email, origin.address);
  if (throttle.refusal) throw new AppError("rate_limited", throttle.refusal);
  const db = await getDb();
  const [user] = await db.select().from(users).where(eq(users.id, actor.id));
  if (!(await verifyPassword(input.password, user?.passwordHash))) {
    await throttle.failed();
    throw fieldError("password", "That password is not right");
  }
  let method = "password";
  if (user.totpEnabledAt && !input.passwordOnly) {
    if (!input.code?.trim()) throw fieldError("code", "Enter the code from your authenticator app");
    const factor = await spendSecondFactor(user, input.code);
    if (!factor) {
      await throttle.failed();
      throw fieldError("code", "That code was not recognised");
    }
    method = `password+${factor}`;
  }
  await throttle.succeeded();
  return { via: "step-up", method, address: origin.address, client: origin.client };
}
