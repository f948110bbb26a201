import type { Metadata } from "next";
import Link from "next/link";
import { AuthFrame } from "@/app/_components/auth-frame";
import { inspectInvite, inviteStateMessage } from "@/lib/users/service";
import { SetPasswordForm } from "./set-password-form";

export const metadata: Metadata = { title: "Set your password", robots: { index: false } };

export default async function InvitePage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const invite = await inspectInvite(token);
  if (invite.state !== "valid")
    return (
      <AuthFrame title="This link cannot be used">
        <p data-testid="invite-problem" className="text-muted">
          {inviteStateMessage(invite.state)}
        </p>
        <Link href="/sign-in" className="mt-6 inline-block font-bold text-accent underline">
          Go to sign-in
        </Link>
      </AuthFrame>
    );
  return (
    <AuthFrame title="Set your password">
      <p className="mb-4 text-muted">
        Welcome, {invite.name}. Choose a password for <strong className="text-ink">{invite.email}</strong>.
      </p>
      <SetPasswordForm token={token} />
    </AuthFrame>
  );
}
