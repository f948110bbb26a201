import type { Metadata } from "next";
import { AuthFrame } from "@/app/_components/auth-frame";
import { LinkProblem } from "@/app/_components/link-problem";
import { inspectAccountLink } from "@/lib/account/service";
import { ResetPasswordForm } from "./reset-password-form";

export const metadata: Metadata = { title: "Choose a new password", robots: { index: false } };

export default async function ResetPasswordPage({ params }: { params: Promise<{ token: string }> }) {
  const { token } = await params;
  const link = await inspectAccountLink(token, "reset-password");
  if (link.state !== "valid")
    return <LinkProblem message={link.message} href="/forgot-password" action="Ask for a new link" />;
  return (
    <AuthFrame title="Choose a new password">
      <p className="mb-4 text-sm text-muted">Setting it signs your account out on every device.</p>
      <ResetPasswordForm token={token} />
    </AuthFrame>
  );
}
