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
import { signInSchema } from "./schemas";
import {
  clearAttempts,
  FREE_ADDRESS_FAILURES,
  FREE_PAIR_FAILURES,
  readAttempts,
  recordFailure,
  slowdownAfter,
  throttleKeys,
  waitAfter,
} from "./throttle";

export const SIGN_IN_FAILED = "E-mail or password not recognised.";

export class SignInError extends Error {}

export async function checkCredentials(input: unknown, clientAddress: string | null): Promise<Actor> {
  const parsed = signInSchema.safeParse(input);
  if (!parsed.success) throw new SignInError(SIGN_IN_FAILED);
  const { email, password } = parsed.data;
  const keys = throttleKeys(email, clientAddress);
  const attempts = await readAttempts([keys.pair, keys.account, ...(keys.address ? [keys.address] : [])]);
  const now = Date.now();
  const wait = Math.max(
    waitAfter(attempts.get(keys.pair), FREE_PAIR_FAILURES, now),
    keys.address ? waitAfter(attempts.get(keys.address), FREE_ADDRESS_FAILURES, now) : 0,
  );
  if (wait > 0) {
    const minutes = Math.ceil(wait / 60_000);
    throw new SignInError(`Too many attempts. Wait ${minutes} minute${minutes === 1 ? "" : "s"} and try again.`);
  }
  // Failures on this account from elsewhere slow the check down; they never lock its owner out.
  const slow = slowdownAfter(attempts.get(keys.account), now);
  if (slow > 0) await new Promise((resolve) => setTimeout(resolve, slow));

  const db = await getDb();
  const user = await db.query.users.findFirst({ where: eq(users.email, email) });
  const ok = await verifyPassword(password, user?.passwordHash);
  if (!ok || !user || !user.active) {
    await recordFailure([keys.pair, keys.account, ...(keys.address ? [keys.address] : [])]);
    throw new SignInError(SIGN_IN_FAILED);
  }
  await clearAttempts([keys.pair, keys.account]);
  return { id: user.id, organisationId: user.organisationId, role: user.role, name: user.name, email: user.email };
}
