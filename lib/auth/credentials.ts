/**
 * Checks an e-mail and password. Unknown address and wrong password give the same answer in about
 * the same time; repeated failures are throttled per account and per address.
 */
import { eq } from "drizzle-orm";
import { getDb } from "@/db/client";
import { users } from "@/db/schema";
import type { Actor } from "@/lib/permissions";
import { verifyPassword } from "./passwords";
import { signInSchema } from "./schemas";
import { signInThrottle } from "./throttle";

export const SIGN_IN_FAILED = "E-mail or password not recognised.";

export class SignInError extends Error {}

export async function checkCredentials(input: unknown, clientAddress: string | null): Promise<Actor> {
  const parsed = signInSchema.safeParse(input);
  if (!parsed.success) throw new SignInError(SIGN_IN_FAILED);
  const { email, password } = parsed.data;
  const keys = [`account:${email}`, ...(clientAddress ? [`address:${clientAddress}`] : [])];

  const wait = signInThrottle.waitMs(keys);
  if (wait > 0) {
    const minutes = Math.ceil(wait / 60_000);
    throw new SignInError(`Too many attempts. Wait ${minutes} minute${minutes === 1 ? "" : "s"} and try again.`);
  }

  const db = await getDb();
  const user = await db.query.users.findFirst({ where: eq(users.email, email) });
  const ok = await verifyPassword(password, user?.passwordHash);
  if (!ok || !user || !user.active) {
    signInThrottle.recordFailure(keys);
    throw new SignInError(SIGN_IN_FAILED);
  }
  signInThrottle.recordSuccess([`account:${email}`]);
  return { id: user.id, organisationId: user.organisationId, role: user.role, name: user.name, email: user.email };
}
