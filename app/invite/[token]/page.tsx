import type { Metadata } from "next";
import { AuthFrame } from "@/app/_components/auth-frame";
import { LinkProblem } from "@/app/_components/link-problem";
import { inspectInvite, inviteStateMessage } from "@/lib/users/service";
import { SetPasswordForm } from "./set-password-form";

export const metadata: Metadata = { title: "Set your password", robots: { index: false } };

export default async function InvitePage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const invite = await inspectInvite(token);
  if (invite.state !== "valid")
    return (
      <LinkProblem
        message={inviteStateMessage(invite.state)}
        href="/sign-in"
        action="Go to sign-in"
        testId="invite-problem"
      />
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
