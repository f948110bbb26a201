/**
 * Checks an e-mail and password. Unknown address and wrong password give the same answer in about
 * the same time; repeated failures are throttled per account and address, and per address, and
 * only slow down the account elsewhere (lib/auth/throttle.ts).
 */
import { eq } from "drizzle-orm";
import { getDb } from "@/db/client";
import { users } from "@/db/schema";
import type { Actor } from "@/lib/permissions";
import { verifyPassword } from "./passwords";
import { spendSecondFactor } from "./second-factor";
import { signInSchema } from "./schemas";
import { throttleAttempt } from "./throttle";

export const SIGN_IN_FAILED = "E-mail or password not recognised.";
/** Not a failure: the password was right and the account has a second factor. The form asks for it. */
export const SECOND_FACTOR_NEEDED = "second-factor-needed";
export const CODE_NOT_RECOGNISED =
  "That code was not recognised. Enter the current code from your app, or a recovery code.";
export const EMAIL_NOT_CONFIRMED =
  "Confirm your e-mail address first: open the link in the e-mail we sent when you signed up. It can be sent again from the sign-up page.";

export class SignInError extends Error {}

/**
 * The person behind an e-mail, password and (when they have one) second-factor code, and how they
 * proved it: "password", "password+authenticator" or "password+recovery-code".
 */
export async function checkCredentials(
  input: unknown,
  clientAddress: string | null,
): Promise<{ actor: Actor; method: string }> {
  const parsed = signInSchema.safeParse(input);
  if (!parsed.success) throw new SignInError(SIGN_IN_FAILED);
  const { email, password, code } = parsed.data;
  const throttle = await throttleAttempt(email, clientAddress);
  if (throttle.refusal) throw new SignInError(throttle.refusal);
  // Failures on this account from elsewhere slow the check down; they never lock its owner out.
  if (throttle.slowdown > 0) await new Promise((resolve) => setTimeout(resolve, throttle.slowdown));

  const db = await getDb();
  const user = await db.query.users.findFirst({ where: eq(users.email, email) });
  const ok = await verifyPassword(password, user?.passwordHash);
  const fail = async (message: string) => {
    await throttle.failed();
    return new SignInError(message);
  };
  if (!ok || !user || !user.active) throw await fail(SIGN_IN_FAILED);
  let method = "password";
  if (user.totpEnabledAt) {
    if (!code) throw new SignInError(SECOND_FACTOR_NEEDED);
    // A wrong code counts as a failed attempt, throttled like a wrong password.
    const factor = await spendSecondFactor(user, code);
    if (!factor) throw await fail(CODE_NOT_RECOGNISED);
    method = `password+${factor}`;
  }
  if (!user.emailVerifiedAt) throw new SignInError(EMAIL_NOT_CONFIRMED);
  await throttle.succeeded();
  return {
    actor: { id: user.id, organisationId: user.organisationId, role: user.role, name: user.name, email: user.email },
    method,
  };
}
