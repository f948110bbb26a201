import type { Metadata } from "next";
import Link from "next/link";
import { describeAuth } from "@/assessments/revisions/signing-record";
import { getAccount } from "@/lib/account/service";
import { cookies } from "next/headers";
import { requirePermission } from "@/lib/auth/guard";
import { readSessionClaims } from "@/lib/auth/session";
import { ROLE_LABELS } from "@/lib/users/schemas";
import { ChangePasswordForm } from "./change-password-form";
import { ProfileForm } from "./profile-form";
import { ukDateTime } from "@/lib/dates";

export const metadata: Metadata = { title: "Your account" };

export default async function AccountPage() {
  const actor = await requirePermission("profile:read");
  const account = await getAccount(actor);
  const current = (await readSessionClaims(await cookies()))?.sessionId;
  return (
    <div className="space-y-6">
      <h1 className="text-2xl font-bold">Your account</h1>
      <p>
        {account.email} · {ROLE_LABELS[account.role]} ·{" "}
        <Link href="/account/security" className="font-bold text-accent underline">
          Second factor: {account.secondFactor ? "on" : "off"}
        </Link>
      </p>
      <div className="grid gap-4 lg:grid-cols-2">
        <ProfileForm name={account.name} />
        <ChangePasswordForm />
      </div>
      <section aria-labelledby="sessions-heading" className="rounded-lg border border-rule bg-white p-4">
        <h2 id="sessions-heading" className="text-lg font-bold">
          Where you are signed in
        </h2>
        <ul className="mt-2 divide-y divide-rule text-sm">
          {account.sessions.map((s) => (
            <li key={s.id} className="py-2">
              Since {ukDateTime(s.createdAt)} —{" "}
              {describeAuth({ via: "session", method: s.method, address: s.address, client: s.client })}
              {s.id === current && <strong> — this session</strong>}
            </li>
          ))}
        </ul>
        <p className="mt-2 text-sm text-muted">
          A session you do not recognise? Change your password: every other session ends.
        </p>
      </section>
    </div>
  );
}
