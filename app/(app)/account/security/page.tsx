import type { Metadata } from "next";
import Link from "next/link";
import { getAccount } from "@/lib/account/service";
import { requirePermission } from "@/lib/auth/guard";
import { FormMessage } from "@/app/_components/form";
import { EnrolSecondFactor } from "./enrol-second-factor";
import { ManageSecondFactor } from "./manage-second-factor";
import { ukDate } from "@/lib/dates";

export const metadata: Metadata = { title: "Second factor" };

export default async function SecurityPage() {
  const actor = await requirePermission("profile:read");
  const account = await getAccount(actor);
  return (
    <div className="max-w-2xl space-y-6">
      <p>
        <Link href="/account" className="text-sm font-bold text-accent underline">
          ← Your account
        </Link>
      </p>
      <h1 className="text-2xl font-bold">Second factor</h1>
      {account.secondFactorRequired && !account.secondFactor && (
        <FormMessage tone="error">
          Your organisation requires a second factor for your role. Set it up to continue: until then, only your account
          pages open.
        </FormMessage>
      )}
      <p className="text-sm text-muted">
        With a second factor, signing in and countersigning need a six-digit code from an authenticator app on your
        phone as well as your password, so a stolen password alone is not enough.
      </p>
      {account.secondFactor ? (
        <ManageSecondFactor
          since={ukDate(account.secondFactor)}
          recoveryCodesLeft={account.recoveryCodesLeft}
          required={account.secondFactorRequired}
        />
      ) : (
        <EnrolSecondFactor />
      )}
    </div>
  );
}
